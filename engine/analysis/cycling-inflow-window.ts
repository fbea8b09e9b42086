import type { BedVessel, BellSiphonDrain, Scenario } from '../../shared/scenario/index';
import { bellSpillFlowM3PerS } from '../components/bell-spill-flow';
import { primingFlowM3PerS, siphonFullBoreFlowM3PerS } from '../components/siphon-flow';
import { waterKinematicViscosityM2PerS } from '../hydraulics/water-properties';
import { pumpedInflowsM3PerS } from './pump-duty-points';

/** The regime a bell-siphon bed settles into at a steady inflow. */
export type InflowRegime = 'idle' | 'spill-stall' | 'cycling' | 'siphon-lock' | 'rim-overflow';

/** The inflows over which a bell-siphon bed cycles, and where the bed's own inflow sits. */
export interface InflowWindow {
  bedId: string;
  /**
   * Lowest inflow that primes the siphon, m³/s: the spill over the rim must reach the priming flow
   * Q_prime = k_p·√(g·D_s⁵). At a steady inflow the spill settles at the inflow, so Q_in > Q_prime.
   */
  primingInflowM3PerS: number;
  /**
   * Highest inflow the primed siphon still breaks at, m³/s: the full-bore flow with the bed at the
   * break level; a larger inflow holds the level above the intake (siphon lock).
   */
  breakingInflowM3PerS: number;
  /** Spill over the standpipe rim with the bed brim-full, m³/s (before priming). */
  spillAtRimM3PerS: number;
  /** Full-bore siphon flow with the bed brim-full, m³/s. */
  siphonAtRimM3PerS: number;
  /** Inflow above which the bed spills over its rim, m³/s. */
  rimOverflowInflowM3PerS: number;
  /** The cycling range [low, high), m³/s; null when no steady inflow cycles this bed. */
  cyclingRange: { lowM3PerS: number; highM3PerS: number } | null;
  /** The bed's steady inflow from the pumps at the starting levels, m³/s. */
  inflowM3PerS: number;
  /** The regime at that inflow. */
  regime: InflowRegime;
  /** Tail water used for the full-bore flow (drain outlet, or the receiving surface when higher), m above datum. */
  tailWaterM: number;
}

/** Options of {@link cyclingInflowWindow}. */
export interface InflowWindowOptions {
  /** Use this inflow instead of the pumps' steady delivery, m³/s. */
  inflowM3PerS?: number;
}

/**
 * The regime at a steady inflow `q`, m³/s, from the flow balance of the bed's phases: below the
 * priming flow the spill settles without priming (spill stall), unless the bed is brim-full first
 * (rim overflow); between priming and breaking inflows it cycles; above the breaking inflow the
 * primed siphon cannot draw the bed down to the intake (siphon lock), and above the siphon's flow
 * at the rim the bed overflows.
 */
export function regimeAtInflow(
  window: Omit<InflowWindow, 'regime' | 'inflowM3PerS'>,
  q: number,
): InflowRegime {
  if (!(q > 0)) return 'idle';
  if (window.spillAtRimM3PerS < window.primingInflowM3PerS) {
    return q < window.spillAtRimM3PerS ? 'spill-stall' : 'rim-overflow';
  }
  if (q <= window.primingInflowM3PerS) return 'spill-stall';
  if (q < window.breakingInflowM3PerS) return 'cycling';
  return q < window.siphonAtRimM3PerS ? 'siphon-lock' : 'rim-overflow';
}

function blockedFraction(scenario: Scenario, bedId: string): number {
  let open = 1;
  for (const fault of scenario.faults)
    if (fault.kind === 'drain-blocked' && fault.bed === bedId) open *= 1 - fault.fraction;
  return 1 - open;
}

/** The receiving water surface or the drain outlet, whichever is higher, m above datum. */
function tailWaterM(scenario: Scenario, drain: BellSiphonDrain): number {
  const destination = scenario.vessels.find((v) => v.id === drain.to);
  const surface = destination ? destination.floorElevation + destination.initialLevel : -Infinity;
  return Math.max(drain.outletElevation, surface);
}

function isBellBed(
  vessel: Scenario['vessels'][number],
): vessel is BedVessel & { drain: BellSiphonDrain } {
  return vessel.kind === 'bed' && vessel.drain.type === 'bell-siphon';
}

/**
 * The cycling inflow window of a bell-siphon bed, solved from the flow balance of its phases
 * rather than by simulation: Q_prime = k_p·√(g·D_s⁵) (the engine's priming rule), the full-bore
 * siphon flow at the break level and at the rim (energy balance from the bed surface to the tail
 * water, the engine's `siphonFullBoreFlowM3PerS`, times the open fraction of a blocked drain), and
 * the rim spill at a brim-full bed (weir or bore control, the smaller). Holds for a steady inflow
 * and a steady tail water (the receiving vessel's starting level); the engine's runs agree with it
 * where the inflow barely changes over a cycle. Returns null for a bed that is not a bell siphon.
 */
export function cyclingInflowWindow(
  scenario: Scenario,
  bedId: string,
  options: InflowWindowOptions = {},
): InflowWindow | null {
  const bed = scenario.vessels.find((v) => v.id === bedId);
  if (!bed || !isBellBed(bed)) return null;
  const drain = bed.drain;
  const nu = waterKinematicViscosityM2PerS(scenario.water.temperature);
  const tail = tailWaterM(scenario, drain);
  const open = 1 - blockedFraction(scenario, bedId);
  const siphonAt = (levelM: number): number =>
    open *
    siphonFullBoreFlowM3PerS(
      drain,
      bed.floorElevation + levelM - tail,
      scenario.run.friction,
      nu,
      scenario.lossCoefficients,
    );
  const breakLevelM = drain.bell.snorkelHeight ?? drain.bell.intakeHeight;
  const primingInflow = primingFlowM3PerS(drain);
  const bounds = {
    bedId,
    primingInflowM3PerS: primingInflow,
    breakingInflowM3PerS: siphonAt(breakLevelM),
    spillAtRimM3PerS: bellSpillFlowM3PerS(drain.standpipe, bed.height - drain.standpipe.height),
    siphonAtRimM3PerS: siphonAt(bed.height),
    tailWaterM: tail,
  };
  const rimOverflow =
    bounds.spillAtRimM3PerS < primingInflow ? bounds.spillAtRimM3PerS : bounds.siphonAtRimM3PerS;
  const cycles =
    bounds.spillAtRimM3PerS >= primingInflow && primingInflow < bounds.breakingInflowM3PerS;
  const window = {
    ...bounds,
    rimOverflowInflowM3PerS: rimOverflow,
    cyclingRange: cycles
      ? { lowM3PerS: primingInflow, highM3PerS: bounds.breakingInflowM3PerS }
      : null,
  };
  const inflow = options.inflowM3PerS ?? pumpedInflowsM3PerS(scenario).get(bedId) ?? 0;
  return { ...window, inflowM3PerS: inflow, regime: regimeAtInflow(window, inflow) };
}

/** The cycling inflow window of every bell-siphon bed, in scenario order. */
export function cyclingInflowWindows(scenario: Scenario): InflowWindow[] {
  const inflows = pumpedInflowsM3PerS(scenario);
  return scenario.vessels
    .filter(isBellBed)
    .map((bed) => cyclingInflowWindow(scenario, bed.id, { inflowM3PerS: inflows.get(bed.id) ?? 0 }))
    .filter((w): w is InflowWindow => w !== null);
}
