/** Rules of thumb of flood-and-drain practice: bed to tank volume, tank turnover, cycles per hour. */
import { bedStructuralLoad, pumpDutyPoints } from '../../engine/index';
import type { SizingCheck } from '../../shared/contracts/sizing';
import type { Scenario, Vessel } from '../../shared/scenario/index';
import type { RunResultParts } from '../runs/run-worker-messages';
import { vesselVolumeM3 } from '../sweeps/sweep-parameter-handlers';
import { sizingCheck, type CheckWords } from './check-words';

/** Fewest and most floods an hour that count as usual (common practice, no source). */
const CYCLES_PER_HOUR = { low: 1, high: 12 } as const;

const sig = (x: number): string => Number(x.toPrecision(3)).toString();

/**
 * Grow-bed media volume against fish-tank volume: about 1:1 with direct return, up to 2:1 with a
 * sump; volumes in `words`' units.
 */
export function bedTankRatioCheck(scenario: Scenario, words: CheckWords): SizingCheck[] {
  const tanks = scenario.vessels.filter((v) => v.kind === 'tank');
  if (tanks.length === 0) return [];
  const beds = scenario.vessels.flatMap((v) =>
    v.kind === 'bed' ? [bedStructuralLoad(v, scenario.water.temperature).mediaVolumeM3] : [],
  );
  const bedM3 = beds.reduce((a, b) => a + b, 0);
  const tankM3 = tanks.reduce((sum, t) => sum + vesselVolumeM3(t), 0);
  const withSump = scenario.vessels.some((v) => v.kind === 'sump');
  const limit = withSump ? 2 : 1;
  const ratio = bedM3 / tankM3;
  return [
    sizingCheck({
      check: 'bed-tank-ratio',
      subject: 'system',
      title: 'Grow-bed volume to fish-tank volume',
      status: ratio > limit ? 'warning' : 'ok',
      value: ratio,
      limit,
      unit: 'ratio',
      source:
        'common practice, no source (about 1:1 with the beds draining to the fish tank, up to 2:1 with a sump)',
      detail: `The beds hold ${words.volume(bedM3)} of media against ${words.volume(tankM3)} of fish tank: ${sig(ratio)} to 1 (${withSump ? 'with' : 'without'} a sump, up to ${limit} to 1 is usual).`,
    }),
  ];
}

/** Steady flow through a fish tank: the larger of what comes in (pumped, or drained from beds) and what is pumped out, m³/s. */
function throughFlowM3PerS(scenario: Scenario, tank: Vessel): number {
  const points = pumpDutyPoints(scenario);
  const into = (id: string): number =>
    points.reduce(
      (sum, p) =>
        sum +
        p.outletDestinations.reduce(
          (s, to, i) => s + (to === id ? (p.outletFlowsM3PerS[i] ?? 0) : 0),
          0,
        ),
      0,
    );
  const drainedIn = scenario.vessels.reduce(
    (sum, v) => sum + (v.kind === 'bed' && v.drain.to === tank.id ? into(v.id) : 0),
    0,
  );
  const pumpedOut = points.reduce(
    (sum, p, k) => sum + (scenario.pumps[k]?.in === tank.id ? p.flowM3PerS : 0),
    0,
  );
  return Math.max(into(tank.id) + drainedIn, pumpedOut);
}

/** Each fish tank's volume should pass through it at least once an hour. */
export function turnoverChecks(scenario: Scenario): SizingCheck[] {
  return scenario.vessels.flatMap((tank) => {
    if (tank.kind !== 'tank') return [];
    const perHour = (throughFlowM3PerS(scenario, tank) * 3600) / vesselVolumeM3(tank);
    return [
      sizingCheck({
        check: 'tank-turnover',
        subject: tank.id,
        title: `Turnover of ${tank.id}`,
        status: perHour < 1 ? 'warning' : 'ok',
        value: perHour,
        limit: 1,
        unit: 'per-hour',
        source:
          'from memory: FAO Fisheries and Aquaculture Technical Paper 589 (2014), ch. 8 — the tank volume at least once an hour',
        detail: `The pumps move ${sig(perHour)} times the volume of ${tank.id} through it each hour at the starting levels.`,
      }),
    ];
  });
}

/** Floods per hour of each bell-siphon bed in a run of the design: a few an hour is usual. */
export function cyclesPerHourChecks(scenario: Scenario, run: RunResultParts): SizingCheck[] {
  return scenario.vessels.flatMap((bed) => {
    if (bed.kind !== 'bed' || bed.drain.type !== 'bell-siphon') return [];
    const summary = run.summary.beds.find((b) => b.id === bed.id);
    const period = summary?.periodMean_s ?? null;
    const perHour = period && period > 0 ? 3600 / period : null;
    const usual =
      perHour !== null && perHour >= CYCLES_PER_HOUR.low && perHour <= CYCLES_PER_HOUR.high;
    const cycling = summary?.state === 'cycling' && perHour !== null;
    return [
      sizingCheck({
        check: 'cycles-per-hour',
        subject: bed.id,
        title: `Floods per hour of ${bed.id}`,
        status: !cycling ? 'fails' : usual ? 'ok' : 'warning',
        value: perHour,
        limit: CYCLES_PER_HOUR.high,
        unit: 'per-hour',
        source: `common practice, no source (${CYCLES_PER_HOUR.low} to ${CYCLES_PER_HOUR.high} floods an hour)`,
        detail: cycling
          ? `${bed.id} floods and drains ${sig(perHour)} times an hour (every ${sig((period ?? 0) / 60)} min).`
          : `${bed.id} does not cycle in a run of the design: it ends ${summary?.state ?? 'without a result'}. The operating window shows what to change.`,
      }),
    ];
  });
}
