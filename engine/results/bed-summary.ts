import type { BellSiphonComponent } from '../components/bell-siphon';
import type { StandpipeComponent } from '../components/standpipe-drain';
import type { VesselComponent } from '../components/vessel';
import type { BedCycleMarks } from './bed-cycle-recorder';
import type { BedState, BedSummary, RunEvent } from './run-result';

/** Mean, min and max of a list, or nulls when it is empty. */
function statistics(values: readonly number[]): { mean: number | null; min: number | null; max: number | null } {
  if (values.length === 0) return { mean: null, min: null, max: null };
  let sum = 0;
  for (const v of values) sum += v;
  return { mean: sum / values.length, min: Math.min(...values), max: Math.max(...values) };
}

const differences = (times: readonly number[]): number[] => times.slice(1).map((t, i) => t - (times[i] as number));
const timesOf = (events: readonly RunEvent[], where: string, kind: string): number[] => events.filter((e) => e.where === where && e.kind === kind).map((e) => e.t_s);

/**
 * Cycle statistics of a bell-siphon bed: a cycle is a priming followed by its break. Period =
 * time between successive primings; flood time = previous break to priming; drain time =
 * priming to break; high and low water per cycle from the recorded marks.
 */
export function summariseBellBed(bell: BellSiphonComponent, bed: VesselComponent, events: readonly RunEvent[], marks: BedCycleMarks, endS: number, durationS: number): BedSummary {
  const primes = timesOf(events, bell.bedId, 'primed');
  const breaks = timesOf(events, bell.bedId, 'siphon-break');
  const drains: number[] = [];
  const floods: number[] = [];
  for (const prime of primes) {
    const nextBreak = breaks.find((b) => b >= prime);
    if (nextBreak !== undefined) drains.push(nextBreak - prime);
    const previousBreaks = breaks.filter((b) => b <= prime);
    const lastBreak = previousBreaks[previousBreaks.length - 1];
    if (lastBreak !== undefined) floods.push(prime - lastBreak);
  }
  const period = statistics(differences(primes));
  const flooded = bell.floodedTimeS + (bell.phase === 'filling' ? 0 : endS - bell.phaseStartS);
  return {
    id: bell.bedId,
    cycles: drains.length,
    periodMean_s: period.mean,
    periodMin_s: period.min,
    periodMax_s: period.max,
    floodMean_s: statistics(floods).mean,
    drainMean_s: statistics(drains).mean,
    highLevel_m: statistics(marks.highsM).mean,
    lowLevel_m: statistics(marks.lowsM).mean,
    fractionFlooded: durationS > 0 ? flooded / durationS : 0,
    state: bellState(bell, bed, drains.length),
  };
}

function bellState(bell: BellSiphonComponent, bed: VesselComponent, cycles: number): BedState {
  if (bell.stall !== null) return bell.stall;
  if (cycles >= 1) return 'cycling';
  return bed.brimful || bell.phase !== 'filling' ? 'flooded' : 'idle';
}

/**
 * Cycle statistics of a plain standpipe bed: a cycle is a flood (spill-start to spill end)
 * followed by a drain through the weep hole. Period = time between successive spill-starts;
 * flood time = spill-start to spill end; drain time is not defined (null).
 */
export function summariseStandpipeBed(standpipe: StandpipeComponent, events: readonly RunEvent[], marks: BedCycleMarks, endS: number, durationS: number): BedSummary {
  const starts = timesOf(events, standpipe.bedId, 'spill-start');
  const ends = timesOf(events, standpipe.bedId, 'spill-end');
  const floods = starts.flatMap((s) => {
    const end = ends.find((e) => e >= s);
    return end === undefined ? [] : [end - s];
  });
  const period = statistics(differences(starts));
  const flooded = standpipe.floodedTimeS + (standpipe.phase === 'spilling' ? endS - standpipe.phaseStartS : 0);
  const cycles = floods.length;
  return {
    id: standpipe.bedId,
    cycles,
    periodMean_s: period.mean,
    periodMin_s: period.min,
    periodMax_s: period.max,
    floodMean_s: statistics(floods).mean,
    drainMean_s: null,
    highLevel_m: statistics(marks.highsM).mean,
    lowLevel_m: statistics(marks.lowsM).mean,
    fractionFlooded: durationS > 0 ? flooded / durationS : 0,
    state: cycles >= 2 ? 'cycling' : standpipe.phase === 'spilling' || cycles === 1 ? 'flooded' : 'idle',
  };
}
