/**
 * Runs sweeps in this process: every cell of a sweep goes to the local run pool. Used with the
 * embedded PGlite database, which only one process can open.
 */
import type { SweepParameters } from '../../shared/contracts/sweeps';
import type { Scenario } from '../../shared/scenario/index';
import { endSweep } from './sweeps-repository';
import { runAndRecordCells, type SweepWorkDeps } from './record-sweep-cells';
import type { SweepCellRunner } from './sweep-cell-runner';
import type { QueuedSweep, SweepQueue } from './sweep-queue';

/** The sweep queue of a single process. */
export class LocalSweepQueue implements SweepQueue {
  private readonly runners = new Map<string, SweepCellRunner>();
  private readonly tasks = new Map<string, Promise<void>>();

  constructor(private readonly deps: SweepWorkDeps) {}

  async start(sweep: QueuedSweep): Promise<void> {
    const indices = Array.from({ length: sweep.cellsTotal }, (_, k) => k);
    const batch = {
      sweepId: sweep.id,
      base: sweep.scenario as Scenario,
      parameters: sweep.parameters as SweepParameters,
      indices,
    };
    const task = runAndRecordCells(this.deps, batch, (runner) => this.runners.set(sweep.id, runner))
      .catch(async (error: unknown) => {
        this.deps.logger.error({ err: error, sweepId: sweep.id }, 'a sweep failed');
        const message = error instanceof Error ? error.message : String(error);
        await endSweep(
          this.deps.db,
          sweep.id,
          'failed',
          `The sweep stopped on an internal error (${message}); start it again.`,
        ).catch(() => undefined);
      })
      .finally(() => {
        this.runners.delete(sweep.id);
        this.tasks.delete(sweep.id);
      });
    this.tasks.set(sweep.id, task);
  }

  async cancel(sweepId: string): Promise<void> {
    await this.runners.get(sweepId)?.cancel();
    await this.tasks.get(sweepId);
  }

  isRunningHere(sweepId: string): boolean {
    return this.tasks.has(sweepId);
  }

  /** True: a sweep left running by a stopped process is not resumed by anyone. */
  readonly orphansWhenStopped = true;

  async close(): Promise<void> {
    await Promise.all([...this.runners.values()].map((runner) => runner.cancel()));
    await Promise.allSettled([...this.tasks.values()]);
  }
}
