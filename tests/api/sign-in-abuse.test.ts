/** Sign-in under abuse: no account enumeration by answer or timing, and rate limits with Retry-After. */
import bcrypt from 'bcryptjs';
import { afterEach, describe, expect, it } from 'vitest';
import { ApiErrorSchema } from '../../shared/contracts/api-error';
import { createApp } from '../../server/app';
import { insertUser } from '../../server/auth/user-repository';
import { DEFAULT_AUTH_LIMITS } from '../../server/auth/auth-settings';
import { TestClient, createTestUser } from '../../server/testing/test-client';
import { createTestContext, type TestContext } from '../../server/testing/test-context';

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)] ?? Number.NaN;
}

describe('sign-in under abuse', () => {
  let t: TestContext | undefined;
  afterEach(async () => {
    await t?.close();
  });

  it('answers a wrong password and an unknown address with the same 401, in the same time order', async () => {
    t = await createTestContext({}, { auth: { bcryptCost: 12 } });
    await insertUser(t.ctx.db, {
      email: 'known@example.test',
      name: 'Known',
      passwordHash: await bcrypt.hash('the right long phrase', 12),
    });
    const client = await TestClient.create(createApp(t.ctx));
    const timed = async (email: string): Promise<{ ms: number; status: number; body: unknown }> => {
      const start = performance.now();
      const res = await client
        .post('/api/auth/login')
        .send({ email, password: 'a wrong long phrase' });
      return { ms: performance.now() - start, status: res.status, body: res.body };
    };
    await timed('warm-up@example.test');
    const wrong: number[] = [];
    const unknown: number[] = [];
    let lastWrong: unknown;
    let lastUnknown: unknown;
    for (let i = 0; i < 3; i++) {
      const a = await timed('known@example.test');
      const b = await timed(`nobody-${i}@example.test`);
      expect([a.status, b.status]).toEqual([401, 401]);
      wrong.push(a.ms);
      unknown.push(b.ms);
      lastWrong = a.body;
      lastUnknown = b.body;
    }
    expect(lastUnknown).toEqual(lastWrong);
    expect(ApiErrorSchema.parse(lastWrong).error.code).toBe('INVALID_CREDENTIALS');
    // Both pay one cost-12 bcrypt comparison; without the decoy hash the unknown address would answer ~100× faster.
    const ratio = median(unknown) / median(wrong);
    expect(ratio).toBeGreaterThan(0.5);
    expect(ratio).toBeLessThan(2);
  });

  it('limits failed sign-ins per account with a 429 and Retry-After, from any address', async () => {
    t = await createTestContext(
      {},
      {
        auth: {
          limits: { ...DEFAULT_AUTH_LIMITS, loginFailuresPerAccount: 3, loginFailuresPerIp: 100 },
        },
      },
    );
    const { user, password } = await createTestUser(t.ctx);
    const client = await TestClient.create(createApp(t.ctx));
    for (let i = 0; i < 3; i++) {
      expect(
        (
          await client
            .post('/api/auth/login')
            .send({ email: user.email, password: 'not the password' })
        ).status,
      ).toBe(401);
    }
    const blocked = await client.post('/api/auth/login').send({ email: user.email, password });
    expect(blocked.status).toBe(429);
    expect(ApiErrorSchema.parse(blocked.body).error.code).toBe('RATE_LIMITED');
    expect(Number(blocked.headers['retry-after'])).toBeGreaterThan(0);
    expect(Number(blocked.headers['retry-after'])).toBeLessThanOrEqual(
      DEFAULT_AUTH_LIMITS.windowMs / 1000,
    );
    const otherAccount = await createTestUser(t.ctx);
    expect(
      (await client.post('/api/auth/login').send({ email: otherAccount.user.email, password }))
        .status,
    ).toBe(200);
  });

  it('limits failed sign-ins per IP across accounts, and successful sign-ins do not count', async () => {
    t = await createTestContext(
      {},
      {
        auth: {
          limits: { ...DEFAULT_AUTH_LIMITS, loginFailuresPerIp: 4, loginFailuresPerAccount: 100 },
        },
      },
    );
    const { user, password } = await createTestUser(t.ctx);
    const client = await TestClient.create(createApp(t.ctx));
    for (let i = 0; i < 5; i++)
      expect(
        (await client.post('/api/auth/login').send({ email: user.email, password })).status,
      ).toBe(200);
    for (let i = 0; i < 4; i++) {
      expect(
        (
          await client
            .post('/api/auth/login')
            .send({ email: `guess-${i}@example.test`, password: 'guessing here' })
        ).status,
      ).toBe(401);
    }
    const blocked = await client.post('/api/auth/login').send({ email: user.email, password });
    expect(blocked.status).toBe(429);
    expect(blocked.headers['retry-after']).toMatch(/^\d+$/);
  });

  it('refuses a disabled account with the same 401 as a wrong password', async () => {
    t = await createTestContext();
    const { user, password } = await createTestUser(t.ctx);
    const app = createApp(t.ctx);
    const admin = await createTestUser(t.ctx, { role: 'admin' });
    const adminClient = await TestClient.create(app);
    await adminClient.signIn(admin.user.email);
    expect(
      (await adminClient.patch(`/api/admin/users/${user.id}`).send({ disabled: true })).status,
    ).toBe(200);
    const client = await TestClient.create(app);
    const res = await client.post('/api/auth/login').send({ email: user.email, password });
    expect(res.status).toBe(401);
    expect(ApiErrorSchema.parse(res.body).error.code).toBe('INVALID_CREDENTIALS');
  });
});
