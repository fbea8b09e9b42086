/** A snapshot of every table but `sessions`, to prove a denied request changed nothing. */
import { getTableName, is, sql } from 'drizzle-orm';
import { PgTable } from 'drizzle-orm/pg-core';
import type { Database } from '../../server/db/database';
import * as schema from '../../server/db/schema';

/** Tables a request may touch without changing anybody's data (session expiry is renewed). */
const IGNORED = new Set(['sessions']);

function tables(): PgTable[] {
  return Object.values(schema as Record<string, unknown>).filter((value): value is PgTable =>
    is(value, PgTable),
  );
}

/** Every row of every table (except sessions), as comparable JSON keyed by table name. */
export async function snapshotDatabase(db: Database): Promise<Record<string, string[]>> {
  const out: Record<string, string[]> = {};
  for (const table of tables()) {
    const name = getTableName(table);
    if (IGNORED.has(name)) continue;
    const rows = await db.select().from(table);
    out[name] = rows
      .map((row) =>
        JSON.stringify(row, (_key, value: unknown) =>
          Buffer.isBuffer(value) ? value.toString('base64') : value,
        ),
      )
      .sort();
  }
  return out;
}

/**
 * A digest, per table, of the rows whose JSON mentions any of `ids` (e.g. a bystander's user
 * and resource ids), computed in the database so that checking it after every request is cheap.
 */
export async function digestRowsMentioning(
  db: Database,
  ids: readonly string[],
): Promise<Record<string, string | null>> {
  const pattern = ids.map((id) => id.replace(/[^0-9a-zA-Z-]/g, '')).join('|');
  const out: Record<string, string | null> = {};
  for (const table of tables()) {
    const name = getTableName(table);
    if (IGNORED.has(name)) continue;
    const result = await db.execute<{ digest: string | null }>(
      sql`select md5(string_agg(j, ',' order by j)) as digest from (select row_to_json(t)::text as j from ${sql.identifier(name)} t) rows where j ~ ${pattern}`,
    );
    out[name] =
      (result as unknown as { rows: { digest: string | null }[] }).rows[0]?.digest ?? null;
  }
  return out;
}
