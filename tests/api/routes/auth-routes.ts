/** Route table entries: `/api/auth/*`. */
import { randomBytes, randomUUID } from 'node:crypto';
import { hashResetToken } from '../../../server/auth/password-reset-service';
import { passwordResets } from '../../../server/db/schema';
import { TEST_PASSWORD } from '../../../server/testing/test-client';
import type { RouteFixture, RouteGroup } from '../route-table';

async function resetTokenFor(fixture: RouteFixture): Promise<string> {
  const token = randomBytes(32).toString('base64url');
  await fixture.ctx.db.insert(passwordResets).values({
    userId: fixture.owner.id,
    tokenHash: hashResetToken(token),
    expiresAt: new Date(Date.now() + 3_600_000),
  });
  return token;
}

/** Registration, sign-in and reset are public; the rest need a session. */
export const authRoutes: RouteGroup = {
  name: 'auth',
  routes: [
    {
      method: 'post',
      path: '/api/auth/register',
      access: 'public',
      body: () => ({
        name: 'New Grower',
        email: `new-${randomUUID()}@example.test`,
        password: 'siphon starts at the top',
      }),
      okStatus: 201,
    },
    {
      method: 'post',
      path: '/api/auth/login',
      access: 'public',
      body: (f) => ({ email: f.owner.email, password: TEST_PASSWORD }),
      okStatus: 200,
    },
    { method: 'post', path: '/api/auth/logout', access: 'signed-in', okStatus: 204 },
    { method: 'get', path: '/api/auth/me', access: 'signed-in', okStatus: 200 },
    {
      method: 'patch',
      path: '/api/auth/me',
      access: 'signed-in',
      body: () => ({ units: 'us' }),
      okStatus: 200,
    },
    {
      method: 'post',
      path: '/api/auth/password-reset',
      access: 'public',
      body: (f) => ({ email: f.owner.email }),
      okStatus: 202,
    },
    {
      method: 'post',
      path: '/api/auth/password-reset/confirm',
      access: 'public',
      body: async (f) => ({ token: await resetTokenFor(f), password: 'a brand new long phrase' }),
      okStatus: 204,
    },
  ],
};
