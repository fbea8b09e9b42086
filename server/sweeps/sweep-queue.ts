/**
 * Where sweep cells run: the local worker pool with PGlite, or a PostgreSQL job queue (pg-boss)
 * that every server process on the same database works from, with a PostgreSQL server. One queue
 * per app context, made on first use; `closeSweepQueue` stops it.
 */
import type { AppContext } from '../app-context';
import type { RunPool } from '../runs/run-pool';
import { LocalSweepQueue } from './local-sweep-queue';
import { PgBossSweepQueue } from './pg-boss-sweep-queue';
import { makeSweepPool } from './sweep-pool';
import type { SweepHeadRow } from './sweeps-repository';

/** A stored sweep to start: its row with the scenario and parameters. */
export type QueuedSweep = Pick<SweepHeadRow, 'id' | 'cellsTotal' | 'scenario' | 'parameters'>;

/** Runs sweeps' cells. */
export interface SweepQueue {
  /** Queues every cell of a new sweep. */
  start(sweep: QueuedSweep): Promise<void>;
  /** Stops the sweep's cells running in this process (others stop when they see it ended). */
  cancel(sweepId: string): Promise<void>;
  /** Whether this process is running cells of the sweep. */
  isRunningHere(sweepId: string): boolean;
  /** True when a sweep left queued or running by a stopped process can never finish. */
  readonly orphansWhenStopped: boolean;
  /** Stops taking work, cancels what runs here and waits for it to stop. */
  close(): Promise<void>;
}

const queues = new WeakMap<AppContext, { queue: SweepQueue; pool: RunPool }>();

/**
 * The sweep queue of this context: pg-boss on a PostgreSQL server, else local; either way the
 * cells run on this process's sweep pool (made with the queue, on first use).
 */
export function sweepQueueFor(ctx: AppContext): SweepQueue {
  let entry = queues.get(ctx);
  if (!entry) {
    const pool = makeSweepPool();
    const deps = { db: ctx.db, pool, logger: ctx.logger };
    const queue =
      ctx.dbKind === 'postgres' ? new PgBossSweepQueue(deps) : new LocalSweepQueue(deps);
    entry = { queue, pool };
    queues.set(ctx, entry);
  }
  return entry.queue;
}

/**
 * Starts this process working on shared sweeps at once (with PostgreSQL; a no-op with PGlite), so
 * that a process that has not yet served a sweep request also takes cells. Call at start-up.
 */
export async function startSweepWorkers(ctx: AppContext): Promise<void> {
  const queue = sweepQueueFor(ctx);
  if (queue instanceof PgBossSweepQueue) await queue.ready();
}

/** Stops the context's sweep queue and its workers (call before closing the database). */
export async function closeSweepQueue(ctx: AppContext): Promise<void> {
  const entry = queues.get(ctx);
  if (!entry) return;
  queues.delete(ctx);
  await entry.queue.close();
  await entry.pool.close();
}
