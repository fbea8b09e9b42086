/**
 * Opens the database: an embedded PGlite folder (the default) or a PostgreSQL server when
 * DATABASE_URL is set. Both run the same Drizzle schema and the same committed migrations.
 */
import { mkdirSync } from 'node:fs';
import { dirname } from 'node:path';
import { fileURLToPath } from 'node:url';
import { PGlite } from '@electric-sql/pglite';
import { drizzle as drizzlePglite } from 'drizzle-orm/pglite';
import { migrate as migratePglite } from 'drizzle-orm/pglite/migrator';
import { drizzle as drizzlePg } from 'drizzle-orm/node-postgres';
import { migrate as migratePg } from 'drizzle-orm/node-postgres/migrator';
import type { PgDatabase, PgQueryResultHKT } from 'drizzle-orm/pg-core';
import pg from 'pg';
import * as schema from './schema';
import { lockDataDir } from './lock';

/** The Drizzle handle every repository takes; the same type for both drivers. */
export type Database = PgDatabase<PgQueryResultHKT, typeof schema>;

/** An open database and how to close it. */
export interface OpenDatabase {
  db: Database;
  kind: 'pglite' | 'postgres';
  /** True when the database had no tables before this start's migrations ran. */
  isNew: boolean;
  close(): Promise<void>;
}

/** Where to find the database. */
export type DatabaseLocation =
  { kind: 'pglite'; dataDir?: string; loadDataDir?: Blob } | { kind: 'postgres'; url: string };

const migrationsFolder = fileURLToPath(new URL('../../drizzle', import.meta.url));

async function countMigrations(db: Database): Promise<number> {
  const result = await db.execute<{ n: number }>(
    `select count(*)::int as n from information_schema.tables where table_schema = 'drizzle' and table_name = '__drizzle_migrations'`,
  );
  const rows = (result as unknown as { rows: { n: number }[] }).rows;
  if (!rows[0] || rows[0].n === 0) return 0;
  const applied = await db.execute<{ n: number }>(
    `select count(*)::int as n from drizzle.__drizzle_migrations`,
  );
  return (applied as unknown as { rows: { n: number }[] }).rows[0]?.n ?? 0;
}

/** Opens, locks (PGlite folder) and migrates the database. */
export async function openDatabase(location: DatabaseLocation): Promise<OpenDatabase> {
  if (location.kind === 'postgres') {
    const pool = new pg.Pool({ connectionString: location.url, max: 10 });
    // An idle client dropped by the server (a restart, or a test database being dropped) must not
    // crash the process; the pool replaces it and the next query reports any lasting problem.
    pool.on('error', () => {});
    const db = drizzlePg({ client: pool, schema }) as unknown as Database;
    const isNew = (await countMigrations(db)) === 0;
    await migratePg(drizzlePg({ client: pool, schema }), { migrationsFolder });
    return { db, kind: 'postgres', isNew, close: () => pool.end() };
  }
  const release = location.dataDir ? lockDataDir(location.dataDir) : () => {};
  try {
    if (location.dataDir) mkdirSync(dirname(location.dataDir), { recursive: true });
    const client = location.loadDataDir
      ? await PGlite.create({ loadDataDir: location.loadDataDir })
      : location.dataDir
        ? await PGlite.create(location.dataDir)
        : await PGlite.create();
    const pgliteDb = drizzlePglite({ client, schema });
    const db = pgliteDb as unknown as Database;
    const isNew = (await countMigrations(db)) === 0;
    await migratePglite(pgliteDb, { migrationsFolder });
    return {
      db,
      kind: 'pglite',
      isNew,
      close: async () => {
        try {
          await client.close();
        } finally {
          release();
        }
      },
    };
  } catch (error) {
    release();
    throw error;
  }
}
