import type { LossCoefficients, Pump, RunSettings } from '../../shared/scenario';
import { STANDARD_GRAVITY_M_PER_S2 as G } from '../hydraulics/standard-gravity';
import type { ModelComponent, ModelContext } from '../system/model-context';
import { makePumpLineHydraulics, type PumpLineHydraulics } from '../system/operating-point';
import { backSiphonFlowsM3PerS } from './back-siphon-flow';
import type { FloatSwitchTarget } from './float-switch';
import {
  makePumpResponseFunction,
  type PumpResponse,
  type PumpResponseFunction,
} from './pump-response-table';
import {
  DRY_RESTART_MARGIN_M,
  startVolumeM3,
  submergenceM,
  switchPumpLine,
} from './pump-line-switching';
import type { VesselComponent } from './vessel';

/** Where a pump line draws from and delivers to, and where its totals are counted. */
export interface PumpLineWiring {
  source: VesselComponent;
  outlets: { destination: VesselComponent; channel: number }[];
  heldIndex: number;
  pumpedIndex: number;
  energyIndex: number;
  friction: RunSettings['friction'];
  kinematicViscosityM2PerS: number;
  densityKgPerM3: number;
  lossCoefficients: LossCoefficients;
  /** Multiplies the curve's flows on top of the pump's own flow scale (worn-pump fault). */
  faultFlowScale: number;
  /** Solve the operating point exactly at every evaluation instead of through the table. */
  exactHydraulics: boolean;
  /** Shared by every pump: false during a power cut. */
  power: { on: boolean };
}

/**
 * A pump line: pump, main pipe, manifold and outlets. Running, it delivers the operating point of
 * its curve against the pipes (solved at every evaluation, warm-started). It runs when commanded
 * on, powered, not held off by a float switch, and not dry; it goes dry when its source falls to
 * the intake and restarts above intake + margin. Starting with an empty line, it first fills its
 * pipes from the source; stopping without a check valve, the pipes drain back into the source, or,
 * with an outlet under water, the line back-siphons until that outlet is uncovered.
 */
export interface PumpLineComponent extends ModelComponent, FloatSwitchTarget {
  readonly pump: Pump;
  readonly wiring: PumpLineWiring;
  /** Volume of the main pipe and outlet pipes, m³. */
  readonly lineVolumeM3: number;
  commandedOn: boolean;
  /** True when it was last wanted to run (commanded, powered, no float switch holding it). */
  wanted: boolean;
  running: boolean;
  dry: boolean;
  /** Time the pump last went dry, s, and the dry time of intervals already ended, s. */
  drySinceS: number;
  dryTotalS: number;
  lineFull: boolean;
  backSiphoning: boolean;
  /** Last operating point: pump flow m³/s, head m, power W. */
  readonly reading: { flowM3PerS: number; headM: number; powerW: number };
  /** Curve and pipes prepared for the operating-point solve. */
  readonly hydraulics: PumpLineHydraulics;
  /** The operating point as a function of the source level (tabulated; exact when outlets are drowned). */
  readonly response: PumpResponseFunction;
  /** Scratch: outlet target elevations, the last response, back-flows. */
  readonly targetsM: number[];
  readonly point: PumpResponse;
  readonly backFlowsM3PerS: Float64Array;
  /** Whether every outlet is under its destination's surface (the line can siphon back). */
  outletsSubmerged(ctx: ModelContext): boolean;
}

