import { DIMENSION_INFO, type Dimension } from './dimension';
import { DISPLAY_UNITS, type UnitSystem } from './display-units';
import { unitMath } from './unit-math';

/**
 * Converts an SI value (degrees Celsius for temperature) to the display unit of `system`.
 * `unit` is a mathjs unit name (e.g. "gal/min", "degF"); `label` is what to print.
 */
export function toDisplay(
  valueSi: number,
  dimension: Dimension,
  system: UnitSystem,
): { value: number; unit: string; label: string } {
  const display = DISPLAY_UNITS[system][dimension];
  if (display.unit === '') return { value: valueSi, unit: '', label: '' };
  const value = unitMath.unit(valueSi, DIMENSION_INFO[dimension].siUnit).toNumber(display.unit);
  return { value, unit: display.unit, label: display.label };
}
