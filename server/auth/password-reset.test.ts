import { eq } from 'drizzle-orm';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { ApiErrorSchema } from '../../shared/contracts/api-error';
import { PasswordResetAcceptedSchema } from '../../shared/contracts/auth';
import { createApp } from '../app';
import { mailMessages, passwordResets, sessions } from '../db/schema';
import { TestClient, createTestUser } from '../testing/test-client';
import { createTestContext, type TestContext } from '../testing/test-context';
import { waitForMail } from '../testing/wait-for-mail';
import { hashResetToken } from './password-reset-service';

function tokenFromMail(text: string): string {
  const match = /\/reset-password\?token=([A-Za-z0-9_%-]+)/.exec(text);
  if (!match?.[1]) throw new Error(`No reset link in: ${text}`);
  return decodeURIComponent(match[1]);
}

describe('password reset by e-mail', () => {
  let t: TestContext;
  let nowMs: number;
  beforeEach(async () => {
    nowMs = Date.parse('2026-03-01T10:00:00Z');
    t = await createTestContext(
      { PUBLIC_URL: 'https://tidewright.example.org' },
      { auth: { now: () => nowMs } },
    );
  });
  afterEach(async () => {
    await t.close();
  });

  it('mails a single-use link over SMTP; the new password works, the old one and other sessions stop', async () => {
    const { user, password } = await createTestUser(t.ctx, {
      email: 'grower@example.test',
      name: 'Grower',
    });
    const app = createApp(t.ctx);
    const elsewhere = await TestClient.create(app);
    await elsewhere.signIn(user.email, password);
    const client = await TestClient.create(app);
    const accepted = await client
      .post('/api/auth/password-reset')
      .send({ email: 'Grower@Example.test' });
    expect(accepted.status).toBe(202);
    PasswordResetAcceptedSchema.parse(accepted.body);

    const mail = await waitForMail(t.ctx.db, user.email);
    expect(mail.subject).toBe('Reset your Tidewright password');
    expect(mail.textBody).toContain('https://tidewright.example.org/reset-password?token=');
    expect(mail.raw).toMatch(/^Content-Type: multipart\/alternative/m);
    const token = tokenFromMail(mail.textBody);
    const [stored] = await t.ctx.db.select().from(passwordResets);
    expect(stored?.tokenHash).toBe(hashResetToken(token));
    expect(stored?.tokenHash).not.toContain(token);

    const confirmed = await client
      .post('/api/auth/password-reset/confirm')
      .send({ token, password: 'flood and drain again' });
    expect(confirmed.status).toBe(204);
    expect(await t.ctx.db.select().from(sessions)).toHaveLength(0);
    expect((await elsewhere.get('/api/auth/me')).status).toBe(401);
    expect(
      (await client.post('/api/auth/login').send({ email: user.email, password })).status,
    ).toBe(401);
    await client.signIn(user.email, 'flood and drain again');

    const reused = await client
      .post('/api/auth/password-reset/confirm')
      .send({ token, password: 'yet another long phrase' });
    expect(reused.status).toBe(400);
    expect(ApiErrorSchema.parse(reused.body).error.code).toBe('RESET_TOKEN_INVALID');
  });

  it('signs out the browser that confirms the reset when it was signed in as that user', async () => {
    const { user, password } = await createTestUser(t.ctx);
    const client = await TestClient.create(createApp(t.ctx));
    await client.signIn(user.email, password);
    await client.post('/api/auth/password-reset').send({ email: user.email });
    const token = tokenFromMail((await waitForMail(t.ctx.db, user.email)).textBody);
    nowMs += 2 * 60_000; // long enough for the request to refresh the session's last-seen time
    expect(
      (
        await client
          .post('/api/auth/password-reset/confirm')
          .send({ token, password: 'fresh long phrase here' })
      ).status,
    ).toBe(204);
    expect(await t.ctx.db.select().from(sessions)).toHaveLength(0);
    expect((await client.get('/api/auth/me')).status).toBe(401);
  });

  it('refuses a token after its expiry', async () => {
    const { user } = await createTestUser(t.ctx);
    const client = await TestClient.create(createApp(t.ctx));
    await client.post('/api/auth/password-reset').send({ email: user.email });
    const token = tokenFromMail((await waitForMail(t.ctx.db, user.email)).textBody);
    nowMs += t.ctx.auth.resetTokenTtlMs + 1000;
    const res = await client
      .post('/api/auth/password-reset/confirm')
      .send({ token, password: 'too late for this one' });
    expect(res.status).toBe(400);
    expect(ApiErrorSchema.parse(res.body).error.code).toBe('RESET_TOKEN_INVALID');
  });

  it('lets only the newest link work when several were requested', async () => {
    const { user } = await createTestUser(t.ctx);
    const client = await TestClient.create(createApp(t.ctx));
    await client.post('/api/auth/password-reset').send({ email: user.email });
    const first = tokenFromMail((await waitForMail(t.ctx.db, user.email)).textBody);
    await t.ctx.db.delete(mailMessages);
    await client.post('/api/auth/password-reset').send({ email: user.email });
    const second = tokenFromMail((await waitForMail(t.ctx.db, user.email)).textBody);
    expect(
      (
        await client
          .post('/api/auth/password-reset/confirm')
          .send({ token: first, password: 'first link phrase' })
      ).status,
    ).toBe(400);
    expect(
      (
        await client
          .post('/api/auth/password-reset/confirm')
          .send({ token: second, password: 'second link phrase' })
      ).status,
    ).toBe(204);
  });

  it('answers an unknown address with the same 202 and sends nothing', async () => {
    const { user } = await createTestUser(t.ctx);
    const client = await TestClient.create(createApp(t.ctx));
    const unknown = await client
      .post('/api/auth/password-reset')
      .send({ email: 'nobody@example.test' });
    const known = await client.post('/api/auth/password-reset').send({ email: user.email });
    expect([unknown.status, known.status]).toEqual([202, 202]);
    expect(unknown.body).toEqual(known.body);
    await waitForMail(t.ctx.db, user.email);
    const rows = await t.ctx.db.select().from(mailMessages);
    expect(rows.map((row) => row.toAddresses)).toEqual([user.email]);
    expect(
      await t.ctx.db.select().from(passwordResets).where(eq(passwordResets.userId, user.id)),
    ).toHaveLength(1);
  });
});
