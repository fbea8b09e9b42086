import type {
  Drain,
  LossCoefficients,
  Pipe,
  Pump,
  PumpCurvePoint,
  Scenario,
  ScheduleEntry,
  Vessel,
} from './scenario';
import { SCENARIO_DEFAULTS as D } from './scenario-defaults';
import type { ScenarioFields } from './scenario-input-schema';

type PipeFields = ScenarioFields['pumps'][number]['main'];
type VesselFields = ScenarioFields['vessels'][number];
type BedFields = Extract<VesselFields, { kind: 'bed' }>;
type PumpFields = ScenarioFields['pumps'][number];

/** Fills a pipe's material, roughness, Hazen–Williams C and fitting counts. */
function normalisePipe(pipe: PipeFields): Pipe {
  const material = pipe.material ?? D.material;
  const properties = D.materials[material];
  return {
    length: pipe.length,
    innerDiameter: pipe.innerDiameter,
    material,
    roughness: pipe.roughness ?? properties.roughnessM,
    hazenWilliamsC: pipe.hazenWilliamsC ?? properties.hazenWilliamsC,
    fittings: pipe.fittings ?? { elbow90: 0, elbow45: 0, teeRun: 0, teeBranch: 0, ballValve: 0 },
  };
}

function normaliseDrain(drain: BedFields['drain']): Drain {
  const common = {
    to: drain.to,
    pipe: normalisePipe(drain.pipe),
    outletElevation: drain.outletElevation,
    dischargeLossMultiplier: drain.dischargeLossMultiplier ?? D.dischargeLossMultiplier,
    ...(drain.guard !== undefined && { guard: { diameter: drain.guard.diameter } }),
    standpipe: {
      innerDiameter: drain.standpipe.innerDiameter,
      outerDiameter: drain.standpipe.outerDiameter,
      height: drain.standpipe.height,
      weirCoefficient: drain.standpipe.weirCoefficient ?? D.weirCoefficientSqrtMPerS,
      dischargeCoefficient: drain.standpipe.dischargeCoefficient ?? D.orificeDischargeCoefficient,
    },
  };
  if (drain.type === 'standpipe') {
    const weep = drain.weepHole;
    return {
      type: 'standpipe',
      ...common,
      ...(weep !== undefined && {
        weepHole: {
          diameter: weep.diameter,
          dischargeCoefficient: weep.dischargeCoefficient ?? D.orificeDischargeCoefficient,
        },
      }),
    };
  }
  const { bell } = drain;
  return {
    type: 'bell-siphon',
    ...common,
    bell: { ...bell, outerDiameter: bell.outerDiameter ?? bell.innerDiameter },
    primingCoefficient: drain.primingCoefficient ?? D.primingCoefficient,
  };
}

function normaliseVessel(vessel: VesselFields): Vessel {
  const { overflow } = vessel;
  const common = {
    id: vessel.id,
    shape: vessel.shape,
    floorElevation: vessel.floorElevation,
    height: vessel.height,
    initialLevel: vessel.initialLevel,
    ...(vessel.minLevel !== undefined && { minLevel: vessel.minLevel }),
    ...(overflow !== undefined && {
      overflow: {
        elevation: overflow.elevation,
        diameter: overflow.diameter,
        to: overflow.to,
        dischargeCoefficient: overflow.dischargeCoefficient ?? D.orificeDischargeCoefficient,
        weirCoefficient: overflow.weirCoefficient ?? D.weirCoefficientSqrtMPerS,
      },
    }),
  };
  if (vessel.kind !== 'bed') return { kind: vessel.kind, ...common };
  const mediaType = vessel.media?.type ?? 'none';
  const media = {
    type: mediaType,
    porosity: vessel.media?.porosity ?? D.mediaPorosity[mediaType],
    depth: mediaType === 'none' ? 0 : (vessel.media?.depth ?? vessel.height),
  };
  return { kind: 'bed', ...common, media, drain: normaliseDrain(vessel.drain) };
}

/** Samples H = H0·(1 − (Q/Q0)²) at evenly spaced flows from 0 to Q0. */
function parabolaCurve(maxHeadM: number, maxFlowM3PerS: number): PumpCurvePoint[] {
  const count = D.parabolaSamples;
  return Array.from({ length: count }, (_, index) => {
    const fraction = index / (count - 1);
    return { flow: maxFlowM3PerS * fraction, head: maxHeadM * (1 - fraction * fraction) };
  });
}

function normalisePump(pump: PumpFields): Pump {
  const parabola = pump.curveKind === 'parabola' || pump.curve === undefined;
  const maxHead = pump.maxHead ?? 0;
  const maxFlow = pump.maxFlow ?? 0;
  const curve = parabola
    ? parabolaCurve(maxHead, maxFlow)
    : [...(pump.curve ?? [])].sort((a, b) => a.flow - b.flow);
  return {
    id: pump.id,
    in: pump.in,
    intakeHeight: pump.intakeHeight,
    curveKind: parabola ? 'parabola' : 'points',
    curve,
    ...(parabola && { maxHead, maxFlow }),
    ...(pump.power !== undefined && { power: pump.power }),
    checkValve: pump.checkValve,
    flowScale: pump.flowScale ?? D.pumpFlowScale,
    initialState: pump.initialState,
    main: normalisePipe(pump.main),
    outlets: pump.outlets.map((outlet) => ({ ...outlet, pipe: normalisePipe(outlet.pipe) })),
  };
}

/**
 * Turns a checked scenario (units already in SI) into the normalised `Scenario`: every default
 * filled in, pump curves as sorted points, schedule sorted by time (stable).
 */
export function normaliseScenario(fields: ScenarioFields): Scenario {
  const lossCoefficients: LossCoefficients = { ...D.lossCoefficients, ...fields.lossCoefficients };
  const schedule: ScheduleEntry[] = [...fields.schedule].sort((a, b) => a.at - b.at);
  return {
    format: fields.format,
    name: fields.name,
    ...(fields.description !== undefined && { description: fields.description }),
    water: { temperature: fields.water?.temperature ?? D.waterTemperatureC },
    vessels: fields.vessels.map(normaliseVessel),
    pumps: fields.pumps.map(normalisePump),
    leaks: fields.leaks.map((leak) => ({
      ...leak,
      dischargeCoefficient: leak.dischargeCoefficient ?? D.orificeDischargeCoefficient,
    })),
    schedule,
    controls: fields.controls,
    faults: fields.faults,
    lossCoefficients,
    run: {
      duration: fields.run?.duration ?? D.run.durationS,
      outputInterval: fields.run?.outputInterval ?? D.run.outputIntervalS,
      tolerance: fields.run?.tolerance ?? D.run.tolerance,
      friction: fields.run?.friction ?? D.run.friction,
    },
  };
}
