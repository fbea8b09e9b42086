import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { createApp } from '../app';
import { sessions } from '../db/schema';
import { TestClient, createTestUser } from '../testing/test-client';
import { createTestContext, type TestContext } from '../testing/test-context';

const MINUTE_MS = 60_000;

describe('sessions', () => {
  let t: TestContext;
  let nowMs: number;
  beforeEach(async () => {
    nowMs = Date.parse('2026-03-01T08:00:00Z');
    t = await createTestContext(
      {},
      {
        auth: {
          now: () => nowMs,
          idleTimeoutMs: 30 * MINUTE_MS,
          absoluteTimeoutMs: 8 * 60 * MINUTE_MS,
        },
      },
    );
  });
  afterEach(async () => {
    await t.close();
  });

  it('survive a restart: a new app over the same database and secret knows the session', async () => {
    const { user, password } = await createTestUser(t.ctx);
    const client = await TestClient.create(createApp(t.ctx));
    await client.signIn(user.email, password);
    const cookies = client.agent.jar.getCookies({
      domain: '127.0.0.1',
      path: '/',
      secure: false,
      script: false,
    });
    const restarted = await TestClient.create(createApp(t.ctx));
    for (const cookie of cookies) restarted.agent.jar.setCookie(cookie);
    const me = await restarted.get('/api/auth/me');
    expect(me.status).toBe(200);
    expect((me.body as { user: { id: string } }).user.id).toBe(user.id);
  });

  it('end after the idle timeout, and activity keeps them alive until then', async () => {
    const { user, password } = await createTestUser(t.ctx);
    const client = await TestClient.create(createApp(t.ctx));
    await client.signIn(user.email, password);
    for (let i = 0; i < 4; i++) {
      nowMs += 20 * MINUTE_MS;
      expect(
        (await client.get('/api/auth/me')).status,
        `after ${(i + 1) * 20} active minutes`,
      ).toBe(200);
    }
    nowMs += 31 * MINUTE_MS;
    expect((await client.get('/api/auth/me')).status).toBe(401);
    const rows = await t.ctx.db.select().from(sessions);
    expect(rows.filter((row) => (row.sess as { userId?: string }).userId === user.id)).toEqual([]);
  });

  it('let a timed-out session sign in again in the same browser', async () => {
    const { user, password } = await createTestUser(t.ctx);
    const client = await TestClient.create(createApp(t.ctx));
    await client.signIn(user.email, password);
    nowMs += 31 * MINUTE_MS;
    const again = await client.post('/api/auth/login').send({ email: user.email, password });
    expect(again.status).toBe(200);
    expect((await client.get('/api/auth/me')).status).toBe(200);
  });

  it('end after the absolute timeout however active they are', async () => {
    const { user, password } = await createTestUser(t.ctx);
    const client = await TestClient.create(createApp(t.ctx));
    await client.signIn(user.email, password);
    for (let minutes = 20; minutes < 8 * 60; minutes += 20) {
      nowMs += 20 * MINUTE_MS;
      expect((await client.get('/api/auth/me')).status, `after ${minutes} minutes`).toBe(200);
    }
    nowMs += 21 * MINUTE_MS; // 8 h 1 min after signing in
    expect((await client.get('/api/auth/me')).status).toBe(401);
  });

  it('end at once when an administrator disables the user', async () => {
    const { user, password } = await createTestUser(t.ctx);
    const app = createApp(t.ctx);
    const client = await TestClient.create(app);
    await client.signIn(user.email, password);
    const admin = await TestClient.create(app);
    await admin.signIn((await createTestUser(t.ctx, { role: 'admin' })).user.email);
    await admin.patch(`/api/admin/users/${user.id}`).send({ disabled: true });
    expect((await client.get('/api/auth/me')).status).toBe(401);
  });

  it('refuse a session cookie signed with another secret', async () => {
    const { user, password } = await createTestUser(t.ctx);
    const client = await TestClient.create(createApp(t.ctx));
    await client.signIn(user.email, password);
    const other = createApp({
      ...t.ctx,
      auth: { ...t.ctx.auth, sessionSecret: 'a different secret of enough length' },
    });
    const cookies = client.agent.jar.getCookies({
      domain: '127.0.0.1',
      path: '/',
      secure: false,
      script: false,
    });
    const stranger = await TestClient.create(other);
    for (const cookie of cookies.filter((c) => c.name === 'tidewright.sid'))
      stranger.agent.jar.setCookie(cookie);
    expect((await stranger.get('/api/auth/me')).status).toBe(401);
  });
});
