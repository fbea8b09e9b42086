/**
 * Accounts in the browser: each demo account sees its own navigation, and a new account resets
 * its password through the link the admin Outbox shows, then signs in with the new one.
 */
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { type Page, expect, test } from '@playwright/test';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from '../../server/db/seed';
import { watchPage } from './page-watch';

const artifacts = join(import.meta.dirname, 'artifacts');

const EXPECTED_NAV: Record<(typeof DEMO_ACCOUNTS)[number]['role'], RegExp[]> = {
  admin: [/Systems/, /Classes/, /Admin/],
  instructor: [/Systems/, /Classes/],
  // Members see Classes too: any member may be a student in a class.
  member: [/Systems/, /Classes/],
};

async function signIn(page: Page, email: string, password: string): Promise<void> {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page).toHaveURL(/\/systems$/);
}

async function signOut(page: Page, name: string): Promise<void> {
  await page.getByRole('button', { name }).click();
  await page.getByRole('menuitem', { name: 'Sign out' }).click();
  await expect(page.locator('mat-toolbar').getByRole('link', { name: 'Sign in' })).toBeVisible();
}

for (const account of DEMO_ACCOUNTS) {
  test(`the demo ${account.role} signs in and sees the ${account.role}'s navigation`, async ({
    page,
  }) => {
    const watch = watchPage(page, ['/api/auth/me']);
    await signIn(page, account.email, DEMO_PASSWORD);
    const nav = page.getByRole('navigation', { name: 'Main' });
    await expect(nav.getByRole('link')).toHaveText(EXPECTED_NAV[account.role]);
    await expect(page.locator('mat-toolbar')).toContainText(account.name);
    if (account.role !== 'admin') {
      await page.goto('/admin');
      await expect(page).toHaveURL(/\/systems$/);
    }
    await signOut(page, account.name);
    expect(watch.errors).toEqual([]);
  });
}

test('a new account resets its password through the Outbox link and signs in with the new one', async ({
  page,
}) => {
  mkdirSync(artifacts, { recursive: true });
  const email = `grower-${Date.now()}@example.test`;
  const name = 'Morgan Grower';

  await page.goto('/sign-in');
  await page.getByRole('link', { name: 'Create an account' }).click();
  await expect(page).toHaveURL(/\/register$/);
  await page.getByLabel('Name').fill(name);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill('short');
  await page.getByRole('button', { name: 'Create account' }).click();
  await expect(page.getByText('Use at least 10 characters')).toBeVisible();
  await page.getByLabel('Password', { exact: true }).fill('first long phrase for beds');
  await page.getByRole('button', { name: 'Create account' }).click();
  await expect(page).toHaveURL(/\/systems$/);
  await signOut(page, name);

  await page.goto('/sign-in');
  await page.getByRole('link', { name: 'Forgot your password?' }).click();
  await expect(page).toHaveURL(/\/forgot-password$/);
  await page.getByLabel('E-mail').fill(email);
  await page.getByRole('button', { name: 'Send reset link' }).click();
  await expect(page.getByRole('status')).toContainText('If an account uses that address');

  const admin = DEMO_ACCOUNTS.find((a) => a.role === 'admin');
  if (!admin) throw new Error('The demo seed has no admin.');
  await signIn(page, admin.email, DEMO_PASSWORD);
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: /Admin/ }).click();
  await expect(page.getByRole('row', { name: new RegExp(email) })).toBeVisible();
  await page.screenshot({ path: join(artifacts, 'admin-users.png'), fullPage: true });
  await page.getByRole('tab', { name: /Outbox/ }).click();
  await expect(page.getByRole('tab', { name: /Outbox/ })).toHaveAttribute('aria-selected', 'true');
  const message = page.locator('mat-expansion-panel').filter({ hasText: email }).first();
  await expect(message).toContainText('Reset your Tidewright password');
  const link = message.getByRole('link', { name: /\/reset-password\?token=/ });
  await expect(link).toBeVisible();
  await page.mouse.move(0, 0);
  await page.screenshot({
    path: join(artifacts, 'outbox.png'),
    fullPage: true,
    animations: 'disabled',
  });

  // The admin reading the outbox follows the link; resetting another account keeps the admin signed in.
  await link.click();
  await expect(page).toHaveURL(/\/reset-password\?token=/);
  await page.getByRole('textbox', { name: 'New password' }).fill('second long phrase for beds');
  await page.screenshot({ path: join(artifacts, 'reset-password.png') });
  await page.getByRole('button', { name: 'Save new password' }).click();
  await expect(page.getByRole('status')).toContainText('Your password is changed');
  await page.screenshot({ path: join(artifacts, 'reset-done.png') });
  await signOut(page, admin.name);

  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill('first long phrase for beds');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByRole('alert')).toContainText('do not match');
  await signIn(page, email, 'second long phrase for beds');
  await expect(page.locator('mat-toolbar')).toContainText(name);
});
