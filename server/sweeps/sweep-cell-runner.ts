/**
 * Runs sweep cells on the run pool's worker threads, a few at a time so that other people's runs
 * still get through the pool's queue, and turns each outcome into a cell of the map.
 */
import { bedRegime, pumpedInflowsM3PerS } from '../../engine/index';
import type { SweepCell, SweepParameters } from '../../shared/contracts/sweeps';
import type { Scenario } from '../../shared/scenario/index';
import { RunQueueFullError, type RunPool } from '../runs/run-pool';
import type { RunJobOptions, RunJobOutcome } from '../runs/run-worker-messages';
import { worstVerdict } from '../runs/worst-verdict';
import { cellScenario } from './cell-scenario';

/** What a batch of cells needs: the sweep, the system's scenario and which cells to run. */
export interface CellBatch {
  sweepId: string;
  base: Scenario;
  parameters: SweepParameters;
  indices: readonly number[];
}

/** Wait before offering a cell again to a full pool queue, ms. */
const QUEUE_FULL_RETRY_MS = 200;

const emptyFigures = {
  cycles: null,
  periodS: null,
  floodS: null,
  drainS: null,
  verdict: null,
} as const;

/** The steady inflow of the mapped bed at the starting levels, m³/s; null when it cannot be solved. */
function bedInflowM3PerS(scenario: Scenario, bedId: string): number | null {
  try {
    return pumpedInflowsM3PerS(scenario).get(bedId) ?? 0;
  } catch {
    return null;
  }
}

/** A cell from a worker's outcome (null for a cancelled run: nothing to record). */
export function cellFromOutcome(
  index: number,
  bedId: string,
  inflowM3PerS: number | null,
  outcome: RunJobOutcome,
): SweepCell | null {
  if (outcome.status === 'cancelled') return null;
  const result = outcome.result;
  const regime = result ? bedRegime(result, bedId) : null;
  if (!result || !regime || outcome.status !== 'completed') {
    const error = outcome.error ?? `The run has no bed "${bedId}".`;
    return { index, regime: 'failed', ...emptyFigures, inflowM3PerS, error };
  }
  const bed = result.summary.beds.find((b) => b.id === bedId);
  return {
    index,
    regime,
    cycles: bed?.cycles ?? null,
    periodS: bed?.periodMean_s ?? null,
    floodS: bed?.floodMean_s ?? null,
    drainS: bed?.drainMean_s ?? null,
    inflowM3PerS,
    verdict: worstVerdict(result.verdicts),
  };
}

/**
 * Runs a batch of cells: each cell's scenario goes to the pool as one job (an impossible geometry
 * becomes an `invalid` cell without running); at most `pool size + 1` jobs are out at once.
 * `onCell` receives every finished cell; `cancel()` stops submitting and cancels the jobs out.
 */
export class SweepCellRunner {
  private cancelled = false;
  private readonly inFlight = new Set<string>();

  constructor(
    private readonly pool: RunPool,
    private readonly batch: CellBatch,
    private readonly onCell: (cell: SweepCell) => void,
  ) {}

  /** Runs every cell of the batch; resolves when all have ended or the runner was cancelled. */
  async run(): Promise<void> {
    const queue = [...this.batch.indices];
    const lanes = Math.max(2, this.pool.options.size + 1);
    const lane = async (): Promise<void> => {
      for (let index = queue.shift(); index !== undefined && !this.cancelled; index = queue.shift())
        await this.runCell(index);
    };
    await Promise.all(Array.from({ length: lanes }, lane));
  }

  /** Stops the batch: no more cells start; the ones running are cancelled and not recorded. */
  async cancel(): Promise<void> {
    this.cancelled = true;
    await Promise.all([...this.inFlight].map((id) => this.pool.cancel(id)));
  }

  get isCancelled(): boolean {
    return this.cancelled;
  }

  private async runCell(index: number): Promise<void> {
    const { sweepId, base, parameters } = this.batch;
    const made = cellScenario(base, parameters, index);
    if ('problem' in made) {
      this.onCell({
        index,
        regime: 'invalid',
        ...emptyFigures,
        inflowM3PerS: null,
        error: made.problem,
      });
      return;
    }
    const inflow = bedInflowM3PerS(made.scenario, parameters.bedId);
    const options: RunJobOptions = {
      durationS: parameters.durationS,
      outputIntervalS: parameters.durationS,
      maxSamples: 2,
    };
    const id = `sweep:${sweepId}:${index}`;
    let outcome: RunJobOutcome | undefined;
    const job = {
      id,
      scenario: made.scenario,
      options,
      onEnd: async (o: RunJobOutcome) => void (outcome = o),
    };
    this.inFlight.add(id);
    try {
      await this.submitWhenRoom(job);
    } finally {
      this.inFlight.delete(id);
    }
    const cell = outcome ? cellFromOutcome(index, parameters.bedId, inflow, outcome) : null;
    if (cell) this.onCell(cell);
  }

  private async submitWhenRoom(job: Parameters<RunPool['submit']>[0]): Promise<void> {
    for (;;) {
      if (this.cancelled) return;
      try {
        await this.pool.submit(job);
        return;
      } catch (error) {
        if (!(error instanceof RunQueueFullError)) throw error;
        await new Promise((resolve) => setTimeout(resolve, QUEUE_FULL_RETRY_MS));
      }
    }
  }
}
