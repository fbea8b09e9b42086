import {
  SWEEP_PARAMETER_DIMENSIONS,
  type SweepParameter,
} from '../../../../shared/contracts/sweeps';
import { DISPLAY_UNITS, type UnitSystem } from '../../../../shared/scenario';
import { type DisplayScale, displayScale } from '../../ui/time-series-chart/display-scale';

/** How an axis's values are shown and typed: a scale from SI to display and its unit words. */
export interface AxisUnits {
  readonly scale: DisplayScale;
  /** Short unit after a number ("mm", "%", "×" before it for a factor). */
  readonly label: string;
  /** A typed display value as the API takes it (a number, or a string with its unit). */
  toRequest(displayValue: number): number | string;
}

/** Display units of a sweep parameter in the reader's unit system. */
export function axisUnits(parameter: SweepParameter, system: UnitSystem): AxisUnits {
  if (parameter === 'pump-flow-scale') {
    return { scale: { factor: 1, offset: 0, label: '×' }, label: '×', toRequest: (v) => v };
  }
  if (parameter === 'valve-opening') {
    return { scale: { factor: 100, offset: 0, label: '%' }, label: '%', toRequest: (v) => v / 100 };
  }
  const dimension = SWEEP_PARAMETER_DIMENSIONS[parameter];
  const scale = displayScale(dimension, system);
  const unit = DISPLAY_UNITS[system][dimension].unit;
  return { scale, label: scale.label, toRequest: (v) => `${v} ${unit}` };
}

/** An SI axis value in the reader's units, e.g. "×1.25", "60 %", "140 mm". */
export function formatAxisValue(
  parameter: SweepParameter,
  valueSi: number,
  system: UnitSystem,
): string {
  const units = axisUnits(parameter, system);
  const shown = Number((units.scale.offset + units.scale.factor * valueSi).toPrecision(3));
  return parameter === 'pump-flow-scale' ? `×${shown}` : `${shown} ${units.label}`;
}

/** Words for each parameter in pickers. */
export const PARAMETER_NAMES: Readonly<Record<SweepParameter, string>> = {
  'pump-flow-scale': 'Pump flow (scaled curve)',
  'valve-opening': 'Valve opening',
  'standpipe-height': 'Standpipe height',
  'intake-height': 'Bell intake height (break level)',
  'standpipe-diameter': 'Standpipe bore',
  'drain-diameter': 'Drain pipe bore',
  'vessel-volume': 'Tank or sump size',
};

/** Which kind of part each parameter acts on. */
export const PARAMETER_TARGETS: Readonly<Record<SweepParameter, 'pump' | 'bed' | 'store'>> = {
  'pump-flow-scale': 'pump',
  'valve-opening': 'pump',
  'standpipe-height': 'bed',
  'intake-height': 'bed',
  'standpipe-diameter': 'bed',
  'drain-diameter': 'bed',
  'vessel-volume': 'store',
};
