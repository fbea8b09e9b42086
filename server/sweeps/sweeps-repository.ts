/**
 * Drizzle queries for sweeps. Cells are stored as one JSON object keyed by cell index, merged in
 * batches by whichever process ran them; `cells_done` is recounted from that object, so a batch
 * recorded twice (a retried job) counts once.
 */
import { and, count, desc, eq, getTableColumns, inArray, sql } from 'drizzle-orm';
import type { SweepCell, SweepStatus } from '../../shared/contracts/sweeps';
import type { Database } from '../db/database';
import { sweeps } from '../db/schema';

/** A sweep row with its cells. */
export type SweepRow = typeof sweeps.$inferSelect;
/** A sweep row without its cells. */
export type SweepHeadRow = Omit<SweepRow, 'cells'>;

const { cells: _cells, ...headColumns } = getTableColumns(sweeps);

/** Statuses of a sweep that has not ended. */
export const ACTIVE_SWEEP_STATUSES = ['queued', 'running'] as const;

/** Inserts a queued sweep with the system's normalised scenario and the resolved parameters. */
export async function insertSweep(
  db: Database,
  values: {
    systemId: string;
    createdBy: string;
    parameters: unknown;
    scenario: unknown;
    cellsTotal: number;
  },
): Promise<SweepHeadRow> {
  const [row] = await db
    .insert(sweeps)
    .values({ ...values, status: 'queued', cells: {} })
    .returning(headColumns);
  if (!row) throw new Error('Inserting a sweep returned no row.');
  return row;
}

/** A sweep with its cells. */
export async function findSweep(db: Database, id: string): Promise<SweepRow | undefined> {
  const [row] = await db.select().from(sweeps).where(eq(sweeps.id, id));
  return row;
}

/** A sweep without its cells. */
export async function findSweepHead(db: Database, id: string): Promise<SweepHeadRow | undefined> {
  const [row] = await db.select(headColumns).from(sweeps).where(eq(sweeps.id, id));
  return row;
}

/** A system's sweeps, newest first, without cells. */
export async function listSweepsOfSystem(
  db: Database,
  systemId: string,
  limit = 50,
): Promise<SweepHeadRow[]> {
  return db
    .select(headColumns)
    .from(sweeps)
    .where(eq(sweeps.systemId, systemId))
    .orderBy(desc(sweeps.createdAt))
    .limit(limit);
}

/** How many sweeps a user has queued or running. */
export async function countActiveSweepsOfUser(db: Database, userId: string): Promise<number> {
  const [row] = await db
    .select({ n: count() })
    .from(sweeps)
    .where(and(eq(sweeps.createdBy, userId), inArray(sweeps.status, [...ACTIVE_SWEEP_STATUSES])));
  return row?.n ?? 0;
}

/**
 * Merges finished cells into a sweep that is still going (a queued one becomes running) and
 * recounts its done cells. Returns the sweep's counts, or undefined when it has ended or is gone.
 */
export async function recordCells(
  db: Database,
  id: string,
  cells: readonly SweepCell[],
): Promise<{ cellsDone: number; cellsTotal: number } | undefined> {
  const batch = JSON.stringify(Object.fromEntries(cells.map((cell) => [String(cell.index), cell])));
  const merged = sql`(coalesce(${sweeps.cells}, '{}'::jsonb) || ${batch}::jsonb)`;
  const [row] = await db
    .update(sweeps)
    .set({
      cells: merged,
      cellsDone: sql`(select count(*)::int from jsonb_object_keys(${merged}))`,
      status: 'running',
    })
    .where(and(eq(sweeps.id, id), inArray(sweeps.status, [...ACTIVE_SWEEP_STATUSES])))
    .returning({ cellsDone: sweeps.cellsDone, cellsTotal: sweeps.cellsTotal });
  return row;
}

/** Marks a queued sweep running (no effect once it has moved on). */
export async function markSweepRunning(db: Database, id: string): Promise<void> {
  await db
    .update(sweeps)
    .set({ status: 'running' })
    .where(and(eq(sweeps.id, id), eq(sweeps.status, 'queued')));
}

/** Ends a sweep that is still going; returns false when it had already ended (or is gone). */
export async function endSweep(
  db: Database,
  id: string,
  status: Exclude<SweepStatus, 'queued' | 'running'>,
  error: string | null = null,
): Promise<boolean> {
  const updated = await db
    .update(sweeps)
    .set({ status, error, finishedAt: sql`now()` })
    .where(and(eq(sweeps.id, id), inArray(sweeps.status, [...ACTIVE_SWEEP_STATUSES])))
    .returning({ id: sweeps.id });
  return updated.length > 0;
}

/** Marks a sweep completed once every cell is recorded; true when this call completed it. */
export async function completeSweepIfDone(db: Database, id: string): Promise<boolean> {
  const updated = await db
    .update(sweeps)
    .set({ status: 'completed', finishedAt: sql`now()` })
    .where(
      and(
        eq(sweeps.id, id),
        inArray(sweeps.status, [...ACTIVE_SWEEP_STATUSES]),
        sql`${sweeps.cellsDone} >= ${sweeps.cellsTotal}`,
      ),
    )
    .returning({ id: sweeps.id });
  return updated.length > 0;
}

/** Remembers the stored run of one cell (the cell must have been recorded). */
export async function setCellRunId(
  db: Database,
  id: string,
  index: number,
  runId: string,
): Promise<void> {
  const path = `{${index},runId}`;
  await db
    .update(sweeps)
    .set({ cells: sql`jsonb_set(${sweeps.cells}, ${path}::text[], to_jsonb(${runId}::text))` })
    .where(and(eq(sweeps.id, id), sql`${sweeps.cells} ? ${String(index)}`));
}

/** Deletes a sweep. */
export async function deleteSweepRow(db: Database, id: string): Promise<void> {
  await db.delete(sweeps).where(eq(sweeps.id, id));
}
