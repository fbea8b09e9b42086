import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { expect, test } from '@playwright/test';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from '../../server/db/seed';
import { watchPage } from './page-watch';

const artifacts = join(import.meta.dirname, 'artifacts');

function demoAccount(role: 'admin' | 'member') {
  const account = DEMO_ACCOUNTS.find((candidate) => candidate.role === role);
  if (!account) throw new Error(`The demo seed has no ${role} account.`);
  return account;
}

test('a wrong password is refused with a message under the form', async ({ page }) => {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(demoAccount('member').email);
  await page.getByLabel('Password').fill('not-the-password');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByRole('alert')).toBeVisible();
  await expect(page).toHaveURL(/\/sign-in$/);
});

test('an invalid e-mail shows a field error and sends nothing', async ({ page }) => {
  await page.goto('/');
  let loginCalls = 0;
  page.on('request', (request) => {
    if (request.url().endsWith('/api/auth/login')) loginCalls += 1;
  });
  await page.getByLabel('E-mail').fill('not-an-address');
  await page.getByLabel('Password').fill('whatever');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(
    page.getByText('Enter an e-mail address in the form name@example.org.'),
  ).toBeVisible();
  expect(loginCalls).toBe(0);
});

test('an admin signs in, sees Admin in the menu, is sent home from / and signs out', async ({
  page,
}) => {
  const watch = watchPage(page, ['/api/auth/me']);
  const admin = demoAccount('admin');
  await page.goto('/');
  await page.getByLabel('E-mail').fill(admin.email);
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();

  await expect(page).toHaveURL(/\/systems$/);
  const nav = page.getByRole('navigation', { name: 'Main' });
  await expect(nav.getByRole('link')).toHaveText([/Systems/, /Classes/, /Admin/]);
  await expect(page.locator('mat-toolbar')).toContainText(admin.name);
  mkdirSync(artifacts, { recursive: true });
  await page.screenshot({ path: join(artifacts, 'signed-in.png') });

  await page.goto('/');
  await expect(page).toHaveURL(/\/systems$/);

  await page.getByRole('button', { name: admin.name }).click();
  await page.getByRole('menuitem', { name: 'Sign out' }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'Tidewright' })).toBeVisible();
  await expect(page.locator('mat-toolbar').getByRole('link', { name: 'Sign in' })).toBeVisible();
  expect(watch.errors).toEqual([]);
});

test('a member is not shown Admin and is sent away from /admin', async ({ page }) => {
  const member = demoAccount('member');
  await page.goto('/sign-in?returnUrl=%2Fadmin');
  await page.getByLabel('E-mail').fill(member.email);
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page).toHaveURL(/\/systems$/);
  await expect(page.getByRole('navigation', { name: 'Main' }).getByRole('link')).toHaveText([
    /Systems/,
    /Classes/,
  ]);
});
