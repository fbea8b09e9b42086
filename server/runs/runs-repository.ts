/** Drizzle queries for runs. The `series` bytes are read only by the series endpoints. */
import { and, asc, count, desc, eq, getTableColumns, inArray, sql, type SQL } from 'drizzle-orm';
import { RUN_EVENTS_SHOWN, type RunListQuery } from '../../shared/contracts/runs';
import type { Database } from '../db/database';
import { runs, users } from '../db/schema';

/** A run row without its series bytes. */
export type RunRow = Omit<typeof runs.$inferSelect, 'series'>;

const { series: _series, ...runColumns } = getTableColumns(runs);

/** Statuses of a run that has not ended yet. */
export const ACTIVE_RUN_STATUSES = ['queued', 'running'] as const;

/** Inserts a queued run with its normalised scenario snapshot. */
export async function insertRun(
  db: Database,
  values: {
    systemId: string;
    createdBy: string;
    durationS: number;
    systemVersion: number;
    scenario: unknown;
  },
): Promise<RunRow> {
  const [row] = await db
    .insert(runs)
    .values({ ...values, status: 'queued' })
    .returning(runColumns);
  if (!row) throw new Error('Inserting a run returned no row.');
  return row;
}

/** Marks a queued run as running (no effect once it has moved on). */
export async function markRunRunning(db: Database, id: string): Promise<void> {
  await db
    .update(runs)
    .set({ status: 'running' })
    .where(and(eq(runs.id, id), eq(runs.status, 'queued')));
}

/** What an ended run stores. */
export interface RunEnd {
  status: string;
  error: string | null;
  summary: unknown;
  verdicts: unknown;
  events: unknown;
  stats: unknown;
  verdict: string | null;
  series: Buffer | null;
}

/** Stores an ended run's outcome; returns false when the run was deleted meanwhile. */
export async function finishRun(db: Database, id: string, end: RunEnd): Promise<boolean> {
  const updated = await db
    .update(runs)
    .set({ ...end, finishedAt: sql`now()` })
    .where(eq(runs.id, id))
    .returning({ id: runs.id });
  return updated.length > 0;
}

/** A run without its series, its events cut to the first RUN_EVENTS_SHOWN, and their full count. */
export async function findRun(
  db: Database,
  id: string,
): Promise<(RunRow & { eventCount: number }) | undefined> {
  const [row] = await db
    .select({
      ...runColumns,
      events: sql<unknown>`jsonb_path_query_array(${runs.events}, ${`$[0 to ${RUN_EVENTS_SHOWN - 1}]`}::jsonpath)`,
      eventCount: sql<number>`coalesce(jsonb_array_length(${runs.events}), 0)::int`,
    })
    .from(runs)
    .where(eq(runs.id, id));
  return row;
}

/** All of a run's stored events (null before it ends), or undefined when the run is gone. */
export async function findRunEvents(
  db: Database,
  id: string,
): Promise<{ events: unknown } | undefined> {
  const [row] = await db.select({ events: runs.events }).from(runs).where(eq(runs.id, id));
  return row;
}

/** A run's stored series bytes (null when it has none), or undefined when the run is gone. */
export async function findRunSeries(
  db: Database,
  id: string,
): Promise<{ series: Buffer | null } | undefined> {
  const [row] = await db.select({ series: runs.series }).from(runs).where(eq(runs.id, id));
  return row;
}

/** Deletes a run. */
export async function deleteRunRow(db: Database, id: string): Promise<void> {
  await db.delete(runs).where(eq(runs.id, id));
}

const VERDICT_RANK = sql`case ${runs.verdict} when 'ok' then 0 when 'warning' then 1 when 'fails' then 2 else -1 end`;

function orderFor(sort: RunListQuery['sort']): SQL[] {
  const descending = sort.startsWith('-');
  const key = sort.replace(/^-/, '');
  const column =
    key === 'durationS'
      ? runs.durationS
      : key === 'status'
        ? runs.status
        : key === 'verdict'
          ? VERDICT_RANK
          : runs.createdAt;
  const primary = descending ? desc(column) : asc(column);
  return [primary, desc(runs.createdAt), desc(runs.id)];
}

/** The columns of a runs-table row. */
const listColumns = {
  id: runs.id,
  status: runs.status,
  durationS: runs.durationS,
  systemVersion: runs.systemVersion,
  verdict: runs.verdict,
  error: runs.error,
  createdBy: runs.createdBy,
  createdAt: runs.createdAt,
  finishedAt: runs.finishedAt,
  createdByName: users.name,
};

/** A runs-table row: no result bodies. */
export type RunListRow = Pick<
  RunRow,
  | 'id'
  | 'status'
  | 'durationS'
  | 'systemVersion'
  | 'verdict'
  | 'error'
  | 'createdBy'
  | 'createdAt'
  | 'finishedAt'
> & { createdByName: string | null };

/** A page of a system's runs (with the starter's name) and the total matching count. */
export async function listRunsOfSystem(
  db: Database,
  systemId: string,
  query: RunListQuery,
): Promise<{ rows: RunListRow[]; total: number }> {
  const filters = [eq(runs.systemId, systemId)];
  if (query.status) filters.push(eq(runs.status, query.status));
  if (query.verdict) filters.push(eq(runs.verdict, query.verdict));
  const where = and(...filters);
  const rows = await db
    .select(listColumns)
    .from(runs)
    .leftJoin(users, eq(users.id, runs.createdBy))
    .where(where)
    .orderBy(...orderFor(query.sort))
    .limit(query.pageSize)
    .offset((query.page - 1) * query.pageSize);
  const [totals] = await db.select({ n: count() }).from(runs).where(where);
  return { rows, total: totals?.n ?? 0 };
}

/** The verdict of the system's most recent completed run, or null when none completed. */
export async function latestCompletedVerdict(
  db: Database,
  systemId: string,
): Promise<string | null> {
  const [row] = await db
    .select({ verdict: runs.verdict })
    .from(runs)
    .where(and(eq(runs.systemId, systemId), eq(runs.status, 'completed')))
    .orderBy(desc(runs.createdAt), desc(runs.id))
    .limit(1);
  return row?.verdict ?? null;
}

/** Ids of a system's runs that have not ended. */
export async function activeRunIdsOfSystem(db: Database, systemId: string): Promise<string[]> {
  const rows = await db
    .select({ id: runs.id })
    .from(runs)
    .where(and(eq(runs.systemId, systemId), inArray(runs.status, [...ACTIVE_RUN_STATUSES])));
  return rows.map((r) => r.id);
}

/** How many runs a user has that have not ended. */
export async function countActiveRunsOfUser(db: Database, userId: string): Promise<number> {
  const [row] = await db
    .select({ n: count() })
    .from(runs)
    .where(and(eq(runs.createdBy, userId), inArray(runs.status, [...ACTIVE_RUN_STATUSES])));
  return row?.n ?? 0;
}

/** Ends runs left queued or running by a previous server process; returns how many. */
export async function failInterruptedRuns(db: Database, error: string): Promise<number> {
  const rows = await db
    .update(runs)
    .set({ status: 'failed', error, finishedAt: sql`now()` })
    .where(inArray(runs.status, [...ACTIVE_RUN_STATUSES]))
    .returning({ id: runs.id });
  return rows.length;
}
