import type { SweepParameter } from '../../../../shared/contracts/sweeps';
import type { Scenario, Vessel } from '../../../../shared/scenario';
import { PARAMETER_TARGETS } from './axis-units';

/** A part an axis can act on, as pickers list it. */
export interface TargetOption {
  readonly id: string;
  readonly label: string;
  /** Outlets of a pump (for valve openings). */
  readonly outlets: number;
}

const volumeM3 = (v: Vessel): number => {
  const s = v.shape;
  if (s.type === 'box') return s.length * s.width * v.height;
  if (s.type === 'cylinder') return (Math.PI / 4) * s.diameter ** 2 * v.height;
  return Number.NaN;
};

/** The parts of `scenario` a parameter can act on. */
export function targetOptions(scenario: Scenario, parameter: SweepParameter): TargetOption[] {
  const kind = PARAMETER_TARGETS[parameter];
  if (kind === 'pump')
    return scenario.pumps.map((p) => ({
      id: p.id,
      label: p.id,
      outlets: p.outlets.length,
    }));
  const bellOnly = parameter === 'intake-height';
  return scenario.vessels
    .filter((v) =>
      kind === 'bed'
        ? v.kind === 'bed' && (!bellOnly || v.drain.type === 'bell-siphon')
        : v.kind !== 'bed',
    )
    .filter((v) => kind !== 'store' || v.shape.type !== 'table')
    .map((v) => ({ id: v.id, label: v.kind === 'bed' ? v.id : `${v.id} (${v.kind})`, outlets: 0 }));
}

/** The value the design has now, SI; null when the part is missing. */
export function currentValue(
  scenario: Scenario,
  parameter: SweepParameter,
  target: string,
  outlet = 0,
): number | null {
  const pump = scenario.pumps.find((p) => p.id === target);
  const vessel = scenario.vessels.find((v) => v.id === target);
  switch (parameter) {
    case 'pump-flow-scale':
      return pump?.flowScale ?? null;
    case 'valve-opening':
      return pump?.outlets[outlet]?.valveOpening ?? null;
    case 'vessel-volume':
      return vessel ? volumeM3(vessel) : null;
  }
  if (vessel?.kind !== 'bed') return null;
  const drain = vessel.drain;
  if (parameter === 'standpipe-height') return drain.standpipe.height;
  if (parameter === 'standpipe-diameter') return drain.standpipe.innerDiameter;
  if (parameter === 'drain-diameter') return drain.pipe.innerDiameter;
  return drain.type === 'bell-siphon'
    ? (drain.bell.snorkelHeight ?? drain.bell.intakeHeight)
    : null;
}

/** A starting range round the current value, SI: the pump ×0.5–2, a valve 20–100 % open, others ±40 %. */
export function suggestedRange(
  parameter: SweepParameter,
  current: number | null,
): { from: number; to: number } {
  if (parameter === 'pump-flow-scale') return { from: 0.5, to: 2 };
  if (parameter === 'valve-opening') return { from: 0.2, to: 1 };
  const base = current ?? 0.1;
  return { from: base * 0.6, to: base * 1.4 };
}
