/**
 * Numbers in the words of a check's sentence, in the reader's unit system: three significant
 * digits, converted with the shared mathjs units and labelled as the app labels its fields.
 */
import type { SizingCheck } from '../../shared/contracts/sizing';
import {
  toDisplay,
  type Dimension,
  type DisplayUnit,
  type UnitSystem,
} from '../../shared/scenario/index';
import { unitMath } from '../../shared/scenario/unit-math';

/** How a check's sentence writes each kind of number, for one unit system. */
export interface CheckWords {
  /** A volume in m³: litres, or US gallons. */
  volume(m3: number): string;
  /** A level or length in m: metres, or inches. */
  length(m: number): string;
  /** A small length in m (a hole, a bore): millimetres, or inches. */
  bore(m: number): string;
  /** An area in m²: square metres, or square feet. */
  area(m2: number): string;
  /** A mass in kg: kilograms, or pounds. */
  mass(kg: number): string;
  /** A pressure in Pa: kilopascals, or pounds-force per square foot (as floor loads are rated). */
  pressure(pa: number): string;
  /** A time in s: minutes (seconds under a minute) in either system. */
  time(s: number): string;
}

/** Units the scenario never holds (so the shared display table has none), per system. */
const LOAD_UNITS: Readonly<Record<UnitSystem, { mass: DisplayUnit; pressure: DisplayUnit }>> = {
  metric: { mass: { unit: 'kg', label: 'kg' }, pressure: { unit: 'kPa', label: 'kPa' } },
  us: { mass: { unit: 'lb', label: 'lb' }, pressure: { unit: 'lbf/ft^2', label: 'lb/ft²' } },
};

const sig = (value: number, digits = 3): string =>
  Number.isFinite(value) ? Number(value.toPrecision(digits)).toString() : String(value);

/** An SI value of a scenario dimension in the display unit of `system`. */
function displayed(valueSi: number, dimension: Dimension, system: UnitSystem): string {
  const { value, label } = toDisplay(valueSi, dimension, system);
  return `${sig(value)} ${label}`;
}

/** An SI value (unit `siUnit`) in `to`. */
function converted(valueSi: number, siUnit: string, to: DisplayUnit): string {
  return `${sig(unitMath.unit(valueSi, siUnit).toNumber(to.unit))} ${to.label}`;
}

/**
 * The words of `system`. Built once per request from the signed-in user's units; values given in
 * SI. Precision stays at three significant digits in both systems, so a metric sentence reads as
 * it always has.
 */
export function checkWords(system: UnitSystem): CheckWords {
  const loads = LOAD_UNITS[system];
  return {
    volume: (m3) => displayed(m3, 'volume', system),
    length: (m) => displayed(m, 'length', system),
    bore: (m) => displayed(m, 'diameter', system),
    area: (m2) => displayed(m2, 'area', system),
    mass: (kg) => converted(kg, 'kg', loads.mass),
    pressure: (pa) => converted(pa, 'Pa', loads.pressure),
    time: (s) => (s < 60 ? `${sig(s)} s` : `${sig(s / 60)} min`),
  };
}

/** Builds a check (keeps the object literal of each check short). */
export function sizingCheck(fields: SizingCheck): SizingCheck {
  return fields;
}
