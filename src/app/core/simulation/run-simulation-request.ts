import { simulate } from '../../../../engine/index';
import type { SimulationReply, SimulationRequest } from './simulation-messages';

/** Smallest progress step worth a message; keeps the channel quiet on long runs. */
const PROGRESS_STEP = 0.01;

/**
 * Runs one simulation request with the engine and reports through `post`: progress messages
 * (at most one per percent), then exactly one `done` or `crashed`. `nowMs` is the worker's clock
 * (the engine has none); with a `budgetMs` the run stops after that much wall time and the
 * partial result is returned with `stoppedByBudget` set.
 */
export function runSimulationRequest(
  request: SimulationRequest,
  post: (reply: SimulationReply) => void,
  nowMs: () => number,
): void {
  const { requestId } = request;
  const startMs = nowMs();
  let lastFraction = -1;
  let overBudget = false;
  const onProgress = (fraction: number): void => {
    if (fraction - lastFraction < PROGRESS_STEP && fraction < 1) return;
    lastFraction = fraction;
    post({ kind: 'progress', requestId, fraction });
  };
  const shouldStop = (): boolean => {
    if (request.budgetMs === null) return false;
    overBudget = nowMs() - startMs > request.budgetMs;
    return overBudget;
  };
  try {
    const outcome = simulate(request.scenario, {
      durationS: request.durationS,
      maxSamples: request.maxSamples,
      onProgress,
      shouldStop,
    });
    const wallMs = nowMs() - startMs;
    const times = outcome.result.series.t_s;
    post({
      kind: 'done',
      requestId,
      status: outcome.status,
      reason: outcome.reason ?? null,
      stoppedByBudget: outcome.status === 'stopped' && overBudget,
      reachedS: times.length > 0 ? (times[times.length - 1] ?? 0) : 0,
      wallMs,
      result: { ...outcome.result, stats: { ...outcome.result.stats, wall_ms: wallMs } },
    });
  } catch (error: unknown) {
    post({
      kind: 'crashed',
      requestId,
      message: error instanceof Error ? error.message : String(error),
    });
  }
}
