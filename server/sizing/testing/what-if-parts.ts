/** A what-if scenario run on the engine in this thread, as the run pool would hand it back (for tests). */
import { simulate } from '../../../engine/index';
import type { Scenario } from '../../../shared/scenario/index';
import type { RunResultParts } from '../../runs/run-worker-messages';

/** Runs `scenario` for its own duration with every event; throws unless the run completes. */
export function whatIfParts(scenario: Scenario): RunResultParts {
  const durationS = scenario.run.duration;
  const outcome = simulate(scenario, {
    durationS,
    outputIntervalS: durationS / 100,
    maxSamples: 20_000,
  });
  if (outcome.status !== 'completed')
    throw new Error(`The what-if run ended ${outcome.status}; check the test scenario.`);
  const { summary, events, verdicts, stats, massBalanceError } = outcome.result;
  return { summary, events, verdicts, stats: { ...stats, wall_ms: 0 }, massBalanceError };
}
