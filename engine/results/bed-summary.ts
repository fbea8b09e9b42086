import type { BellSiphonComponent } from '../components/bell-siphon';
import type { StandpipeComponent } from '../components/standpipe-drain';
import type { VesselComponent } from '../components/vessel';
import type { BedCycleMarks } from './bed-cycle-recorder';
import type { BedState, BedSummary, RunEvent } from './run-result';

/** Mean, min and max of a list, or nulls when it is empty. */
function statistics(values: readonly number[]): {
  mean: number | null;
  min: number | null;
  max: number | null;
} {
  if (values.length === 0) return { mean: null, min: null, max: null };
  let sum = 0;
  for (const v of values) sum += v;
  return { mean: sum / values.length, min: Math.min(...values), max: Math.max(...values) };
}

const differences = (times: readonly number[]): number[] =>
  times.slice(1).map((t, i) => t - (times[i] as number));
const timesOf = (events: readonly RunEvent[], where: string, kind: string): number[] =>
  events.filter((e) => e.where === where && e.kind === kind).map((e) => e.t_s);

/**
 * Cycle statistics of a bell-siphon bed: a cycle is a priming followed by its break. Period =
 * time between successive primings; flood time = previous break to priming; drain time =
 * priming to break; high and low water per cycle from the recorded marks.
 */
export function summariseBellBed(
  bell: BellSiphonComponent,
  bed: VesselComponent,
  events: readonly RunEvent[],
  marks: BedCycleMarks,
  endS: number,
  durationS: number,
): BedSummary {
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
 * Cycle statistics of a plain standpipe bed: a cycle is a flood (the level at the standpipe top,
 * spilling) followed by a drain through the weep hole that takes the level below half the
 * standpipe height; dips that end sooner belong to the same flood. Period = time between the starts
 * of successive floods; flood time = time spent spilling in each completed cycle; drain time is
 * not defined (null). `openLowM` is the lowest level since the last spill-start (the drain still
 * under way when the run ends).
 */
export function summariseStandpipeBed(
  standpipe: StandpipeComponent,
  events: readonly RunEvent[],
  marks: BedCycleMarks,
  openLowM: number,
  endS: number,
  durationS: number,
): BedSummary {
  const starts = timesOf(events, standpipe.bedId, 'spill-start');
  const ends = timesOf(events, standpipe.bedId, 'spill-end');
  const halfCrestM = 0.5 * standpipe.drain.standpipe.height;
  const floodStarts: number[] = [];
  const floods: number[] = [];
  const highs: number[] = [];
  const lows: number[] = [];
  let spilling = 0;
  let high = -Infinity;
  starts.forEach((start, i) => {
    if (floodStarts.length === 0) floodStarts.push(start);
    const end = ends.find((e) => e >= start);
    spilling += (end ?? endS) - start;
    high = Math.max(high, marks.highsM[i] ?? -Infinity);
    const low =
      i < marks.lowsM.length ? marks.lowsM[i] : i === starts.length - 1 ? openLowM : undefined;
    if (low === undefined || low >= halfCrestM) return;
    floods.push(spilling);
    highs.push(high);
    lows.push(low);
    spilling = 0;
    high = -Infinity;
    const next = starts[i + 1];
    if (next !== undefined) floodStarts.push(next);
  });
  const period = statistics(differences(floodStarts));
  const flooded =
    standpipe.floodedTimeS + (standpipe.phase === 'spilling' ? endS - standpipe.phaseStartS : 0);
  const cycles = floods.length;
  return {
    id: standpipe.bedId,
    cycles,
    periodMean_s: period.mean,
    periodMin_s: period.min,
    periodMax_s: period.max,
    floodMean_s: statistics(floods).mean,
    drainMean_s: null,
    highLevel_m: statistics(highs).mean,
    lowLevel_m: statistics(lows).mean,
    fractionFlooded: durationS > 0 ? flooded / durationS : 0,
    state:
      cycles >= 2
        ? 'cycling'
        : standpipe.phase === 'spilling' || starts.length > 0
          ? 'flooded'
          : 'idle',
  };
}
