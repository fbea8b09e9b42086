import type {
  BedVessel,
  LossCoefficients,
  RunSettings,
  StandpipeDrain,
} from '../../shared/scenario';
import { torricelliOutflowM3PerS } from '../hydraulics/torricelli-outflow';
import { formatSignificant as fmt } from '../results/format-significant';
import {
  switchDue,
  type ModelComponent,
  type ModelContext,
  type SwitchInput,
} from '../system/model-context';
import { bellSpillFlowM3PerS, rimControlHeadM } from './bell-spill-flow';
import { orificeDryEventValue } from './orifice-run-dry';
import { makeSiphonFlowFunction } from './siphon-flow-table';
import type { VesselComponent } from './vessel';

/** Where a plain standpipe drains to. */
export interface StandpipeWiring {
  bed: VesselComponent;
  destination: VesselComponent;
  /** Channel of the rim spill, bed → destination. */
  spillChannel: number;
  /** Channel of the weep hole, or −1 without one. */
  weepChannel: number;
  friction: RunSettings['friction'];
  kinematicViscosityM2PerS: number;
  lossCoefficients: LossCoefficients;
  /** Solve the full-bore flow exactly at every evaluation instead of through the table. */
  exactHydraulics: boolean;
  blockedFraction: number;
}

/**
 * A bed drained by a plain standpipe: above its top the bed spills over the rim (weir, then
 * orifice, capped by the pipe's full-bore capacity), so it stays flooded while water comes in;
 * a weep hole at the floor drains it by Torricelli, Q = C_d·a·√(2·g·h), which with a pump timer
 * makes timer-driven flood and drain. Phases: filling and spilling.
 */
export interface StandpipeComponent extends ModelComponent {
  readonly bedId: string;
  readonly drain: StandpipeDrain;
  readonly wiring: StandpipeWiring;
  phase: 'filling' | 'spilling';
  phaseStartS: number;
  /** Time spent spilling (flooded) in phases already ended, s. */
  floodedTimeS: number;
  /** Full-bore capacity of the standpipe and drain pipe for a head drop, m³/s. */
  fullBoreFlowM3PerS(headDropM: number): number;
  /** Head over the rim where the bore takes over from the rim weir, m; and which side the level is on. */
  readonly rimControlHeadM: number;
  boreControls: boolean;
  /** True while the drain pipe's full-bore capacity, not the rim, limits the spill. */
  pipeLimits: boolean;
  /** The bed has drained to its weep hole (run dry, see ORIFICE_DRY_HEAD_M). */
  weepDry: boolean;
}

const SPILL_START = 0;
const SPILL_END = 1;
const RIM_CONTROL = 2;
const WEEP_DRY = 3;
const PIPE_LIMIT = 4;

/** Creates the standpipe drain of `bed`. */
export function makeStandpipeDrain(
  bed: BedVessel & { drain: StandpipeDrain },
  wiring: StandpipeWiring,
): StandpipeComponent {
  const c: StandpipeComponent = {
    bedId: bed.id,
    drain: bed.drain,
    wiring,
    phase: bed.initialLevel > bed.drain.standpipe.height ? 'spilling' : 'filling',
    phaseStartS: 0,
    floodedTimeS: 0,
    fullBoreFlowM3PerS: makeSiphonFlowFunction(
      bed.drain,
      wiring.friction,
      wiring.kinematicViscosityM2PerS,
      wiring.lossCoefficients,
      bed.floorElevation + bed.height - bed.drain.outletElevation,
      wiring.exactHydraulics,
    ),
    rimControlHeadM: rimControlHeadM(bed.drain.standpipe),
    boreControls: false,
    pipeLimits: false,
    weepDry: bed.initialLevel <= 0,
    eventCount: 5,
    eventOffset: 0,
    computeFlows: (ctx) => writeStandpipeFlows(c, ctx),
    eventValues: (ctx, out) => {
      const level = ctx.levelM[wiring.bed.index] as number;
      const crest = c.drain.standpipe.height;
      out[c.eventOffset + SPILL_START] = c.phase === 'filling' ? crest - level : 1;
      out[c.eventOffset + SPILL_END] = c.phase === 'spilling' ? level - crest : 1;
      const overRim = level - crest - c.rimControlHeadM;
      out[c.eventOffset + RIM_CONTROL] =
        c.phase !== 'spilling' ? 1 : c.boreControls ? overRim : -overRim;
      out[c.eventOffset + WEEP_DRY] =
        c.drain.weepHole === undefined ? 1 : orificeDryEventValue(c.weepDry, level);
      out[c.eventOffset + PIPE_LIMIT] = c.phase !== 'spilling' ? 1 : pipeLimitEventValue(c, ctx);
    },
    switchModes: (input) => switchStandpipePhase(c, input),
  };
  return c;
}

