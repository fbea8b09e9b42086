import type {
  BedVessel,
  LossCoefficients,
  BellSiphonDrain,
  RunSettings,
} from '../../shared/scenario';
import { formatSignificant as fmt } from '../results/format-significant';
import {
  switchDue,
  type ModelComponent,
  type ModelContext,
  type SwitchInput,
} from '../system/model-context';
import { STANDARD_GRAVITY_M_PER_S2 as G } from '../hydraulics/standard-gravity';
import { bellSpillFlowM3PerS, rimControlHeadM } from './bell-spill-flow';
import { primingFlowM3PerS } from './siphon-flow';
import { makeSiphonFlowFunction } from './siphon-flow-table';
import type { VesselComponent } from './vessel';

/** The phase of a bell-siphon bed between events (priming and break are instants). */
export type BellPhase = 'filling' | 'spilling' | 'siphoning';

/** Where a bell siphon drains to and how its water is counted. */
export interface BellSiphonWiring {
  bed: VesselComponent;
  destination: VesselComponent;
  /** State index of the water held in the standpipe and drain pipe. */
  heldIndex: number;
  /** Channel bed → destination. */
  channel: number;
  friction: RunSettings['friction'];
  kinematicViscosityM2PerS: number;
  lossCoefficients: LossCoefficients;
  /** Solve the full-bore flow exactly at every evaluation instead of through the table. */
  exactHydraulics: boolean;
  /** Fraction of the drain's flow area blocked (fault), 0 ≤ f < 1. */
  blockedFraction: number;
}

/**
 * A bed drained by a bell siphon, phase by phase: filling (no outflow), spilling (weir flow over
 * the standpipe rim), priming (instant: when the spill reaches Q_prime = k_p·√(g·D_s⁵) the falling
 * water seals the drain and the pipes fill), siphoning (full-bore energy balance from the bed
 * surface to the outlet, or to the receiving surface when the outlet is submerged), and break
 * (instant: at the intake or snorkel level air enters; the water held in the pipes falls on to the
 * destination).
 */
export interface BellSiphonComponent extends ModelComponent {
  readonly bedId: string;
  readonly drain: BellSiphonDrain;
  readonly wiring: BellSiphonWiring;
  phase: BellPhase;
  /** Q_prime, m³/s. */
  readonly primingFlowM3PerS: number;
  /** Level at which the siphon breaks, m above the bed floor. */
  readonly breakLevelM: number;
  /** Volume of the standpipe bore above the floor plus the drain pipe, m³. */
  readonly pipeVolumeM3: number;
  /** Stall found in the current phase (set by the stall monitor), else null. */
  stall: 'spill-stall' | 'siphon-lock' | null;
  /** Time the current phase began, s. */
  phaseStartS: number;
  /** Time spent spilling or siphoning in phases already ended, s. */
  floodedTimeS: number;
  /** Outflow at bed level `levelM` in the current phase, m³/s. */
  outflowAtLevel(ctx: ModelContext, levelM: number): number;
  /** Full-bore siphon flow with the bed at `levelM`, m³/s. */
  siphonFlowAtLevel(ctx: ModelContext, levelM: number): number;
  /** Spill over the rim with the bed at `levelM`, m³/s (by the current rim or bore control). */
  spillFlowAtLevel(levelM: number): number;
  /** Full-bore flow for a head drop (bed surface to tail water or outlet), m³/s, before any blockage. */
  fullBoreFlowM3PerS(headDropM: number): number;
  /** Head over the rim where the bore takes over from the rim weir, m; and which side the level is on. */
  readonly rimControlHeadM: number;
  boreControls: boolean;
}

const SPILL_START = 0;
const SPILL_END = 1;
const PRIME = 2;
const BREAK = 3;
const RIM_CONTROL = 4;

