/** Numbers in the words of a check's sentence: litres, metres, minutes, three significant digits. */
import type { SizingCheck } from '../../shared/contracts/sizing';

const sig = (value: number, digits = 3): string =>
  Number.isFinite(value) ? Number(value.toPrecision(digits)).toString() : String(value);

/** A volume in m³ as litres. */
export const litres = (m3: number): string => `${sig(m3 * 1000)} L`;
/** A length in m as metres. */
export const metres = (m: number): string => `${sig(m)} m`;
/** A small length in m (a hole, a bore) as millimetres. */
export const millimetres = (m: number): string => `${sig(m * 1000)} mm`;
/** A time in s as minutes (seconds under a minute). */
export const minutes = (s: number): string => (s < 60 ? `${sig(s)} s` : `${sig(s / 60)} min`);
/** A mass in kg. */
export const kilograms = (kg: number): string => `${sig(kg)} kg`;

/** Builds a check (keeps the object literal of each check short). */
export function sizingCheck(fields: SizingCheck): SizingCheck {
  return fields;
}
