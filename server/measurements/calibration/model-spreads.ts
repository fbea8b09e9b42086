/** Runs the engine once and reads the steady cycle figures of the measured beds. */
import type { SimulateOptions, SimulationOutcome } from '../../../engine/index';
import type { Scenario } from '../../../shared/scenario/index';
import { cycleSpreads, type CycleSpreads } from '../cycle-figures';
import { simulatedDrainCycles } from '../simulated-drain-cycles';

/** The engine's `simulate`, passed in so tests and workers choose. */
export type SimulateFn = (scenario: Scenario, options?: SimulateOptions) => SimulationOutcome;

/** Cycle figures per bed, or null for a bed that did not complete two drain cycles (stall, lock). */
export type BedSpreads = Map<string, CycleSpreads | null>;

/** Longest simulated time one evaluation may grow to, s. */
const MAX_DURATION_S = 48 * 3600;

function spreadsOf(
  outcome: SimulationOutcome,
  beds: readonly string[],
): { spreads: BedSpreads; short: boolean } {
  const spreads: BedSpreads = new Map();
  let short = false;
  for (const bed of beds) {
    const cycles = simulatedDrainCycles(outcome.result.events, bed);
    // The first drain follows a fill from the initial level; steady figures start after it.
    const steady = cycles.length >= 3 ? cycles.slice(1) : cycles;
    const state = outcome.result.summary.beds.find((b) => b.id === bed)?.state;
    if (steady.length < 2) {
      spreads.set(bed, null);
      if (state === 'cycling' || state === undefined) short = true;
    } else {
      spreads.set(bed, cycleSpreads(steady));
    }
  }
  return { spreads, short };
}

/**
 * Simulates `durationS` (doubled up to twice, at most 48 h, while a cycling bed has fewer than
 * two steady cycles) with a coarse output grid: the figures come from the located events, not
 * from the samples. Returns the figures and the duration that was needed.
 */
export function modelSpreads(
  simulate: SimulateFn,
  scenario: Scenario,
  beds: readonly string[],
  durationS: number,
): { spreads: BedSpreads; durationS: number } {
  let duration = Math.min(durationS, MAX_DURATION_S);
  for (let attempt = 0; ; attempt++) {
    const outcome = simulate(scenario, {
      durationS: duration,
      outputIntervalS: Math.max(scenario.run.outputInterval, duration / 40),
    });
    const { spreads, short } = spreadsOf(outcome, beds);
    if (!short || attempt >= 2 || duration >= MAX_DURATION_S || outcome.status === 'failed')
      return { spreads, durationS: duration };
    duration = Math.min(duration * 2, MAX_DURATION_S);
  }
}
