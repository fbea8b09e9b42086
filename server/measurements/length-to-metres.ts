/** Length units of a level or distance column, converted to metres. */
import type { LengthUnit } from '../../shared/contracts/measurements';

/**
 * Metres per unit. The inch (0.0254 m) and the foot (0.3048 m) are exact by the 1959
 * international yard and pound agreement (NIST SP 811, 2008, Appendix B.8).
 */
export const METRES_PER_LENGTH_UNIT: Readonly<Record<LengthUnit, number>> = {
  m: 1,
  cm: 0.01,
  mm: 0.001,
  in: 0.0254,
  ft: 0.3048,
};

/** A reading in `unit` as metres. */
export function lengthToMetres(value: number, unit: LengthUnit): number {
  return value * METRES_PER_LENGTH_UNIT[unit];
}
