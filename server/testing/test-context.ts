/**
 * Test support: a fresh migrated database per test (cloned from the template made in global
 * setup) and an AppContext around it. Used by server and cross-module tests only.
 */
import { readFileSync } from 'node:fs';
import { pino } from 'pino';
import { inject } from 'vitest';
import type { AppContext } from '../app-context';
import { loadConfig } from '../config';
import { openDatabase, type OpenDatabase } from '../db/database';

/** A test's database and context; call `close()` in afterEach. */
export interface TestContext {
  ctx: AppContext;
  database: OpenDatabase;
  close(): Promise<void>;
}

/** Opens a clone of the migrated template database (or a PostgreSQL one when TEST_DATABASE_URL is set). */
export async function openTestDatabase(): Promise<OpenDatabase> {
  const url = process.env['TEST_DATABASE_URL'];
  if (url) return openDatabase({ kind: 'postgres', url });
  const tar = readFileSync(inject('templateDbPath'));
  return openDatabase({ kind: 'pglite', loadDataDir: new Blob([tar]) });
}

/** Builds an AppContext over a fresh test database. */
export async function createTestContext(env: NodeJS.ProcessEnv = {}): Promise<TestContext> {
  const database = await openTestDatabase();
  const config = loadConfig({ NODE_ENV: 'test', TIDEWRIGHT_DATA: '/nonexistent', STATIC_DIR: '/nonexistent', ...env });
  const ctx: AppContext = {
    db: database.db,
    dbKind: database.kind,
    config,
    logger: pino({ level: 'silent' }),
    version: 'test',
  };
  return { ctx, database, close: () => database.close() };
}
