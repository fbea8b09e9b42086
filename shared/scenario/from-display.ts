import { DIMENSION_INFO, type Dimension } from './dimension';
import { parseQuantity } from './parse-quantity';

/** Thrown when a displayed value's unit does not fit its dimension; `code` is stable. */
export class DisplayUnitError extends Error {
  readonly code = 'display-unit-mismatch';
}

/**
 * Converts a value typed in a display unit (any mathjs unit, e.g. "mm", "gal/min", "degF") to SI
 * (degrees Celsius for temperature). Throws DisplayUnitError if the unit has another dimension.
 */
export function fromDisplay(value: number, unit: string, dimension: Dimension): number {
  if (unit.trim() === '') return value;
  const result = parseQuantity(`${value} ${unit}`, dimension, '');
  if (!result.success) {
    throw new DisplayUnitError(
      `"${unit}" is not a unit of ${DIMENSION_INFO[dimension].noun}; ${result.issue.message}`,
    );
  }
  return result.value;
}
