import request from 'supertest';
import { eq } from 'drizzle-orm';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { ApiErrorSchema } from '../../shared/contracts/api-error';
import { MeResponseSchema } from '../../shared/contracts/auth';
import { createApp } from '../app';
import { sessions, users } from '../db/schema';
import { createTestContext, type TestContext } from '../testing/test-context';
import { TestClient, createTestUser } from '../testing/test-client';

describe('the auth API', () => {
  let t: TestContext;
  beforeEach(async () => {
    t = await createTestContext();
  });
  afterEach(async () => {
    await t.close();
  });

  it('registers a member, signs them in, and stores the session in the database', async () => {
    const client = await TestClient.create(createApp(t.ctx));
    const res = await client.post('/api/auth/register').send({
      name: 'Rowan Reed',
      email: '  Rowan@Example.TEST ',
      password: 'gravel beds drain fast',
    });
    expect(res.status).toBe(201);
    const { user } = MeResponseSchema.parse(res.body);
    expect(user).toMatchObject({
      email: 'rowan@example.test',
      name: 'Rowan Reed',
      role: 'member',
      units: 'metric',
    });
    const me = await client.get('/api/auth/me');
    expect(MeResponseSchema.parse(me.body).user.id).toBe(user.id);
    const rows = await t.ctx.db.select().from(sessions);
    expect(rows).toHaveLength(1);
    expect((rows[0]?.sess as { userId?: string }).userId).toBe(user.id);
    const [stored] = await t.ctx.db.select().from(users).where(eq(users.id, user.id));
    expect(stored?.passwordHash).toMatch(/^\$2[aby]\$04\$/);
  });

  it('refuses a second account on the same address, whatever its case', async () => {
    await createTestUser(t.ctx, { email: 'taken@example.test' });
    const client = await TestClient.create(createApp(t.ctx));
    const res = await client
      .post('/api/auth/register')
      .send({ name: 'Copy', email: 'TAKEN@example.test', password: 'another long phrase' });
    expect(res.status).toBe(409);
    expect(ApiErrorSchema.parse(res.body).error.code).toBe('EMAIL_TAKEN');
  });

  it('names each weak-password rule that failed', async () => {
    const client = await TestClient.create(createApp(t.ctx));
    const short = await client
      .post('/api/auth/register')
      .send({ name: 'A', email: 'a@example.test', password: 'short' });
    expect(short.status).toBe(400);
    expect(ApiErrorSchema.parse(short.body).error.fields?.map((f) => f.path)).toEqual(['password']);
    const repeated = await client
      .post('/api/auth/register')
      .send({ name: 'A', email: 'a@example.test', password: 'aaaaaaaaaaaa' });
    expect(ApiErrorSchema.parse(repeated.body).error.fields?.[0]?.message).toMatch(
      /different characters/,
    );
    const ownName = await client
      .post('/api/auth/register')
      .send({ name: 'A', email: 'marigold@example.test', password: 'marigold-2024-xyz' });
    expect(ApiErrorSchema.parse(ownName.body).error.fields?.[0]?.message).toMatch(/e-mail name/);
    expect(await t.ctx.db.select().from(users)).toHaveLength(0);
  });

  it('signs in with the right password on a new session id and out again', async () => {
    const { user, password } = await createTestUser(t.ctx);
    const client = await TestClient.create(createApp(t.ctx));
    const first = await client.post('/api/auth/login').send({ email: user.email, password });
    expect(first.status).toBe(200);
    const sidBefore = (await t.ctx.db.select().from(sessions))[0]?.sid;
    await client.signIn(user.email, password);
    const rows = await t.ctx.db.select().from(sessions);
    expect(rows).toHaveLength(1);
    expect(rows[0]?.sid).not.toBe(sidBefore);
    const out = await client.post('/api/auth/logout');
    expect(out.status).toBe(204);
    expect(await t.ctx.db.select().from(sessions)).toHaveLength(0);
    expect((await client.get('/api/auth/me')).status).toBe(401);
  });

  it('sets an httpOnly SameSite=Lax session cookie, Secure when the proxy says TLS', async () => {
    const { user, password } = await createTestUser(t.ctx);
    const proxied = await createTestContext({ TRUST_PROXY: '1' });
    try {
      await createTestUser(proxied.ctx, { email: user.email, password });
      const app = createApp(proxied.ctx);
      const csrf = await request(app).get('/api/health').set('X-Forwarded-Proto', 'https');
      const xsrfCookie = String(csrf.headers['set-cookie']?.[0]).split(';')[0] ?? '';
      const res = await request(app)
        .post('/api/auth/login')
        .set('X-Forwarded-Proto', 'https')
        .set('Cookie', xsrfCookie)
        .set('X-XSRF-TOKEN', decodeURIComponent(xsrfCookie.split('=')[1] ?? ''))
        .send({ email: user.email, password });
      expect(res.status).toBe(200);
      const cookie = (res.headers['set-cookie'] as unknown as string[]).find((c) =>
        c.startsWith('tidewright.sid='),
      );
      expect(cookie).toMatch(/HttpOnly/);
      expect(cookie).toMatch(/SameSite=Lax/);
      expect(cookie).toMatch(/Secure/);
    } finally {
      await proxied.close();
    }
  });

  it('refuses a mutating request without the matching X-XSRF-TOKEN header', async () => {
    const { user, password } = await createTestUser(t.ctx);
    const client = await TestClient.create(createApp(t.ctx));
    const bare = await client.agent.post('/api/auth/login').send({ email: user.email, password });
    expect(bare.status).toBe(403);
    expect(ApiErrorSchema.parse(bare.body).error.code).toBe('CSRF_FAILED');
    const wrong = await client.agent
      .post('/api/auth/login')
      .set('X-XSRF-TOKEN', 'forged.value')
      .send({ email: user.email, password });
    expect(wrong.status).toBe(403);
    expect(await t.ctx.db.select().from(sessions)).toHaveLength(0);
  });
});