/** Spill over the rim (weir or bore, by mode) at bed level `levelM`, m³/s. */
function rimSpillM3PerS(c: StandpipeComponent, levelM: number): number {
  return bellSpillFlowM3PerS(c.drain.standpipe, levelM - c.drain.standpipe.height, c.boreControls);
}

/** Full-bore capacity of standpipe and drain pipe from the bed surface, m³/s. */
function pipeCapacityM3PerS(c: StandpipeComponent, ctx: ModelContext, levelM: number): number {
  const { bed, destination } = c.wiring;
  const tailM = Math.max(c.drain.outletElevation, ctx.surfaceM[destination.index] as number);
  return c.fullBoreFlowM3PerS(bed.vessel.floorElevation + levelM - tailM);
}

/**
 * The spill is the smaller of the rim's flow and the pipe's capacity; the switch between them is
 * an event (capacity minus rim flow while the rim limits, the reverse while the pipe does), so
 * the spill has no kink between events.
 */
function pipeLimitEventValue(c: StandpipeComponent, ctx: ModelContext): number {
  const level = ctx.levelM[c.wiring.bed.index] as number;
  const margin = pipeCapacityM3PerS(c, ctx, level) - rimSpillM3PerS(c, level);
  return c.pipeLimits ? -margin : margin;
}

function writeStandpipeFlows(c: StandpipeComponent, ctx: ModelContext): void {
  const { bed, spillChannel, weepChannel, blockedFraction } = c.wiring;
  const level = ctx.levelM[bed.index] as number;
  const open = 1 - blockedFraction;
  let spill = 0;
  if (c.phase === 'spilling')
    spill = c.pipeLimits ? pipeCapacityM3PerS(c, ctx, level) : rimSpillM3PerS(c, level);
  ctx.flowM3PerS[spillChannel] = spill * open;
  const weep = c.drain.weepHole;
  if (weep !== undefined && weepChannel >= 0) {
    const areaM2 = (Math.PI / 4) * weep.diameter ** 2;
    ctx.flowM3PerS[weepChannel] = c.weepDry
      ? 0
      : torricelliOutflowM3PerS(weep.dischargeCoefficient, areaM2, level) * open;
  }
}

function switchStandpipePhase(c: StandpipeComponent, input: SwitchInput): boolean {
  const { ctx, fired } = input;
  const o = c.eventOffset;
  const level = ctx.levelM[c.wiring.bed.index] as number;
  const crest = c.drain.standpipe.height;
  if (c.phase === 'filling' && switchDue(fired, o + SPILL_START, crest - level)) {
    c.phase = 'spilling';
    c.phaseStartS = ctx.timeS;
    input.log({
      t_s: ctx.timeS,
      kind: 'spill-start',
      where: c.bedId,
      detail: `Water reached the standpipe top (${fmt(crest)} m): the bed is flooded and spills into the drain.`,
      values: { levelM: level },
    });
    return true;
  }
  if (c.phase === 'spilling' && switchDue(fired, o + SPILL_END, level - crest)) {
    c.floodedTimeS += ctx.timeS - c.phaseStartS;
    c.phase = 'filling';
    c.phaseStartS = ctx.timeS;
    c.boreControls = false;
    c.pipeLimits = false;
    input.log({
      t_s: ctx.timeS,
      kind: 'spill-end',
      where: c.bedId,
      detail: 'The level fell below the standpipe top: the bed drains.',
      values: { levelM: level },
    });
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
  if (c.phase === 'spilling' && switchDue(fired, o + PIPE_LIMIT, pipeLimitEventValue(c, ctx))) {
    c.pipeLimits = !c.pipeLimits;
    return true;
  }
  if (
    c.drain.weepHole !== undefined &&
    switchDue(fired, o + WEEP_DRY, orificeDryEventValue(c.weepDry, level))
  ) {
    c.weepDry = !c.weepDry;
    return true;
  }
  return false;
}
