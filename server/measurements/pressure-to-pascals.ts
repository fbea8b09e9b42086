/** Pressure units of a sensor column, converted to pascals. */
import type { PressureUnit } from '../../shared/contracts/measurements';

/**
 * Pascals per unit (NIST SP 811, 2008, Appendix B.8/B.9): bar 1e5 and hPa = mbar 100 exactly;
 * psi (lbf/in²) 6894.757; conventional cmH2O (at 4 °C) 98.0638 and inH2O (at 39.2 °F) 249.082.
 * The conventional water-column units assume water at 4 °C under standard gravity; they name a
 * pressure, not a depth of warmer water, so the depth is still computed with the actual density.
 */
export const PASCALS_PER_PRESSURE_UNIT: Readonly<Record<PressureUnit, number>> = {
  Pa: 1,
  kPa: 1000,
  hPa: 100,
  mbar: 100,
  bar: 100_000,
  psi: 6894.757,
  cmH2O: 98.0638,
  inH2O: 249.082,
};

/** A reading in `unit` as pascals. */
export function pressureToPascals(value: number, unit: PressureUnit): number {
  return value * PASCALS_PER_PRESSURE_UNIT[unit];
}
