import { mkdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { type Page, expect, test } from '@playwright/test';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from '../../server/db/seed';
import { watchPage } from './page-watch';

const artifacts = join(import.meta.dirname, 'artifacts');

async function signInAsDemoMember(page: Page): Promise<void> {
  const member = DEMO_ACCOUNTS.find((account) => account.role === 'member');
  if (!member) throw new Error('The demo seed has no member account.');
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(member.email);
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page).toHaveURL(/\/systems$/);
}

/** Opens the demo greenhouse system, or makes one from the greenhouse template when none exists. */
async function openGreenhouse(page: Page): Promise<string> {
  const link = page.getByRole('link', { name: /greenhouse/i }).first();
  await page.locator('table.systems').waitFor();
  if ((await link.count()) > 0) {
    await link.click();
  } else {
    await page.getByRole('button', { name: 'New system' }).click();
    await page.getByRole('radio', { name: /Greenhouse, three beds/ }).check();
    await page.getByRole('button', { name: 'Create' }).click();
  }
  await expect(page).toHaveURL(/\/systems\/[0-9a-f-]{36}$/);
  return page.url().split('/').pop() ?? '';
}

/** The drawn height (SVG units) of the first bed's standpipe. */
async function drawnStandpipeHeight(page: Page): Promise<number> {
  const rect = page.locator('tw-elevation-drawing rect.standpipe').first();
  return Number(await rect.getAttribute('height'));
}

/** Types a new standpipe height (in the field's own unit) into the first bed. */
async function setStandpipeHeight(page: Page, factor: number): Promise<void> {
  await page.getByRole('tab', { name: 'Beds' }).click();
  const field = page.getByLabel('Standpipe height').first();
  const current = Number(await field.inputValue());
  await field.fill(String(Number((current * factor).toPrecision(3))));
  await field.blur();
}

/** Clicks Run (saving first) and waits for the run page. */
async function runAndOpen(page: Page): Promise<string> {
  await page.getByRole('button', { name: /^(Run|Save and run)$/ }).click();
  await expect(page).toHaveURL(/\/runs\/[0-9a-f-]{36}$/, { timeout: 60_000 });
  return page.url().split('/').pop() ?? '';
}

test('the demo member edits the greenhouse, sees the drawing and live verdict follow, runs it, downloads the CSV and compares two runs', async ({
  page,
}) => {
  test.setTimeout(120_000);
  mkdirSync(artifacts, { recursive: true });
  const watch = watchPage(page, ['/api/auth/me']);
  await signInAsDemoMember(page);
  const systemId = await openGreenhouse(page);

  // The drawing and the live verdict (engine in a web worker) appear for the saved system.
  const liveBeds = page.locator('tw-live-verdict ul.beds');
  await expect(liveBeds).toContainText('floods and drains every', { timeout: 15_000 });
  const heightBefore = await drawnStandpipeHeight(page);
  const verdictBefore = await liveBeds.innerText();

  await setStandpipeHeight(page, 0.8);
  await expect.poll(() => drawnStandpipeHeight(page)).toBeCloseTo(heightBefore * 0.8, 0);
  await expect.poll(() => liveBeds.innerText(), { timeout: 15_000 }).not.toBe(verdictBefore);
  await page.screenshot({ path: join(artifacts, 'system-editor.png'), fullPage: true });

  await page.getByRole('button', { name: 'Save', exact: true }).click();
  await expect(page.getByText('Saved', { exact: true })).toBeVisible();

  // Run on the server: verdicts first, then the cycle table and the charts.
  const firstRun = await runAndOpen(page);
  await expect(page.locator('section.verdicts h2')).toHaveText(
    /All checks pass|Needs attention|Fails a check/,
  );
  await expect(page.locator('section.verdicts li').first()).toBeVisible();
  await expect(page.locator('table.beds tbody tr')).toHaveCount(3);
  await expect(
    page.locator('tw-time-series-chart').first().locator('path[data-line]').first(),
  ).toBeVisible();
  await page.screenshot({ path: join(artifacts, 'run-page.png'), fullPage: true });

  // The CSV: a header naming time and every channel, then one row per stored sample.
  const run = (await (await page.request.get(`/api/runs/${firstRun}`)).json()) as {
    sampleCount: number;
  };
  await page.getByRole('button', { name: 'Download' }).click();
  const [download] = await Promise.all([
    page.waitForEvent('download'),
    page.getByRole('menuitem', { name: 'Series (CSV)' }).click(),
  ]);
  const csv = readFileSync(await download.path(), 'utf8');
  const lines = csv.trimEnd().split('\n');
  expect(lines[0]?.startsWith('t_s,')).toBe(true);
  expect(lines[0]).toContain('level:tank');
  expect(lines.length - 1).toBe(run.sampleCount);
  expect(download.suggestedFilename()).toMatch(/\.csv$/);

  // A second run with the standpipe changed again, then the two compared.
  await page.goto(`/systems/${systemId}`);
  await expect(liveBeds).toContainText('floods and drains', { timeout: 15_000 });
  // Typed and clicked at once, as a hurried user would: Save and run must save what was typed.
  const field = page.getByLabel('Standpipe height').first();
  await page.getByRole('tab', { name: 'Beds' }).click();
  const typedM = Number((Number(await field.inputValue()) * 1.15).toPrecision(3));
  await field.fill(String(typedM));
  const saved = page.waitForResponse(
    (response) => response.request().method() === 'PUT' && /\/api\/systems\//.test(response.url()),
  );
  await page.getByRole('button', { name: 'Save and run', exact: true }).click();
  const savedScenario = (await (await saved).request().postDataJSON()) as {
    scenario: { vessels: { kind: string; drain?: { standpipe: { height: number } } }[] };
  };
  const savedHeights = savedScenario.scenario.vessels.flatMap((vessel) =>
    vessel.drain ? [vessel.drain.standpipe.height] : [],
  );
  expect(savedHeights).toContain(typedM);
  await expect(page).toHaveURL(/\/runs\/[0-9a-f-]{36}$/, { timeout: 60_000 });
  const secondRun = page.url().split('/').pop() ?? '';
  expect(secondRun).not.toBe(firstRun);
  await page.goto(`/systems/${systemId}/runs`);
  // Other browser tests may have run this system too: pick this test's two runs by their links.
  for (const runId of [firstRun, secondRun]) {
    const row = page
      .locator('table.runs tbody tr')
      .filter({ has: page.locator(`a[href="/runs/${runId}"]`) });
    await expect(row).toHaveCount(1);
    await row.getByRole('checkbox').check();
  }
  await page.getByRole('button', { name: 'Compare the two selected' }).click();
  await expect(page).toHaveURL(/\/runs\/compare\?/);
  await expect(page.locator('path[data-line^="overlay:"]').first()).toBeVisible();
  await expect(page.locator('table.differences')).toContainText('mean period');
  await page.screenshot({ path: join(artifacts, 'run-compare.png'), fullPage: true });

  expect(watch.farRequests).toEqual([]);
  expect(watch.errors).toEqual([]);
});
