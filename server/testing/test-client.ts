/**
 * Test support for API tests: a supertest agent that keeps cookies (session and XSRF-TOKEN) and
 * sends the X-XSRF-TOKEN header on every request, plus users made straight in the database.
 *
 * @example
 *   const app = createApp(t.ctx);
 *   const { client, user } = await signedInClient(app, t.ctx, { role: 'instructor' });
 *   const res = await client.post('/api/systems').send({ name: 'Bench rig' });
 */
import { randomUUID } from 'node:crypto';
import bcrypt from 'bcryptjs';
import type { Express } from 'express';
import request from 'supertest';
import { XSRF_COOKIE, XSRF_HEADER, type User, type UserRole } from '../../shared/contracts/auth';
import type { AppContext } from '../app-context';
import { insertUser, toUser } from '../auth/user-repository';

/** The password `createTestUser` gives users unless told otherwise. */
export const TEST_PASSWORD = 'correct horse battery staple';

function xsrfFromSetCookie(setCookie: string[] | string | undefined): string | undefined {
  const lines = Array.isArray(setCookie) ? setCookie : setCookie ? [setCookie] : [];
  for (const line of lines) {
    const match = new RegExp(`^${XSRF_COOKIE}=([^;]*)`).exec(line);
    if (match?.[1]) return decodeURIComponent(match[1]);
  }
  return undefined;
}

/** A browser-like API client: cookies kept between requests, CSRF header always sent. */
export class TestClient {
  private constructor(
    /** The underlying supertest agent (cookies included), for anything the methods below lack. */
    readonly agent: ReturnType<typeof request.agent>,
    /** The XSRF-TOKEN cookie value this client echoes. */
    readonly xsrfToken: string,
  ) {}

  /** A signed-out client that already holds an XSRF-TOKEN cookie. */
  static async create(app: Express): Promise<TestClient> {
    const agent = request.agent(app);
    const res = await agent.get('/api/health');
    const token = xsrfFromSetCookie(res.headers['set-cookie']);
    if (!token)
      throw new Error(
        'GET /api/health set no XSRF-TOKEN cookie; is csrfProtection mounted on /api?',
      );
    return new TestClient(agent, token);
  }

  /** GET with the session cookie. */
  get(path: string): request.Test {
    return this.agent.get(path).set(XSRF_HEADER, this.xsrfToken);
  }
  /** POST with the session cookie and the CSRF header; chain `.send(body)` or `.attach(...)`. */
  post(path: string): request.Test {
    return this.agent.post(path).set(XSRF_HEADER, this.xsrfToken);
  }
  /** PUT with the session cookie and the CSRF header. */
  put(path: string): request.Test {
    return this.agent.put(path).set(XSRF_HEADER, this.xsrfToken);
  }
  /** PATCH with the session cookie and the CSRF header. */
  patch(path: string): request.Test {
    return this.agent.patch(path).set(XSRF_HEADER, this.xsrfToken);
  }
  /** DELETE with the session cookie and the CSRF header. */
  delete(path: string): request.Test {
    return this.agent.delete(path).set(XSRF_HEADER, this.xsrfToken);
  }
  /** Any method by name (lower-case HTTP method), e.g. for table-driven tests. */
  send(method: 'get' | 'post' | 'put' | 'patch' | 'delete', path: string): request.Test {
    return this[method](path);
  }

  /** Signs in through `POST /api/auth/login`; throws with the answer when it is not 200. */
  async signIn(email: string, password: string = TEST_PASSWORD): Promise<User> {
    const res = await this.post('/api/auth/login').send({ email, password });
    if (res.status !== 200)
      throw new Error(`Sign-in as ${email} answered ${res.status}: ${JSON.stringify(res.body)}`);
    return (res.body as { user: User }).user;
  }
}

/** What a test user is made of; everything has a default. */
export interface TestUserOptions {
  role?: UserRole;
  email?: string;
  name?: string;
  password?: string;
}

/** Inserts a user directly (bcrypt cost 4, fast) and returns it with its password. */
export async function createTestUser(
  ctx: AppContext,
  options: TestUserOptions = {},
): Promise<{ user: User; password: string }> {
  const role = options.role ?? 'member';
  const password = options.password ?? TEST_PASSWORD;
  const email = options.email ?? `${role}-${randomUUID().slice(0, 8)}@example.test`;
  const row = await insertUser(ctx.db, {
    email,
    name: options.name ?? `Test ${role}`,
    role,
    passwordHash: await bcrypt.hash(password, 4),
  });
  if (!row) throw new Error(`A test user ${email} already exists.`);
  return { user: toUser(row), password };
}

/** A new user of `role` and a client signed in as them. */
export async function signedInClient(
  app: Express,
  ctx: AppContext,
  options: TestUserOptions = {},
): Promise<{ client: TestClient; user: User }> {
  const { user, password } = await createTestUser(ctx, options);
  const client = await TestClient.create(app);
  await client.signIn(user.email, password);
  return { client, user };
}
