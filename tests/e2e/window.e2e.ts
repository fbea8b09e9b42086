import { execFileSync } from 'node:child_process';
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { type Page, expect, test } from '@playwright/test';
import { BuildSheetSchema } from '../../shared/contracts/sizing';
import { formatQuantity } from '../../shared/scenario';
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

/** The id of the demo member's classroom tabletop unit, from the systems table. */
async function tabletopId(page: Page): Promise<string> {
  await page.locator('table.systems').waitFor();
  const link = page.getByRole('link', { name: /Classroom tabletop unit/ }).first();
  const href = await link.getAttribute('href');
  const id = href?.split('/').pop();
  if (!id) throw new Error('The demo member has no classroom tabletop unit.');
  return id;
}

test('the demo member sweeps a 10 × 10 operating window, opens a cell as a run, and prints the build sheet to PDF', async ({
  page,
}) => {
  test.setTimeout(180_000);
  mkdirSync(artifacts, { recursive: true });
  const watch = watchPage(page, ['/api/auth/me']);
  await signInAsDemoMember(page);
  const systemId = await tabletopId(page);

  // The inflow margin, solved directly, and the sweep set-up filled from the design.
  await page.goto(`/systems/${systemId}/window`);
  await expect(page.locator('tw-inflow-margins')).toContainText(
    /Your pump gives bed .* this bed cycles between/,
  );
  await expect(page.getByLabel('Steps, axis 1')).toHaveValue('10');
  await expect(page.getByLabel('Steps, axis 2')).toHaveValue('10');
  await page.getByLabel('Simulated hours per cell').fill('1');
  await expect(page.locator('tw-sweep-form .count')).toHaveText('100 runs');
  await page.getByRole('button', { name: 'Run the sweep' }).click();

  // Progress, then the map: 100 cells, the current design ringed.
  const cells = page.locator('tw-regime-map rect.cell');
  await expect(cells).toHaveCount(100, { timeout: 120_000 });
  await expect(page.locator('tw-regime-map g.current-design')).toHaveCount(1);
  await expect(page.locator('tw-regime-map rect.regime-cycling').first()).toBeVisible();
  await expect(page.locator('tw-regime-map .legend')).toContainText('Cycling');
  await page.screenshot({ path: join(artifacts, 'operating-window.png'), fullPage: true });

  // One parameter: a line chart of period, flood and drain times over regime bands.
  await page.getByRole('checkbox', { name: 'Second parameter' }).uncheck();
  await expect(page.locator('tw-sweep-form .count')).toHaveText('10 runs');
  await page.getByRole('button', { name: 'Run the sweep' }).click();
  await expect(page.locator('tw-regime-map path.line')).toHaveCount(3, { timeout: 120_000 });
  await expect(cells).toHaveCount(10);
  await page
    .locator('tw-regime-map')
    .screenshot({ path: join(artifacts, 'operating-window-line.png') });

  // A cycling cell opens as a full run of that cell's scenario.
  await page.locator('tw-regime-map rect.regime-cycling').nth(3).click();
  await expect(page).toHaveURL(/\/runs\/[0-9a-f-]{36}$/, { timeout: 60_000 });
  await expect(page.getByText(/floods and drains every/).first()).toBeVisible({ timeout: 30_000 });

  // The sizing checks: one page of verdicts with value, limit and source.
  await page.goto(`/systems/${systemId}/sizing`);
  await expect(page.getByRole('heading', { name: 'Every bed filling at once' })).toBeVisible({
    timeout: 60_000,
  });
  await expect(page.locator('li.check[data-check="bed-load"]')).toContainText('qualified person');
  await page.screenshot({ path: join(artifacts, 'sizing-checks.png'), fullPage: true });

  // The build sheet: the standpipe cut length is its height above the floor plus the fitting depth.
  await page.goto(`/systems/${systemId}/build-sheet`);
  const sheet = BuildSheetSchema.parse(
    await (await page.request.get(`/api/systems/${systemId}/build-sheet`)).json(),
  );
  const standpipe = sheet.beds[0]?.standpipe;
  if (!standpipe) throw new Error('The tabletop unit has a bed.');
  expect(standpipe.cutLengthM).toBeCloseTo(
    standpipe.heightAboveFloorM + standpipe.fittingDepthM,
    12,
  );
  const cut = formatQuantity(standpipe.cutLengthM, 'diameter', 'metric');
  await expect(page.locator('.standpipe-cut')).toContainText(`to ${cut}:`);
  await expect(page.locator('tw-check-list li.check').first()).toBeVisible({ timeout: 60_000 });
  await page.emulateMedia({ media: 'print' });
  await page.screenshot({ path: join(artifacts, 'build-sheet-print.png'), fullPage: true });
  const pdfPath = join(artifacts, 'build-sheet.pdf');
  await page.pdf({ path: pdfPath, format: 'A4', printBackground: true });
  const text = execFileSync('pdftotext', ['-layout', pdfPath, '-'], { encoding: 'utf8' }).replace(
    /\s+/g,
    ' ',
  );
  expect(text).toContain('Build sheet: Classroom tabletop unit');
  expect(text).toContain(`Cut the standpipe`);
  expect(text).toContain(cut);
  expect(text).toContain('qualified person');
  expect(text).not.toContain('Bulkhead fitting depth');
  expect(watch.errors).toEqual([]);
  expect(watch.farRequests).toEqual([]);
});
