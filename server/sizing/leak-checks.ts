/** Leaks: how low a broken pump line can take a fish tank, and how soon a hole at its floor reaches the minimum. */
import type { SizingCheck } from '../../shared/contracts/sizing';
import type { Pump, Scenario, Vessel } from '../../shared/scenario/index';
import type { RunResultParts } from '../runs/run-worker-messages';
import { sizingCheck, type CheckWords } from './check-words';
import { withLeak } from './what-if-scenarios';

/** The leak opens this long into the run, s. */
export const LEAK_START_S = 600;
/** Simulated time after the leak opens, s. */
const LEAK_WATCH_S = 2 * 3600;
/** Time to notice a leak and act (common practice, no source), s. */
export const LEAK_RESPONSE_S = 3600;

/** A what-if leak: which check it feeds, on which vessel, and its scenario. */
export interface LeakCase {
  kind: 'pump-line' | 'floor';
  vessel: Vessel & { minLevel: number };
  pump?: Pump;
  diameterM: number;
  scenario: Scenario;
}

/**
 * The leak cases of a system, for every vessel with a fish-safe minimum: a break in each pump line
 * drawing from it (a hole the size of the main pipe's bore at the intake: the line siphons the
 * vessel down to its inlet), and a hole of `floorLeakDiameterM` at its floor.
 */
export function leakCases(scenario: Scenario, floorLeakDiameterM: number): LeakCase[] {
  const cases: LeakCase[] = [];
  for (const vessel of scenario.vessels) {
    if (vessel.minLevel === undefined || vessel.kind === 'bed') continue;
    const v = { ...vessel, minLevel: vessel.minLevel };
    for (const pump of scenario.pumps.filter((p) => p.in === vessel.id)) {
      const diameterM = pump.main.innerDiameter;
      const scenarioWithLeak = withLeak(
        scenario,
        vessel.id,
        vessel.floorElevation + pump.intakeHeight,
        diameterM,
        LEAK_START_S,
        LEAK_START_S + LEAK_WATCH_S,
      );
      cases.push({ kind: 'pump-line', vessel: v, pump, diameterM, scenario: scenarioWithLeak });
    }
    const floor = withLeak(
      scenario,
      vessel.id,
      vessel.floorElevation,
      floorLeakDiameterM,
      LEAK_START_S,
      LEAK_START_S + LEAK_WATCH_S,
    );
    cases.push({ kind: 'floor', vessel: v, diameterM: floorLeakDiameterM, scenario: floor });
  }
  return cases;
}

function minimumReachedAfterS(run: RunResultParts, vesselId: string): number | null {
  const event = run.events.find(
    (e) => e.kind === 'below-min-level' && e.where === vesselId && e.t_s >= LEAK_START_S,
  );
  return event ? event.t_s - LEAK_START_S : null;
}

/** The check of one leak case from its run, numbers in `words`' units. */
export function leakCheck(leak: LeakCase, run: RunResultParts, words: CheckWords): SizingCheck {
  const { vessel } = leak;
  const lowest =
    run.summary.vessels.find((v) => v.id === vessel.id)?.minLevel_m ?? vessel.initialLevel;
  const reachedS = minimumReachedAfterS(run, vessel.id);
  const when =
    reachedS === null ? '' : `, passing the minimum ${words.time(reachedS)} after the leak opened`;
  if (leak.kind === 'pump-line' && leak.pump) {
    const below = lowest < vessel.minLevel - 1e-6;
    return sizingCheck({
      check: 'pump-line-leak',
      subject: vessel.id,
      title: `A broken line of pump ${leak.pump.id}`,
      status: below ? 'fails' : 'ok',
      value: lowest,
      limit: vessel.minLevel,
      unit: 'm',
      source: 'the fish-safe minimum level of the system',
      detail:
        `A break in pump ${leak.pump.id}'s line (a hole the size of its ${words.bore(leak.diameterM)} bore at the intake, ${words.length(leak.pump.intakeHeight)}) takes ${vessel.id} down to ${words.length(lowest)}${when}; its fish-safe minimum is ${words.length(vessel.minLevel)}.` +
        (below
          ? ' Raise the intake above the minimum, or drill an anti-siphon hole in the line just below the minimum level (common practice, no source).'
          : ''),
    });
  }
  return sizingCheck({
    check: 'tank-leak-time',
    subject: vessel.id,
    title: `A ${words.bore(leak.diameterM)} hole at the floor of ${vessel.id}`,
    status: reachedS !== null && reachedS < LEAK_RESPONSE_S ? 'warning' : 'ok',
    value: reachedS,
    limit: LEAK_RESPONSE_S,
    unit: 's',
    source: 'common practice, no source (an hour to notice a leak and act)',
    detail:
      reachedS === null
        ? `A ${words.bore(leak.diameterM)} hole at its floor does not take ${vessel.id} below its minimum within ${words.time(LEAK_WATCH_S)} (lowest ${words.length(lowest)}).`
        : `A ${words.bore(leak.diameterM)} hole at its floor takes ${vessel.id} below its fish-safe minimum of ${words.length(vessel.minLevel)} ${words.time(reachedS)} after it opens. A level alarm above the minimum buys time.`,
  });
}
