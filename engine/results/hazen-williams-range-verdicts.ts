import type { FrictionPipe } from './friction-pipes';
import type { Verdict } from './run-result';

/**
 * Smallest bore Hazen–Williams is meant for, m: about 2 in (50 mm) and up. From memory, after the
 * range textbooks state for the formula (pipes larger than about 2 in); the fitted C drifts with
 * pipe size and Reynolds number outside the data it came from (C. P. Liou, "Limitations and proper
 * use of the Hazen–Williams equation", J. Hydraul. Eng. 124(9):951–954, 1998).
 */
export const HAZEN_WILLIAMS_MIN_DIAMETER_M = 0.05;

/**
 * Mean velocities Hazen–Williams is meant for, m/s: roughly 0.3 to 3 (1 to 10 ft/s), turbulent
 * flow in water mains. From memory; below it, flow in small pipes nears the smooth-pipe and
 * transitional regimes where a constant C under-predicts the loss (Liou, 1998, as above).
 */
export const HAZEN_WILLIAMS_VELOCITY_RANGE_M_PER_S = [0.3, 3] as const;

const WHY =
  'Darcy–Weisbach, the default, holds for small pipes and slow flow as well; choose it unless you need to match a Hazen–Williams design';

const SIZE_SOURCE = `Hazen–Williams is fitted to water mains of about 50 mm bore and up (from memory; C drifts with pipe size and Reynolds number outside its data: C. P. Liou, J. Hydraul. Eng. 124(9), 1998). ${WHY}`;

const VELOCITY_SOURCE = `Hazen–Williams is fitted to turbulent flow at roughly 0.3–3 m/s (from memory; C drifts with Reynolds number outside its data: C. P. Liou, J. Hydraul. Eng. 124(9), 1998). ${WHY}`;

/**
 * How far a velocity lies outside the fitted range, as a factor ≥ 1 when outside (0.15 m/s is
 * 2× too slow, 6 m/s 2× too fast) and < 1 inside.
 */
function velocityExcess(velocityMPerS: number): number {
  const [low, high] = HAZEN_WILLIAMS_VELOCITY_RANGE_M_PER_S;
  return Math.max(low / velocityMPerS, velocityMPerS / high);
}

/**
 * The Hazen–Williams range checks of a run, one per concern, each naming its worst pipe: the
 * narrowest bore against {@link HAZEN_WILLIAMS_MIN_DIAMETER_M} (value and limit in m), and the
 * velocity furthest outside {@link HAZEN_WILLIAMS_VELOCITY_RANGE_M_PER_S} among pipes that carry
 * flow (value in m/s). No checks without pipes; no velocity check when nothing flows.
 */
export function hazenWilliamsRangeVerdicts(pipes: readonly FrictionPipe[]): Verdict[] {
  const verdicts: Verdict[] = [];
  const narrowest = pipes.reduce<FrictionPipe | undefined>(
    (worst, pipe) => (worst === undefined || pipe.diameterM < worst.diameterM ? pipe : worst),
    undefined,
  );
  if (narrowest !== undefined) {
    verdicts.push({
      check: `Hazen–Williams used within its range: narrowest pipe, ${narrowest.name} (bore, m)`,
      status: narrowest.diameterM >= HAZEN_WILLIAMS_MIN_DIAMETER_M ? 'ok' : 'warning',
      value: round(narrowest.diameterM),
      limit: HAZEN_WILLIAMS_MIN_DIAMETER_M,
      source: SIZE_SOURCE,
    });
  }
  const flowing = pipes.filter((pipe) => pipe.velocityMPerS > 0);
  const furthest = flowing.reduce<FrictionPipe | undefined>(
    (worst, pipe) =>
      worst === undefined ||
      velocityExcess(pipe.velocityMPerS) > velocityExcess(worst.velocityMPerS)
        ? pipe
        : worst,
    undefined,
  );
  if (furthest !== undefined) {
    const [low, high] = HAZEN_WILLIAMS_VELOCITY_RANGE_M_PER_S;
    verdicts.push({
      check: `Hazen–Williams used within its range: ${furthest.name} at its working flow (velocity, m/s)`,
      status: velocityExcess(furthest.velocityMPerS) <= 1 ? 'ok' : 'warning',
      value: round(furthest.velocityMPerS),
      limit: `${low}–${high}`,
      source: VELOCITY_SOURCE,
    });
  }
  return verdicts;
}

function round(value: number): number {
  return Number(value.toPrecision(4));
}
