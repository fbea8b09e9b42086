/** A snapshot of every table but `sessions`, to prove a denied request changed nothing. */
import { getTableName, is } from 'drizzle-orm';
import { PgTable } from 'drizzle-orm/pg-core';
import type { Database } from '../../server/db/database';
import * as schema from '../../server/db/schema';

/** Tables a request may touch without changing anybody's data (session expiry is renewed). */
const IGNORED = new Set(['sessions']);

function tables(): PgTable[] {
  return Object.values(schema as Record<string, unknown>).filter((value): value is PgTable => is(value, PgTable));
}

/** Every row of every table (except sessions), as comparable JSON keyed by table name. */
export async function snapshotDatabase(db: Database): Promise<Record<string, string[]>> {
  const out: Record<string, string[]> = {};
  for (const table of tables()) {
    const name = getTableName(table);
    if (IGNORED.has(name)) continue;
    const rows = await db.select().from(table);
    out[name] = rows.map((row) => JSON.stringify(row, (_key, value: unknown) => (Buffer.isBuffer(value) ? value.toString('base64') : value))).sort();
  }
  return out;
}
