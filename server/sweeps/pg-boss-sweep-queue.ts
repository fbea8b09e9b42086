/**
 * Sweeps shared by several server processes: each sweep's cells are queued in chunks as jobs of
 * pg-boss (a job queue kept in PostgreSQL tables, `pgboss` schema); every process that has started
 * its workers fetches chunks and runs them on its own run pool. A chunk whose process dies is
 * expired by pg-boss and retried elsewhere; cells recorded twice count once.
 */
import PgBoss from 'pg-boss';
import type { SweepParameters } from '../../shared/contracts/sweeps';
import type { Scenario } from '../../shared/scenario/index';
import type { Database } from '../db/database';
import { runAndRecordCells, type SweepWorkDeps } from './record-sweep-cells';
import type { SweepCellRunner } from './sweep-cell-runner';
import type { QueuedSweep, SweepQueue } from './sweep-queue';
import { ACTIVE_SWEEP_STATUSES, endSweep, findSweepHead } from './sweeps-repository';

/** The pg-boss queue of sweep chunks. */
export const SWEEP_CHUNK_QUEUE = 'sweep-cells';
/** Cells per job: small enough to spread a sweep over processes, large enough to keep writes few. */
export const SWEEP_CHUNK_CELLS = 25;
/** Jobs each process works on at once (each keeps the pool busy on its own; two hide the gaps). */
const WORKERS_PER_PROCESS = 2;

/** One chunk job's data. */
interface ChunkJob {
  sweepId: string;
  indices: number[];
}

interface QueryablePool {
  query(text: string, values?: unknown[]): Promise<{ rows: unknown[] }>;
}

/** The node-postgres pool behind a Drizzle handle (drizzle keeps its client as `$client`). */
function poolOf(db: Database): QueryablePool {
  const client: unknown = (db as unknown as { $client?: unknown }).$client;
  if (
    typeof client !== 'object' ||
    client === null ||
    typeof (client as Partial<QueryablePool>).query !== 'function'
  ) {
    throw new Error('The PostgreSQL sweep queue needs the node-postgres pool of the database.');
  }
  return client as QueryablePool;
}

const isActive = (status: string | undefined): boolean =>
  (ACTIVE_SWEEP_STATUSES as readonly (string | undefined)[]).includes(status);

/** The cells of a sweep split into chunk jobs. */
export function chunkJobs(
  sweepId: string,
  cellsTotal: number,
  chunkCells = SWEEP_CHUNK_CELLS,
): ChunkJob[] {
  const jobs: ChunkJob[] = [];
  for (let start = 0; start < cellsTotal; start += chunkCells) {
    const end = Math.min(cellsTotal, start + chunkCells);
    jobs.push({ sweepId, indices: Array.from({ length: end - start }, (_, k) => start + k) });
  }
  return jobs;
}

/** The pg-boss sweep queue of one process. */
export class PgBossSweepQueue implements SweepQueue {
  readonly orphansWhenStopped = false;
  /** Chunks running here, by sweep. */
  private readonly runners = new Map<string, Set<SweepCellRunner>>();
  private readonly boss: PgBoss;
  private starting: Promise<void> | null = null;
  private workerIds: string[] = [];
  private closed = false;

  constructor(private readonly deps: SweepWorkDeps) {
    const pool = poolOf(deps.db);
    this.boss = new PgBoss({
      db: { executeSql: (text, values) => this.query(pool, text, values) },
      schedule: false,
      expireInSeconds: 3600,
      retryLimit: 2,
    });
    this.boss.on('error', (error) => deps.logger.error({ err: error }, 'sweep job queue error'));
  }

  /** How many chunks this process has run to the end (for tests and logs). */
  chunksRun = 0;

  /** Starts pg-boss (creating its schema on first use) and this process's chunk workers. */
  ready(): Promise<void> {
    this.starting ??= this.begin();
    return this.starting;
  }

