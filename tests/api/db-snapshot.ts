/**
 * Digests of the database, to prove a request changed nothing: per table (except `sessions`), an
 * md5 of its rows' JSON, computed inside the database in one query so a test can take one
 * before and after every request. A mismatch names the tables that changed.
 */
import { getTableName, is, sql, type SQL } from 'drizzle-orm';
import { PgTable } from 'drizzle-orm/pg-core';
import type { Database } from '../../server/db/database';
import * as schema from '../../server/db/schema';

/** Tables a request may touch without changing anybody's data (session expiry is renewed). */
const IGNORED = new Set(['sessions']);

function tableNames(): string[] {
  return Object.values(schema as Record<string, unknown>)
    .filter((value): value is PgTable => is(value, PgTable))
    .map((table) => getTableName(table))
    .filter((name) => !IGNORED.has(name))
    .sort();
}

async function digest(
  db: Database,
  pattern: string | null,
): Promise<Record<string, string | null>> {
  const perTable: SQL[] = tableNames().map(
    (name) =>
      sql`select ${name}::text as name, md5(string_agg(j, ',' order by j)) as digest from (select row_to_json(t)::text as j from ${sql.identifier(name)} t) rows ${pattern === null ? sql`` : sql`where j ~ ${pattern}`}`,
  );
  const result = await db.execute<{ name: string; digest: string | null }>(
    sql.join(perTable, sql` union all `),
  );
  const rows = (result as unknown as { rows: { name: string; digest: string | null }[] }).rows;
  return Object.fromEntries(rows.map((row) => [row.name, row.digest]));
}

/** Every table's digest (null for an empty table). */
export function digestDatabase(db: Database): Promise<Record<string, string | null>> {
  return digest(db, null);
}

/** Every table's digest over only the rows whose JSON mentions one of `ids` (e.g. a bystander's). */
export function digestRowsMentioning(
  db: Database,
  ids: readonly string[],
): Promise<Record<string, string | null>> {
  return digest(db, ids.map((id) => id.replace(/[^0-9a-zA-Z-]/g, '')).join('|'));
}
