import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { expect, test } from '@playwright/test';
import { watchPage } from './page-watch';

const artifacts = join(import.meta.dirname, 'artifacts');

test('the home page shows Tidewright and the sign-in form, served entirely from this machine', async ({
  page,
}) => {
  const watch = watchPage(page, ['/api/auth/me']);
  await page.goto('/');

  await expect(page.getByRole('heading', { level: 1, name: 'Tidewright' })).toBeVisible();
  await expect(page.locator('mat-toolbar')).toContainText('Tidewright');
  await expect(page.getByLabel('E-mail')).toBeVisible();
  await expect(page.getByLabel('Password')).toBeVisible();
  await expect(page.getByRole('button', { name: 'Sign in' })).toBeVisible();
  await expect(page.getByText('Safety cautions').first()).toBeVisible();
  await expect(page.getByText('GFCI or RCD')).toBeVisible();

  await page.waitForLoadState('networkidle');
  await page.evaluate(() => document.fonts.ready);

  // A broken icon font still clips to 24 px wide, so check scrollWidth and the family instead.
  const icon = await page
    .locator('mat-icon')
    .first()
    .evaluate((element) => ({
      scrollWidth: element.scrollWidth,
      fontFamily: getComputedStyle(element).fontFamily,
    }));
  expect(icon.scrollWidth).toBe(24);
  expect(icon.fontFamily).toContain('Material Icons');

  const fontsLoaded = await page.evaluate(() => ({
    icons: document.fonts.check('24px "Material Icons"'),
    roboto: document.fonts.check('16px Roboto'),
  }));
  expect(fontsLoaded).toEqual({ icons: true, roboto: true });

  mkdirSync(artifacts, { recursive: true });
  await page.screenshot({ path: join(artifacts, 'home.png'), fullPage: true });

  expect(watch.farRequests).toEqual([]);
  expect(watch.errors).toEqual([]);
});

test('the dark theme is remembered across a reload', async ({ page }) => {
  await page.goto('/');
  const scheme = () => page.evaluate(() => document.documentElement.style.colorScheme);
  await expect.poll(scheme).toMatch(/^(light|dark)$/);
  const before = await scheme();
  const after = before === 'dark' ? 'light' : 'dark';
  await page
    .getByRole('button', {
      name: before === 'dark' ? 'Switch to the light theme' : 'Switch to the dark theme',
    })
    .click();
  await expect.poll(scheme).toBe(after);
  await page.reload();
  await expect(page.getByRole('heading', { level: 1, name: 'Tidewright' })).toBeVisible();
  await expect.poll(scheme).toBe(after);
  if (after === 'dark') {
    mkdirSync(artifacts, { recursive: true });
    await page.screenshot({ path: join(artifacts, 'home-dark.png'), fullPage: true });
  }
});

test('the footer link opens the safety cautions page', async ({ page }) => {
  await page.goto('/');
  await page.locator('footer').getByRole('link', { name: 'Safety cautions' }).click();
  await expect(page).toHaveURL(/\/safety$/);
  await expect(page.getByText('Ground-fault', { exact: false })).toBeVisible();
  await expect(page.locator('tw-safety-cautions li')).toHaveCount(5);
  await expect(page).toHaveTitle('Safety cautions · Tidewright');
});
