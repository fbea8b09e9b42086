import type { Pump, Scenario, Vessel } from '../../shared/scenario/index';
import { waterKinematicViscosityM2PerS } from '../hydraulics/water-properties';
import { makePumpLineHydraulics, solvePumpOperatingPoint } from '../system/operating-point';

/** A pump's steady operating point with every vessel at its starting level. */
export interface PumpDutyPoint {
  pumpId: string;
  /** Pump flow, m³/s (0 when the source starts at or below the intake). */
  flowM3PerS: number;
  /** Pump head at that flow, m. */
  headM: number;
  /** Flow of each outlet, m³/s, in the order of `pump.outlets`. */
  outletFlowsM3PerS: number[];
  /** Destination vessel of each outlet. */
  outletDestinations: string[];
  /** Source water surface used, m above the datum. */
  sourceSurfaceM: number;
  /** True when the source starts at or below the pump intake (the pump would run dry). */
  dry: boolean;
}

const surfaceM = (vessel: Vessel): number => vessel.floorElevation + vessel.initialLevel;

/** Flow scale of the worn-pump faults of `pump`, multiplied together (the engine does the same). */
function faultFlowScale(scenario: Scenario, pump: Pump): number {
  let scale = 1;
  for (const fault of scenario.faults)
    if (fault.kind === 'pump-worn' && fault.pump === pump.id) scale *= fault.flowScale;
  return scale;
}

/**
 * The operating point of one pump line with the scenario's starting levels: the source surface at
 * its initial level, each outlet discharging at its end or, when that end is under water, against
 * the destination's surface. Same solve as the engine (`solvePumpOperatingPoint`: pump curve,
 * main pipe and outlets by the run's friction model, continuity at the manifold).
 */
export function pumpDutyPoint(scenario: Scenario, pump: Pump): PumpDutyPoint {
  const byId = new Map(scenario.vessels.map((v) => [v.id, v]));
  const source = byId.get(pump.in);
  if (!source) throw new Error(`Pump ${pump.id} draws from an unknown vessel "${pump.in}".`);
  const outletDestinations = pump.outlets.map((outlet) => outlet.to);
  const sourceSurface = surfaceM(source);
  const dry = source.initialLevel <= pump.intakeHeight;
  if (dry)
    return {
      pumpId: pump.id,
      flowM3PerS: 0,
      headM: 0,
      outletFlowsM3PerS: pump.outlets.map(() => 0),
      outletDestinations,
      sourceSurfaceM: sourceSurface,
      dry,
    };
  const line = makePumpLineHydraulics(
    pump,
    scenario.lossCoefficients,
    faultFlowScale(scenario, pump),
  );
  const targets = pump.outlets.map((outlet) => {
    const destination = byId.get(outlet.to);
    return Math.max(outlet.elevation, destination ? surfaceM(destination) : outlet.elevation);
  });
  const nu = waterKinematicViscosityM2PerS(scenario.water.temperature);
  const point = solvePumpOperatingPoint(line, sourceSurface, targets, scenario.run.friction, nu);
  return {
    pumpId: pump.id,
    flowM3PerS: point.pumpFlowM3PerS,
    headM: point.headM,
    outletFlowsM3PerS: [...point.outletFlowsM3PerS],
    outletDestinations,
    sourceSurfaceM: sourceSurface,
    dry,
  };
}

/** Every pump's duty point at the starting levels, in scenario order. */
export function pumpDutyPoints(scenario: Scenario): PumpDutyPoint[] {
  return scenario.pumps.map((pump) => pumpDutyPoint(scenario, pump));
}

/**
 * The steady inflow each vessel receives from the pump lines with every pump running at its duty
 * point of {@link pumpDutyPoint}, m³/s, keyed by vessel id (vessels fed by no pump are absent).
 */
export function pumpedInflowsM3PerS(scenario: Scenario): Map<string, number> {
  const inflows = new Map<string, number>();
  for (const point of pumpDutyPoints(scenario)) {
    point.outletDestinations.forEach((to, i) => {
      inflows.set(to, (inflows.get(to) ?? 0) + (point.outletFlowsM3PerS[i] ?? 0));
    });
  }
  return inflows;
}
