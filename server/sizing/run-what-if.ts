/** Runs a what-if system on the run pool's worker threads and hands back its result parts. */
import { randomUUID } from 'node:crypto';
import type { Scenario } from '../../shared/scenario/index';
import { HttpError } from '../http/http-error';
import { RunQueueFullError, type RunPool } from '../runs/run-pool';
import type { RunResultParts } from '../runs/run-worker-messages';

/** Events (and samples) a what-if run keeps at most. */
const MAX_EVENTS = 20_000;

/**
 * Runs `scenario` for its own duration with a coarse series and every event. A run that does not complete is
 * a 422 naming the what-if; a full pool queue is a 503 to retry later.
 */
export async function runWhatIf(
  pool: RunPool,
  what: string,
  scenario: Scenario,
): Promise<RunResultParts> {
  let result: RunResultParts | null = null;
  let error: string | null = null;
  const durationS = scenario.run.duration;
  try {
    await pool.submit({
      id: `sizing:${randomUUID()}`,
      scenario,
      // The checks read events after given times: keep them all (a capped run keeps only the
      // first of each kind beyond its sample cap).
      options: { durationS, outputIntervalS: durationS / 100, maxSamples: MAX_EVENTS },
      onEnd: async (outcome) => {
        if (outcome.status === 'completed') result = outcome.result;
        else error = outcome.error ?? `the run ended ${outcome.status}`;
      },
    });
  } catch (caught) {
    if (!(caught instanceof RunQueueFullError)) throw caught;
    throw new HttpError(503, caught.code, caught.message, undefined, { 'Retry-After': '60' });
  }
  if (!result)
    throw new HttpError(
      422,
      'WHAT_IF_FAILED',
      `The ${what} run did not complete (${error ?? 'no result'}); run the system to see why.`,
    );
  return result;
}
