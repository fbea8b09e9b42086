import type { Unit } from 'mathjs';
import { DIMENSION_INFO, type Dimension } from './dimension';
import type { ScenarioIssue } from './scenario-issue';
import { unitMath } from './unit-math';

/** The outcome of reading one dimensional value: its SI number, or an issue naming the field. */
export type QuantityResult =
  { success: true; value: number } | { success: false; issue: ScenarioIssue };

const DIMENSION_ORDER: readonly Dimension[] = [
  'length',
  'area',
  'volume',
  'time',
  'flow',
  'power',
  'temperature',
];

/** Names the dimension of a parsed unit for an error message ("a time", "a flow rate"...). */
function describeDimension(unit: Unit): string {
  for (const dimension of DIMENSION_ORDER) {
    const info = DIMENSION_INFO[dimension];
    if (unit.equalBase(unitMath.unit(1, info.siUnit))) return info.noun;
  }
  return 'a quantity of another kind';
}

function failure(path: string, dimension: Dimension, got: string): QuantityResult {
  const info = DIMENSION_INFO[dimension];
  return {
    success: false,
    issue: { path, message: `Expected ${info.noun} such as ${info.example}; got ${got}.` },
  };
}

function readUnitString(text: string): Unit | undefined {
  try {
    return unitMath.unit(text.trim());
  } catch {
    return undefined;
  }
}

/**
 * Reads a dimensional value from a scenario: a finite number is taken in SI (m, m², m³, s, m³/s,
 * W; degrees Celsius for temperature); a string is parsed by mathjs with its unit, e.g. "25 mm",
 * "1 in", "300 L/h", "5 gal/min", "2 h", "24 degC". A string without a unit is read like a number.
 * A value of the wrong dimension is an issue at `path` that says what was expected.
 */
export function parseQuantity(value: unknown, dimension: Dimension, path: string): QuantityResult {
  if (typeof value === 'number') {
    return Number.isFinite(value)
      ? { success: true, value }
      : failure(path, dimension, String(value));
  }
  if (typeof value !== 'string') return failure(path, dimension, describeValue(value));
  const unit = readUnitString(value);
  if (unit === undefined || unit.value === null) {
    return failure(path, dimension, `"${value}", which is not a number with a known unit`);
  }
  if (unit.units.length === 0) return { success: true, value: unit.toNumber() };
  const info = DIMENSION_INFO[dimension];
  if (dimension === 'dimensionless' || !unit.equalBase(unitMath.unit(1, info.siUnit))) {
    return failure(path, dimension, `"${value}", which is ${describeDimension(unit)}`);
  }
  // 15 significant digits drop the binary noise of the conversion (26.6 mm → 0.0266, not ...02).
  const si = Number(unit.toNumber(info.siUnit).toPrecision(15));
  return Number.isFinite(si)
    ? { success: true, value: si }
    : failure(path, dimension, `"${value}"`);
}

function describeValue(value: unknown): string {
  if (value === null) return 'null';
  if (Array.isArray(value)) return 'a list';
  return `a value of type ${typeof value}`;
}
