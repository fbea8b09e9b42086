/**
 * The classroom in the browser: the demo instructor invites a new student by e-mail, the student
 * follows the link from the outbox, registers, predicts a lesson's answers and runs it; the
 * instructor then sees the prediction on the lesson page and reveals the answer in presentation
 * mode.
 */
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { type Page, expect, test } from '@playwright/test';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from '../../server/db/seed';
import { DEMO_CLASS_NAME } from '../../server/classroom/seed-classroom-demo';
import { watchPage } from './page-watch';

const artifacts = join(import.meta.dirname, 'artifacts');
const LESSON = "What sets the siphon's start";

function demo(role: 'admin' | 'instructor') {
  const account = DEMO_ACCOUNTS.find((a) => a.role === role);
  if (!account) throw new Error(`The demo seed has no ${role}.`);
  return account;
}

async function signIn(page: Page, email: string): Promise<void> {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page).toHaveURL(/\/systems$/);
}

async function signOut(page: Page, name: string): Promise<void> {
  await page.getByRole('button', { name }).click();
  await page.getByRole('menuitem', { name: 'Sign out' }).click();
  await expect(page.locator('mat-toolbar').getByRole('link', { name: 'Sign in' })).toBeVisible();
}

/** The instructor's demo class page. */
async function openDemoClass(page: Page): Promise<void> {
  await page
    .getByRole('navigation', { name: 'Main' })
    .getByRole('link', { name: /Classes/ })
    .click();
  await page
    .getByRole('link', { name: new RegExp(DEMO_CLASS_NAME.replace(/[()]/g, '\\$&')) })
    .click();
  await expect(page.getByRole('heading', { level: 1 })).toHaveText(DEMO_CLASS_NAME);
}

test('an invited student predicts and runs a lesson, and the instructor sees the answer', async ({
  page,
}) => {
  test.setTimeout(180_000);
  mkdirSync(artifacts, { recursive: true });
  const watch = watchPage(page, ['/api/auth/me']);
  const teacher = demo('instructor');
  const admin = demo('admin');
  const student = {
    name: 'Robin Newcomer',
    email: `robin-${Date.now()}@example.test`,
    password: 'bells and slots and gravel',
  };

  // The instructor invites the new student.
  await signIn(page, teacher.email);
  await openDemoClass(page);
  await page.getByLabel('Invite by e-mail').fill(student.email);
  await page.getByRole('button', { name: 'Send invitations' }).click();
  await expect(page.getByRole('status')).toContainText(`Invitation e-mailed to ${student.email}`);
  await expect(page.locator('.invitations')).toContainText(student.email);
  await page.screenshot({ path: join(artifacts, 'classroom-class.png'), fullPage: true });
  await signOut(page, teacher.name);

  // The invitation waits in the outbox; its link is what the student follows.
  await signIn(page, admin.email);
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: /Admin/ }).click();
  await page.getByRole('tab', { name: /Outbox/ }).click();
  const message = page.locator('mat-expansion-panel').filter({ hasText: student.email }).first();
  await expect(message).toContainText(`Join "${DEMO_CLASS_NAME}" on Tidewright`);
  const href = await message.getByRole('link', { name: /\/join\// }).getAttribute('href');
  if (!href) throw new Error('The invitation has no join link.');
  await signOut(page, admin.name);

  // The student registers from the link and lands in the class.
  await page.goto(new URL(href).pathname);
  await expect(page.getByText(`Join “${DEMO_CLASS_NAME}”`)).toBeVisible();
  await page.getByLabel('Your name').fill(student.name);
  await page.getByLabel('Choose a password').fill(student.password);
  await page.screenshot({ path: join(artifacts, 'classroom-join.png') });
  await page.getByRole('button', { name: 'Register and join' }).click();
  await expect(page.getByRole('heading', { level: 1 })).toHaveText(DEMO_CLASS_NAME);
  await expect(page.locator('mat-toolbar')).toContainText(student.name);

  // Predict first: running is not possible before the predictions are saved.
  await page.getByRole('link', { name: LESSON }).click();
  await expect(page.getByRole('heading', { level: 1 })).toHaveText(LESSON);
  await expect(page.getByRole('button', { name: 'Run the system' })).toBeDisabled();
  await page.getByRole('radio', { name: /Stalls: trickles over the standpipe/ }).check();
  await page.getByLabel('Your prediction').fill('44');
  await page.getByRole('button', { name: 'Save predictions' }).click();
  await expect(page.getByText('Saved. When you are sure, run the system.')).toBeVisible();
  await page.getByRole('button', { name: 'Run the system' }).click();

  await expect(page.getByRole('heading', { name: 'Prediction against result' })).toBeVisible({
    timeout: 60_000,
  });
  const outcomes = page.locator('table.outcomes tbody tr');
  await expect(outcomes).toHaveCount(2);
  await expect(outcomes.nth(0)).toContainText('never starts');
  await expect(outcomes.nth(0).locator('mat-icon')).toHaveText('check_circle');
  await expect(page.locator('tw-time-series-chart svg path').first()).toBeVisible();
  await page.screenshot({ path: join(artifacts, 'classroom-student-result.png'), fullPage: true });
  await signOut(page, student.name);

  // The instructor sees the prediction against the simulated value on the lesson page.
  await signIn(page, teacher.email);
  await openDemoClass(page);
  await page.getByRole('link', { name: LESSON }).click();
  await expect(page.locator('.counts')).toContainText('ran the system');
  const answers = page.locator('table.answers');
  await expect(answers).toContainText(student.name);
  await expect(page.locator('.finding').first()).toContainText('predicted the regime right');
  await expect(page.locator('tw-prediction-plot circle.dot').first()).toBeVisible();
  await page.screenshot({ path: join(artifacts, 'classroom-report.png'), fullPage: true });

  // Presentation mode: the class's predictions first, then the answer revealed to everyone.
  await page.getByRole('link', { name: 'Present' }).click();
  await expect(page.locator('.prompt')).toHaveText(
    'Will this siphon start, and will the bed flood and drain?',
  );
  await page.getByRole('button', { name: 'Reveal the answer to the class' }).click();
  await expect(page.locator('.reveal')).toContainText('The simulation says');
  await page.screenshot({ path: join(artifacts, 'classroom-present.png'), fullPage: true });

  expect(watch.errors).toEqual([]);
  expect(watch.farRequests).toEqual([]);
});