/** Creates the pump line of `pump`. */
export function makePumpLine(pump: Pump, wiring: PumpLineWiring): PumpLineComponent {
  const pipeVolume = (p: { length: number; innerDiameter: number }): number =>
    (Math.PI / 4) * p.innerDiameter ** 2 * p.length;
  const hydraulics = makePumpLineHydraulics(pump, wiring.lossCoefficients, wiring.faultFlowScale);
  const source = wiring.source.vessel;
  const zLowM = source.floorElevation + Math.max(0, pump.intakeHeight - 0.1 * source.height);
  const zHighM = source.floorElevation + 1.1 * source.height;
  const c: PumpLineComponent = {
    id: pump.id,
    pump,
    wiring,
    lineVolumeM3:
      pipeVolume(pump.main) +
      pump.outlets.reduce((sum, outlet) => sum + pipeVolume(outlet.pipe), 0),
    commandedOn: pump.initialState === 'on',
    wanted: false,
    running: false,
    dry: false,
    drySinceS: 0,
    dryTotalS: 0,
    lineFull: false,
    backSiphoning: false,
    floatStops: 0,
    reading: { flowM3PerS: 0, headM: 0, powerW: 0 },
    hydraulics,
    response: makePumpResponseFunction(
      hydraulics,
      pump.outlets.map((outlet) => outlet.elevation),
      wiring.friction,
      wiring.kinematicViscosityM2PerS,
      zLowM,
      zHighM,
      wiring.exactHydraulics,
    ),
    targetsM: pump.outlets.map((outlet) => outlet.elevation),
    point: {
      pumpFlowM3PerS: 0,
      headM: 0,
      outletFlowsM3PerS: new Float64Array(pump.outlets.length),
    },
    backFlowsM3PerS: new Float64Array(pump.outlets.length),
    eventCount: 3,
    eventOffset: 0,
    outletsSubmerged: (ctx) => pump.outlets.every((_outlet, i) => submergenceM(c, ctx, i) > 0),
    computeFlows: (ctx, rates) => writePumpFlows(c, ctx, rates),
    eventValues: (ctx, out) => writePumpEvents(c, ctx, out),
    switchModes: (input) => switchPumpLine(c, input),
  };
  return c;
}

function writePumpEvents(c: PumpLineComponent, ctx: ModelContext, out: Float64Array): void {
  const o = c.eventOffset;
  const sourceVolume = ctx.state[c.wiring.source.index] as number;
  out[o] = c.running ? (ctx.levelM[c.wiring.source.index] as number) - c.pump.intakeHeight : 1;
  out[o + 1] = c.dry && c.wanted ? startVolumeM3(c, DRY_RESTART_MARGIN_M) - sourceVolume : 1;
  let lowest = Infinity;
  for (let i = 0; i < c.pump.outlets.length; i += 1)
    lowest = Math.min(lowest, submergenceM(c, ctx, i));
  out[o + 2] = c.backSiphoning ? lowest : 1;
}

function writePumpFlows(c: PumpLineComponent, ctx: ModelContext, rates: Float64Array): void {
  const { source, outlets } = c.wiring;
  const reading = c.reading;
  reading.flowM3PerS = 0;
  reading.headM = 0;
  reading.powerW = 0;
  if (c.running) {
    let free = true;
    for (let i = 0; i < outlets.length; i += 1) {
      const elevation = c.pump.outlets[i]?.elevation ?? 0;
      const surface = ctx.surfaceM[outlets[i]?.destination.index ?? 0] as number;
      c.targetsM[i] = Math.max(elevation, surface);
      if (surface > elevation) free = false;
    }
    const point = c.point;
    c.response.evaluate(ctx.surfaceM[source.index] as number, c.targetsM, free, point);
    let total = 0;
    for (let i = 0; i < outlets.length; i += 1) {
      const flow = point.outletFlowsM3PerS[i] as number;
      ctx.flowM3PerS[outlets[i]?.channel ?? 0] = flow;
      total += flow;
    }
    reading.flowM3PerS = total;
    reading.headM = point.headM;
    reading.powerW = c.pump.power ?? c.wiring.densityKgPerM3 * G * total * point.headM;
  } else if (c.backSiphoning) {
    writeBackSiphonFlows(c, ctx);
  }
  rates[c.wiring.pumpedIndex] = reading.flowM3PerS;
  rates[c.wiring.energyIndex] = reading.powerW;
}

function writeBackSiphonFlows(c: PumpLineComponent, ctx: ModelContext): void {
  const { source, outlets, friction, kinematicViscosityM2PerS, lossCoefficients } = c.wiring;
  for (let i = 0; i < outlets.length; i += 1)
    c.targetsM[i] = ctx.surfaceM[outlets[i]?.destination.index ?? 0] as number;
  backSiphonFlowsM3PerS(
    c.hydraulics,
    ctx.surfaceM[source.index] as number,
    c.targetsM,
    friction,
    kinematicViscosityM2PerS,
    lossCoefficients,
    c.backFlowsM3PerS,
  );
  for (let i = 0; i < outlets.length; i += 1)
    ctx.flowM3PerS[outlets[i]?.channel ?? 0] = -(c.backFlowsM3PerS[i] as number);
}
