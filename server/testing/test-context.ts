/**
 * Test support: a fresh migrated database per test (cloned from the template made in global
 * setup) and an AppContext around it. Used by server and cross-module tests only.
 */
import { randomBytes } from 'node:crypto';
import { readFileSync } from 'node:fs';
import pg from 'pg';
import { pino } from 'pino';
import { inject } from 'vitest';
import type { AppContext } from '../app-context';
import { loadConfig } from '../config';
import { openDatabase, type OpenDatabase } from '../db/database';
import {
  DEFAULT_AUTH_LIMITS,
  authSettingsFromConfig,
  type AuthSettings,
} from '../auth/auth-settings';
import { startLocalSmtpServer } from '../mail/local-smtp-server';
import { createLocalMailer } from '../mail/mailer';

/** A test's database and context; call `close()` in afterEach. */
export interface TestContext {
  ctx: AppContext;
  database: OpenDatabase;
  close(): Promise<void>;
}

/**
 * Opens a fresh migrated database: a clone of the PGlite template, or, when TEST_DATABASE_URL
 * names a PostgreSQL server, a new database created on it for this test and dropped on close.
 */
export async function openTestDatabase(): Promise<OpenDatabase> {
  const adminUrl = process.env['TEST_DATABASE_URL'];
  if (adminUrl) return openFreshPostgres(adminUrl);
  const tar = readFileSync(inject('templateDbPath'));
  return openDatabase({ kind: 'pglite', loadDataDir: new Blob([tar]) });
}

async function openFreshPostgres(adminUrl: string): Promise<OpenDatabase> {
  const name = `tw_test_${randomBytes(6).toString('hex')}`;
  const admin = new pg.Client({ connectionString: adminUrl });
  await admin.connect();
  await admin.query(`create database ${name}`);
  await admin.end();
  const url = new URL(adminUrl);
  url.pathname = `/${name}`;
  const open = await openDatabase({ kind: 'postgres', url: url.toString() });
  return {
    ...open,
    close: async () => {
      await open.close();
      const dropper = new pg.Client({ connectionString: adminUrl });
      await dropper.connect();
      await dropper.query(`drop database if exists ${name} with (force)`);
      await dropper.end();
    },
  };
}

/**
 * Test auth settings: bcrypt cost 4 (fast; the cost is stored in each hash) and rate limits high
 * enough that only tests about rate limiting meet them. Override any of them per test.
 */
function testAuthSettings(
  config: ReturnType<typeof loadConfig>,
  overrides: Partial<AuthSettings>,
): AuthSettings {
  const base = authSettingsFromConfig(config, randomBytes(32).toString('hex'));
  const generous = {
    ...DEFAULT_AUTH_LIMITS,
    loginFailuresPerIp: 10_000,
    loginFailuresPerAccount: 10_000,
    registrationsPerIp: 10_000,
    resetsPerIp: 10_000,
    resetsPerAccount: 10_000,
  };
  return { ...base, bcryptCost: 4, limits: generous, ...overrides };
}

/**
 * Builds an AppContext over a fresh test database, with a real SMTP server on a free loopback
 * port storing mail in that database (read it from `mail_messages`).
 */
export async function createTestContext(
  env: NodeJS.ProcessEnv = {},
  overrides: { auth?: Partial<AuthSettings> } = {},
): Promise<TestContext> {
  const database = await openTestDatabase();
  const config = loadConfig({
    NODE_ENV: 'test',
    TIDEWRIGHT_DATA: '/nonexistent',
    STATIC_DIR: '/nonexistent',
    ...env,
  });
  const auth = testAuthSettings(config, overrides.auth ?? {});
  const smtp = await startLocalSmtpServer(database.db, 0);
  const mailer = createLocalMailer(smtp.port, auth.mailFrom);
  const ctx: AppContext = {
    db: database.db,
    dbKind: database.kind,
    config,
    logger: pino({ level: 'silent' }),
    version: 'test',
    auth,
    mailer,
  };
  const close = async (): Promise<void> => {
    mailer.close();
    await smtp.close();
    await database.close();
  };
  return { ctx, database, close };
}