/** Creates the bell-siphon drain of `bed`. */
export function makeBellSiphon(
  bed: BedVessel & { drain: BellSiphonDrain },
  wiring: BellSiphonWiring,
): BellSiphonComponent {
  const drain = bed.drain;
  const standpipeAreaM2 = (Math.PI / 4) * drain.standpipe.innerDiameter ** 2;
  const pipeAreaM2 = (Math.PI / 4) * drain.pipe.innerDiameter ** 2;
  const c: BellSiphonComponent = {
    bedId: bed.id,
    drain,
    wiring,
    phase: bed.initialLevel > drain.standpipe.height ? 'spilling' : 'filling',
    primingFlowM3PerS: primingFlowM3PerS(drain),
    breakLevelM: drain.bell.snorkelHeight ?? drain.bell.intakeHeight,
    pipeVolumeM3: standpipeAreaM2 * drain.standpipe.height + pipeAreaM2 * drain.pipe.length,
    stall: null,
    phaseStartS: 0,
    floodedTimeS: 0,
    rimControlHeadM: rimControlHeadM(drain.standpipe),
    boreControls: false,
    eventCount: 5,
    eventOffset: 0,
    outflowAtLevel: (ctx, levelM) => bellOutflow(c, ctx, levelM),
    siphonFlowAtLevel: (ctx, levelM) => siphonFlow(c, ctx, levelM),
    spillFlowAtLevel: (levelM) =>
      bellSpillFlowM3PerS(drain.standpipe, levelM - drain.standpipe.height, c.boreControls),
    fullBoreFlowM3PerS: makeSiphonFlowFunction(
      drain,
      wiring.friction,
      wiring.kinematicViscosityM2PerS,
      wiring.lossCoefficients,
      bed.floorElevation + bed.height - drain.outletElevation,
      wiring.exactHydraulics,
    ),
    computeFlows: (ctx) => {
      ctx.flowM3PerS[wiring.channel] = bellOutflow(c, ctx, ctx.levelM[wiring.bed.index] as number);
    },
    eventValues: (ctx, out) => writeBellEvents(c, ctx, out),
    switchModes: (input) => switchBellPhase(c, input),
  };
  return c;
}

function bellOutflow(c: BellSiphonComponent, ctx: ModelContext, levelM: number): number {
  if (c.phase === 'filling') return 0;
  if (c.phase === 'spilling') return c.spillFlowAtLevel(levelM);
  return siphonFlow(c, ctx, levelM);
}

/** Full-bore flow: bed surface to the outlet, or to the destination surface when higher. */
function siphonFlow(c: BellSiphonComponent, ctx: ModelContext, levelM: number): number {
  const { bed, destination, blockedFraction } = c.wiring;
  const surfaceM = bed.vessel.floorElevation + levelM;
  const tailM = Math.max(c.drain.outletElevation, ctx.surfaceM[destination.index] as number);
  return c.fullBoreFlowM3PerS(surfaceM - tailM) * (1 - blockedFraction);
}

function writeBellEvents(c: BellSiphonComponent, ctx: ModelContext, out: Float64Array): void {
  const o = c.eventOffset;
  const level = ctx.levelM[c.wiring.bed.index] as number;
  const crest = c.drain.standpipe.height;
  out[o + SPILL_START] = c.phase === 'filling' ? crest - level : 1;
  out[o + SPILL_END] = c.phase === 'spilling' ? level - crest : 1;
  out[o + PRIME] = c.phase === 'spilling' ? c.primingFlowM3PerS - c.spillFlowAtLevel(level) : 1;
  out[o + BREAK] = c.phase === 'siphoning' ? level - c.breakLevelM : 1;
  const overRim = level - crest - c.rimControlHeadM;
  out[o + RIM_CONTROL] = c.phase !== 'spilling' ? 1 : c.boreControls ? overRim : -overRim;
}

