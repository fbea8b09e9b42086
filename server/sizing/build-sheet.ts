/** The build sheet of a system: every bed's cut list and every pump's duty point on its curve. */
import { pumpDutyPoint } from '../../engine/index';
import type { BuildSheet, PumpDuty } from '../../shared/contracts/sizing';
import type { Pump, Scenario } from '../../shared/scenario/index';
import { bedCutList } from './bed-cut-list';

/** The curve as the pump runs it: the datasheet points with flows times its flow scale and wear faults. */
function scaledCurve(scenario: Scenario, pump: Pump): PumpDuty['curve'] {
  let scale = pump.flowScale;
  for (const fault of scenario.faults)
    if (fault.kind === 'pump-worn' && fault.pump === pump.id) scale *= fault.flowScale;
  return pump.curve.map((point) => ({ flowM3PerS: point.flow * scale, headM: point.head }));
}

function pumpDuty(scenario: Scenario, pump: Pump): PumpDuty {
  const point = pumpDutyPoint(scenario, pump);
  return {
    pumpId: pump.id,
    flowM3PerS: point.flowM3PerS,
    headM: point.headM,
    dry: point.dry,
    curve: scaledCurve(scenario, pump),
    outlets: point.outletDestinations.map((to, i) => ({
      to,
      flowM3PerS: point.outletFlowsM3PerS[i] ?? 0,
    })),
  };
}

/**
 * The build sheet of a normalised scenario: cut lists (standpipe cut length from the bed floor and
 * `fittingDepthM`, the bulkhead fitting's depth, when given) and the pumps' duty points at the
 * starting levels, solved as the engine solves them.
 */
export function buildSheet(
  system: { id: string; name: string },
  scenario: Scenario,
  fittingDepthM?: number,
): BuildSheet {
  const beds = scenario.vessels.flatMap((vessel) =>
    vessel.kind === 'bed' ? [bedCutList(vessel, fittingDepthM)] : [],
  );
  return {
    systemId: system.id,
    name: system.name,
    beds,
    pumps: scenario.pumps.map((pump) => pumpDuty(scenario, pump)),
  };
}
