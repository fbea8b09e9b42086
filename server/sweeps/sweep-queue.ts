/**
 * Where sweep cells run: the local worker pool with PGlite, or a PostgreSQL job queue (pg-boss)
 * that every server process on the same database works from, with a PostgreSQL server. One queue
 * per app context, made on first use; `closeSweepQueue` stops it.
 */
import type { AppContext } from '../app-context';
import { runPoolFor } from '../runs/run-pool-for';
import { LocalSweepQueue } from './local-sweep-queue';
import { PgBossSweepQueue } from './pg-boss-sweep-queue';
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

const queues = new WeakMap<AppContext, SweepQueue>();

/** The sweep queue of this context: pg-boss on a PostgreSQL server, else the local pool. */
export function sweepQueueFor(ctx: AppContext): SweepQueue {
  let queue = queues.get(ctx);
  if (!queue) {
    const deps = { db: ctx.db, pool: runPoolFor(ctx), logger: ctx.logger };
    queue = ctx.dbKind === 'postgres' ? new PgBossSweepQueue(deps) : new LocalSweepQueue(deps);
    queues.set(ctx, queue);
  }
  return queue;
}

/**
 * Starts this process working on shared sweeps at once (with PostgreSQL; a no-op with PGlite), so
 * that a process that has not yet served a sweep request also takes cells. Call at start-up.
 */
export async function startSweepWorkers(ctx: AppContext): Promise<void> {
  const queue = sweepQueueFor(ctx);
  if (queue instanceof PgBossSweepQueue) await queue.ready();
}

/** Stops the context's sweep queue (call before closing the database). */
export async function closeSweepQueue(ctx: AppContext): Promise<void> {
  const queue = queues.get(ctx);
  if (!queue) return;
  queues.delete(ctx);
  await queue.close();
}
