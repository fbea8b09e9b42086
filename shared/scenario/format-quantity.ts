import type { Dimension } from './dimension';
import type { UnitSystem } from './display-units';
import { toDisplay } from './to-display';

/** Rounds for display: three significant digits below 100, whole numbers above. */
function roundForDisplay(value: number): string {
  const magnitude = Math.abs(value);
  if (magnitude === 0) return '0';
  if (magnitude >= 100) return value.toFixed(0);
  if (magnitude >= 10) return value.toFixed(1);
  if (magnitude >= 1) return value.toFixed(2);
  return Number(value.toPrecision(3)).toString();
}

/** Formats an SI value for people, e.g. `formatQuantity(0.0254, 'diameter', 'us')` → "1.00 in". */
export function formatQuantity(valueSi: number, dimension: Dimension, system: UnitSystem): string {
  const { value, label } = toDisplay(valueSi, dimension, system);
  const text = roundForDisplay(value);
  return label === '' ? text : `${text} ${label}`;
}
