import type { BellSiphonComponent } from '../components/bell-siphon';
import type { StandpipeComponent } from '../components/standpipe-drain';
import type { VesselComponent } from '../components/vessel';
import type { BedCycleTally } from './bed-cycle-recorder';
import type { BedState, BedSummary } from './run-result';

/** The summary fields that come straight from a bed's tally. */
function tallyFields(tally: BedCycleTally, drains: boolean) {
  return {
    cycles: tally.cycles,
    periodMean_s: tally.periods.mean,
    periodMin_s: tally.periods.min,
    periodMax_s: tally.periods.max,
    floodMean_s: tally.floods.mean,
    drainMean_s: drains ? tally.drains.mean : null,
    highLevel_m: tally.highs.mean,
    lowLevel_m: tally.lows.mean,
  };
}

/**
 * Summary of a bell-siphon bed: the tally's cycle statistics, the share of time flooded
 * (spilling or siphoning) and its regime: a stall or lock found in its current phase, else
 * cycling once a cycle completed, else flooded (at its rim or spilling) or idle.
 */
export function summariseBellBed(
  bell: BellSiphonComponent,
  bed: VesselComponent,
  tally: BedCycleTally,
  endS: number,
  durationS: number,
): BedSummary {
  const flooded = bell.floodedTimeS + (bell.phase === 'filling' ? 0 : endS - bell.phaseStartS);
  let state: BedState = bed.brimful || bell.phase !== 'filling' ? 'flooded' : 'idle';
  if (tally.cycles >= 1) state = 'cycling';
  if (bell.stall !== null) state = bell.stall;
  return {
    id: bell.bedId,
    ...tallyFields(tally, true),
    fractionFlooded: durationS > 0 ? flooded / durationS : 0,
    state,
  };
}

/**
 * Summary of a plain standpipe bed: the tally's cycle statistics (drain time not defined), the
 * share of time spilling, and its regime: cycling after two completed floods, flooded while it
 * spills or after one flood, else idle.
 */
export function summariseStandpipeBed(
  standpipe: StandpipeComponent,
  tally: BedCycleTally,
  endS: number,
  durationS: number,
): BedSummary {
  const flooded =
    standpipe.floodedTimeS + (standpipe.phase === 'spilling' ? endS - standpipe.phaseStartS : 0);
  const state: BedState =
    tally.cycles >= 2
      ? 'cycling'
      : standpipe.phase === 'spilling' || tally.spilled
        ? 'flooded'
        : 'idle';
  return {
    id: standpipe.bedId,
    ...tallyFields(tally, false),
    fractionFlooded: durationS > 0 ? flooded / durationS : 0,
    state,
  };
}