function switchBellPhase(c: BellSiphonComponent, input: SwitchInput): boolean {
  const { ctx, fired } = input;
  const o = c.eventOffset;
  const level = ctx.levelM[c.wiring.bed.index] as number;
  const crest = c.drain.standpipe.height;
  if (c.phase === 'filling' && switchDue(fired, o + SPILL_START, crest - level)) {
    enterPhase(c, input, 'spilling');
    input.log({
      t_s: ctx.timeS,
      kind: 'spill-start',
      where: c.bedId,
      detail: `Water reached the standpipe top (${fmt(crest)} m) and spills into the drain.`,
      values: { levelM: level },
    });
    return true;
  }
  if (
    c.phase === 'spilling' &&
    switchDue(fired, o + PRIME, c.primingFlowM3PerS - c.spillFlowAtLevel(level))
  ) {
    prime(c, input, level);
    return true;
  }
  if (c.phase === 'spilling' && switchDue(fired, o + SPILL_END, level - crest)) {
    enterPhase(c, input, 'filling');
    input.log({
      t_s: ctx.timeS,
      kind: 'spill-end',
      where: c.bedId,
      detail: 'The level fell back below the standpipe top without priming the siphon.',
      values: { levelM: level },
    });
    return true;
  }
  if (c.phase === 'siphoning' && switchDue(fired, o + BREAK, level - c.breakLevelM)) {
    breakSiphon(c, input, level);
    return true;
  }
  const overRim = level - crest - c.rimControlHeadM;
  if (
    c.phase === 'spilling' &&
    switchDue(fired, o + RIM_CONTROL, c.boreControls ? overRim : -overRim)
  ) {
    c.boreControls = !c.boreControls;
    return true;
  }
  return false;
}

function enterPhase(c: BellSiphonComponent, input: SwitchInput, phase: BellPhase): void {
  if (c.phase !== 'filling') c.floodedTimeS += input.ctx.timeS - c.phaseStartS;
  c.phase = phase;
  c.stall = null;
  c.boreControls = false;
  c.phaseStartS = input.ctx.timeS;
}

/** The drain seals: the pipes fill from the bed at once and full-bore flow starts. */
function prime(c: BellSiphonComponent, input: SwitchInput, level: number): void {
  const { state, ctx } = input;
  const { bed, heldIndex } = c.wiring;
  const spill = c.spillFlowAtLevel(level);
  const spillNumber = spill / Math.sqrt(G * c.drain.standpipe.innerDiameter ** 5);
  const spillDurationS = ctx.timeS - c.phaseStartS;
  const available = Math.max(
    0,
    (state[bed.index] as number) - bed.geometry.volumeAtLevelM3(c.breakLevelM),
  );
  const fill = Math.min(c.pipeVolumeM3, available);
  state[bed.index] = (state[bed.index] as number) - fill;
  state[heldIndex] = (state[heldIndex] as number) + fill;
  enterPhase(c, input, 'siphoning');
  input.log({
    t_s: ctx.timeS,
    kind: 'primed',
    where: c.bedId,
    detail: `The siphon primed: spill ${fmt(spill * 60000)} L/min reached the priming flow ${fmt(c.primingFlowM3PerS * 60000)} L/min (spill number ${fmt(spillNumber, 3)} = k_p ${fmt(c.drain.primingCoefficient, 3)}) after ${fmt(spillDurationS)} s of spilling.`,
    values: {
      spillM3PerS: spill,
      primingFlowM3PerS: c.primingFlowM3PerS,
      spillNumber,
      levelM: level,
      spillDurationS,
    },
  });
}

/** Air enters the bell: the water in the pipes falls on to the destination. */
function breakSiphon(c: BellSiphonComponent, input: SwitchInput, level: number): void {
  const { state, ctx } = input;
  const { heldIndex, destination } = c.wiring;
  const held = state[heldIndex] as number;
  state[heldIndex] = 0;
  state[destination.index] = (state[destination.index] as number) + held;
  const drainS = ctx.timeS - c.phaseStartS;
  enterPhase(c, input, 'filling');
  input.log({
    t_s: ctx.timeS,
    kind: 'siphon-break',
    where: c.bedId,
    detail: `The siphon broke at ${fmt(level)} m (intake ${fmt(c.breakLevelM)} m) after draining for ${fmt(drainS)} s; ${fmt(held * 1000)} L held in the pipes fell to ${destination.vessel.id}.`,
    values: { levelM: level, drainDurationS: drainS, heldM3: held },
  });
}
