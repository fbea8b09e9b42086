import type { BedVessel, Pump, Scenario } from '../../shared/scenario';
import { siphonFullBoreFlowM3PerS } from '../components/siphon-flow';
import { waterKinematicViscosityM2PerS } from '../hydraulics/water-properties';
import { makePumpLineHydraulics, solvePumpOperatingPoint } from '../system/operating-point';

/** A pipe the run applies pipe friction to, at its working flow. */
export interface FrictionPipe {
  /** Which pipe, for people: "p1 main pipe", "p1 outlet to bed-1", "bed-1 drain pipe". */
  name: string;
  /** Bore, m; for a bell's annulus its hydraulic diameter D_bell − D_standpipe,outer. */
  diameterM: number;
  /** Mean velocity Q/A at the working flow, m/s (0 when nothing flows). */
  velocityMPerS: number;
}

const disc = (diameterM: number): number => (Math.PI / 4) * diameterM * diameterM;

/** The initial water surface of a vessel, m above the datum (−∞ for "out"). */
function initialSurfaceM(scenario: Scenario, id: string): number {
  const vessel = scenario.vessels.find((v) => v.id === id);
  return vessel === undefined
    ? Number.NEGATIVE_INFINITY
    : vessel.floorElevation + vessel.initialLevel;
}

/**
 * A pump line's pipes at its operating point (the run's friction model) with the source at its
 * starting level and each outlet discharging at its end, or under the destination's starting
 * surface when that is higher; a worn-pump fault scales the curve as in the run.
 */
function pumpPipes(scenario: Scenario, pump: Pump, nu: number): FrictionPipe[] {
  const wear = scenario.faults.reduce(
    (scale, f) => (f.kind === 'pump-worn' && f.pump === pump.id ? scale * f.flowScale : scale),
    1,
  );
  const line = makePumpLineHydraulics(pump, scenario.lossCoefficients, wear);
  const targetsM = pump.outlets.map((o) => Math.max(o.elevation, initialSurfaceM(scenario, o.to)));
  const sourceM = initialSurfaceM(scenario, pump.in);
  const point = solvePumpOperatingPoint(line, sourceM, targetsM, scenario.run.friction, nu);
  const main: FrictionPipe = {
    name: `${pump.id} main pipe`,
    diameterM: pump.main.innerDiameter,
    velocityMPerS: point.pumpFlowM3PerS / disc(pump.main.innerDiameter),
  };
  const outlets = pump.outlets.map((outlet, i): FrictionPipe => {
    const flow = point.outletFlowsM3PerS[i] ?? 0;
    return {
      name: `${pump.id} outlet to ${outlet.to}`,
      diameterM: outlet.pipe.innerDiameter,
      velocityMPerS: flow / disc(outlet.pipe.innerDiameter),
    };
  });
  return [main, ...outlets];
}

/**
 * A bed drain's friction sections (bell annulus, standpipe bore, drain pipe) at the drain's
 * full-bore flow with the bed at its standpipe's height and a free outlet.
 */
function drainPipes(scenario: Scenario, bed: BedVessel, nu: number): FrictionPipe[] {
  const { drain } = bed;
  const headDropM = bed.floorElevation + drain.standpipe.height - drain.outletElevation;
  const flow = siphonFullBoreFlowM3PerS(
    drain,
    headDropM,
    scenario.run.friction,
    nu,
    scenario.lossCoefficients,
  );
  const pipes: FrictionPipe[] = [];
  if (drain.type === 'bell-siphon') {
    const annulusM2 = disc(drain.bell.innerDiameter) - disc(drain.standpipe.outerDiameter);
    pipes.push({
      name: `${bed.id} bell annulus`,
      diameterM: drain.bell.innerDiameter - drain.standpipe.outerDiameter,
      velocityMPerS: flow / annulusM2,
    });
  }
  pipes.push(
    {
      name: `${bed.id} standpipe`,
      diameterM: drain.standpipe.innerDiameter,
      velocityMPerS: flow / disc(drain.standpipe.innerDiameter),
    },
    {
      name: `${bed.id} drain pipe`,
      diameterM: drain.pipe.innerDiameter,
      velocityMPerS: flow / disc(drain.pipe.innerDiameter),
    },
  );
  return pipes;
}

/**
 * Every pipe the engine applies pipe friction to (pump main and outlet pipes, each bed's bell
 * annulus, standpipe bore and drain pipe), with its bore and its velocity at its working flow: the
 * pump line's operating point at the starting levels, the drain's full-bore flow at standpipe
 * height. Flows by the scenario's friction model; ν from the water temperature.
 */
export function frictionPipes(scenario: Scenario): FrictionPipe[] {
  const nu = waterKinematicViscosityM2PerS(scenario.water.temperature);
  const pumps = scenario.pumps.flatMap((pump) => pumpPipes(scenario, pump, nu));
  const drains = scenario.vessels.flatMap((vessel) =>
    vessel.kind === 'bed' ? drainPipes(scenario, vessel, nu) : [],
  );
  return [...pumps, ...drains];
}
