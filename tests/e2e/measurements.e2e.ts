import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { type Page, expect, test } from '@playwright/test';
import { XSRF_COOKIE, XSRF_HEADER } from '../../shared/contracts/auth';
import { EXAMPLE_SCENARIO_FILE } from '../../shared/scenario/index';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from '../../server/db/seed';
import { measuredLog } from '../calibration/measured-log';
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

/** POSTs as the signed-in page (session cookie plus the CSRF header) and returns the JSON answer. */
async function post(page: Page, path: string, data: object): Promise<{ id: string }> {
  const cookies = await page.context().cookies();
  const token = cookies.find((c) => c.name === XSRF_COOKIE)?.value ?? '';
  const res = await page.request.post(path, {
    data,
    headers: { [XSRF_HEADER]: decodeURIComponent(token) },
  });
  expect(res.status(), await res.text()).toBe(201);
  return (await res.json()) as { id: string };
}

test('a member uploads a level log, previews it, saves it and sees it over a run with aligned cycles', async ({
  page,
}) => {
  test.setTimeout(240_000);
  mkdirSync(artifacts, { recursive: true });
  const watch = watchPage(page, ['/api/auth/me']);
  await signInAsDemoMember(page);
  const system = await post(page, '/api/systems', {
    name: 'Bench bed',
    scenario: EXAMPLE_SCENARIO_FILE,
  });
  await post(page, `/api/systems/${system.id}/runs`, { duration: '1 h' });

  const { csv } = measuredLog({
    truth: [
      { key: 'primingCoefficient', target: 'bed-a', value: 0.55 },
      { key: 'dischargeLossMultiplier', target: 'bed-a', value: 1.6 },
      { key: 'flowScale', target: 'pump', value: 0.85 },
    ],
    noiseM: 0.001,
    intervalS: 5,
    skipS: 1800,
    durationS: 3600,
    mountingHeightM: 0.4,
    seed: 7,
  });

  await page.goto(`/systems/${system.id}/measurements`);
  await expect(page.getByRole('heading', { name: 'Measurements' })).toBeVisible();
  await page
    .locator('tw-csv-upload input[type=file]')
    .setInputFiles({ name: 'bench-logger.csv', mimeType: 'text/csv', buffer: Buffer.from(csv) });

  // The server guessed the columns; the preview shows parsed rows. Read it as a distance sensor 400 mm up.
  const preview = page.locator('table.preview-rows');
  await expect(preview.locator('tbody tr').first()).toBeVisible();
  await page.getByLabel('The column holds').click();
  await page.getByRole('option', { name: 'Distance from a sensor above the water' }).click();
  await page.getByLabel('Sensor face above the floor').fill('400');
  await page.getByLabel('Time zone of times without an offset').fill('Europe/Lisbon');
  await page.getByRole('button', { name: 'Update preview' }).click();
  await expect(page.locator('.summary')).toContainText('rows read');
  await expect(preview.locator('tbody tr').first().locator('td').nth(1)).toHaveText(
    /^2024-06-01T08:00:00/,
  );
  await page.screenshot({ path: join(artifacts, 'measurements-preview.png'), fullPage: true });

  await page.getByRole('button', { name: 'Save measurement' }).click();
  const row = page.locator('table.logs tbody tr', { hasText: 'bench-logger' });
  await expect(row).toContainText('bed-a');

  await row.getByRole('button', { name: 'Compare with a run' }).click();
  await page.getByRole('menuitem').first().click();
  await expect(page).toHaveURL(/\/measurements\/[0-9a-f-]{36}\/compare\?run=/);

  // Simulated (solid) and measured (dashed) levels overlaid, and the figures side by side.
  const chart = page.locator('tw-time-series-chart');
  await expect(chart.locator('path[data-line="data:level"]')).toHaveAttribute('d', /^M/);
  await expect(chart.locator('path[data-line="overlay:level"]')).toHaveAttribute('d', /^M/);
  await expect(chart.locator('path[data-line="overlay:level"]')).toHaveAttribute(
    'stroke-dasharray',
    '6 4',
  );
  const drain = page.locator('table.comparison tr[data-metric="drain"]');
  await expect(drain.locator('td').nth(3)).toHaveText(/^−/);
  await page.screenshot({ path: join(artifacts, 'measurements-compare.png'), fullPage: true });

  // Fit k_p and the drain-loss multiplier to the log and keep them on the system.
  await page.getByRole('link', { name: 'Back to the measurements' }).click();
  await page.locator('tw-calibration-panel').getByText('bench-logger').click();
  await page.getByRole('button', { name: 'Fit the model' }).click();
  const fitted = page.locator('table.parameters tbody tr');
  await expect(fitted).toHaveCount(2, { timeout: 90_000 });
  await expect(fitted.first()).toContainText('Priming coefficient k_p');
  await page.getByRole('button', { name: 'Keep these values on the system' }).click();
  await expect(page.locator('section.current')).toContainText('bed-a: k_p', { timeout: 10_000 });
  await expect(page.locator('section.current')).toContainText('Kept by Dana Demo');
  await page.screenshot({ path: join(artifacts, 'measurements-calibrated.png'), fullPage: true });
  expect(watch.errors).toEqual([]);
  expect(watch.farRequests).toEqual([]);
});