  async start(sweep: QueuedSweep): Promise<void> {
    await this.ready();
    const jobs = chunkJobs(sweep.id, sweep.cellsTotal).map((data) => ({
      name: SWEEP_CHUNK_QUEUE,
      data,
    }));
    await this.boss.insert(jobs);
    for (const id of this.workerIds) this.boss.notifyWorker(id);
  }

  async cancel(sweepId: string): Promise<void> {
    await Promise.all([...(this.runners.get(sweepId) ?? [])].map((runner) => runner.cancel()));
  }

  isRunningHere(sweepId: string): boolean {
    return (this.runners.get(sweepId)?.size ?? 0) > 0;
  }

  async close(): Promise<void> {
    this.closed = true;
    const cancels = [...this.runners.values()].flatMap((set) =>
      [...set].map((runner) => runner.cancel()),
    );
    await Promise.all(cancels);
    if (!this.starting) return;
    await this.starting.catch(() => undefined);
    await this.boss.stop({ graceful: true, wait: true, timeout: 10_000 });
  }

  /** Runs pg-boss's SQL; once the database pool has been closed under it, pg-boss stops polling. */
  private async query(
    pool: QueryablePool,
    text: string,
    values: unknown[],
  ): Promise<{ rows: unknown[] }> {
    try {
      return await pool.query(text, values);
    } catch (error) {
      if (
        !this.closed &&
        error instanceof Error &&
        /after calling end on the pool/.test(error.message)
      ) {
        this.closed = true;
        void this.boss.stop({ graceful: false, wait: false }).catch(() => undefined);
      }
      throw error;
    }
  }

  private async begin(): Promise<void> {
    await this.boss.start();
    await this.boss.createQueue(SWEEP_CHUNK_QUEUE);
    if (this.closed) return;
    const options = { batchSize: 1, pollingIntervalSeconds: 0.5 };
    for (let k = 0; k < WORKERS_PER_PROCESS; k += 1) {
      this.workerIds.push(
        await this.boss.work<ChunkJob>(SWEEP_CHUNK_QUEUE, options, (jobs) => this.runChunks(jobs)),
      );
    }
  }

  private async runChunks(jobs: PgBoss.Job<ChunkJob>[]): Promise<void> {
    for (const job of jobs) await this.runChunk(job.data);
  }

  /**
   * Runs one chunk unless its sweep has ended. A chunk cut short while its sweep still goes on
   * (this process is stopping) throws, so that pg-boss hands it to another process; a chunk whose
   * cells cannot be recorded marks the sweep failed.
   */
  private async runChunk({ sweepId, indices }: ChunkJob): Promise<void> {
    if (this.closed) throw new Error('This server is stopping; the chunk goes back to the queue.');
    const sweep = await findSweepHead(this.deps.db, sweepId);
    if (!sweep || !isActive(sweep.status)) return;
    const batch = {
      sweepId,
      base: sweep.scenario as Scenario,
      parameters: sweep.parameters as SweepParameters,
      indices,
    };
    const here = this.runners.get(sweepId) ?? new Set<SweepCellRunner>();
    this.runners.set(sweepId, here);
    let mine: SweepCellRunner | undefined;
    try {
      await runAndRecordCells(this.deps, batch, (runner) => {
        mine = runner;
        here.add(runner);
      });
    } catch (error) {
      const message = error instanceof Error ? error.message : String(error);
      await endSweep(
        this.deps.db,
        sweepId,
        'failed',
        `The sweep stopped on an internal error (${message}); start it again.`,
      );
      throw error;
    } finally {
      if (mine) here.delete(mine);
      if (here.size === 0) this.runners.delete(sweepId);
    }
    if (mine?.isCancelled && isActive((await findSweepHead(this.deps.db, sweepId))?.status)) {
      throw new Error('The chunk was interrupted; it goes back to the queue.');
    }
    this.chunksRun += 1;
  }
}
