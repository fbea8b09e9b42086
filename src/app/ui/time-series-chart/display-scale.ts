import { type Dimension, type UnitSystem, toDisplay } from '../../../../shared/scenario';

/**
 * The affine map from an SI value to the reader's display unit (display = offset + factor·SI),
 * worked out once per chart instead of once per point; exact for every unit the app shows,
 * temperature included.
 */
export interface DisplayScale {
  readonly factor: number;
  readonly offset: number;
  readonly label: string;
}

/** The display scale of `dimension` in `system` (e.g. flow in L/min or gal/min). */
export function displayScale(dimension: Dimension, system: UnitSystem): DisplayScale {
  const zero = toDisplay(0, dimension, system);
  const one = toDisplay(1, dimension, system);
  return { factor: one.value - zero.value, offset: zero.value, label: one.label };
}

/** Applies a display scale to one SI value. */
export function toDisplayValue(scale: DisplayScale, valueSi: number): number {
  return scale.offset + scale.factor * valueSi;
}

/** Writes a displayed value with about four significant digits and its unit label. */
export function formatDisplayValue(value: number, label: string): string {
  const magnitude = Math.abs(value);
  const text =
    magnitude >= 1000 || magnitude === 0 ? value.toFixed(0) : String(Number(value.toPrecision(4)));
  return label === '' ? text : `${text} ${label}`;
}
