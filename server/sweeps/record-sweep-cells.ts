/**
 * Runs a batch of sweep cells and records them in batches as they finish, so progress shows while
 * the sweep runs; completes the sweep when its last cell is in. Shared by the local queue (PGlite)
 * and the PostgreSQL job queue.
 */
import type { Logger } from 'pino';
import type { SweepCell } from '../../shared/contracts/sweeps';
import type { Database } from '../db/database';
import type { RunPool } from '../runs/run-pool';
import { SweepCellRunner, type CellBatch } from './sweep-cell-runner';
import { completeSweepIfDone, recordCells } from './sweeps-repository';

/** What running and recording cells needs. */
export interface SweepWorkDeps {
  db: Database;
  pool: RunPool;
  logger: Logger;
}

/** Cells are written at least this often while they keep finishing, ms. */
const FLUSH_INTERVAL_MS = 250;
/** …or whenever this many are waiting. */
const FLUSH_CELLS = 50;

/**
 * Runs `batch` on the pool and records its cells. Stops early (cancelling the cells still running)
 * once a write finds the sweep ended (cancelled or deleted). `onRunner` receives the runner so the
 * caller can cancel it. Rejects when a write fails.
 */
export async function runAndRecordCells(
  deps: SweepWorkDeps,
  batch: CellBatch,
  onRunner?: (runner: SweepCellRunner) => void,
): Promise<void> {
  let pending: SweepCell[] = [];
  let lastFlushMs = Date.now();
  let writes: Promise<void> = Promise.resolve();
  let failure: unknown = null;
  const flush = (): void => {
    if (pending.length === 0) return;
    const cells = pending;
    pending = [];
    lastFlushMs = Date.now();
    writes = writes.then(async () => {
      if (failure !== null) return;
      try {
        const counts = await recordCells(deps.db, batch.sweepId, cells);
        if (!counts) await runner.cancel();
      } catch (error) {
        failure = error;
        await runner.cancel();
      }
    });
  };
  const runner = new SweepCellRunner(deps.pool, batch, (cell) => {
    pending.push(cell);
    if (pending.length >= FLUSH_CELLS || Date.now() - lastFlushMs >= FLUSH_INTERVAL_MS) flush();
  });
  onRunner?.(runner);
  await runner.run();
  flush();
  await writes;
  if (failure !== null) throw failure;
  if (await completeSweepIfDone(deps.db, batch.sweepId))
    deps.logger.info({ sweepId: batch.sweepId }, 'sweep completed');
}
