/**
 * US customary units by their exact definitions in SI, for tests that check conversions made
 * through mathjs against an independent reckoning (NIST Special Publication 811, appendix B:
 * the international inch and pound of 1959, the US liquid gallon of 231 in³, standard gravity).
 */
const INCH_M = 0.0254;
const FOOT_M = 0.3048;
const POUND_KG = 0.45359237;
const STANDARD_GRAVITY_M_PER_S2 = 9.80665;

/** SI size of one of each US customary unit the sizing sentences use. */
export const US_CUSTOMARY = {
  inchM: INCH_M,
  squareFootM2: FOOT_M * FOOT_M,
  gallonM3: 231 * INCH_M ** 3,
  poundKg: POUND_KG,
  poundForcePerSquareFootPa: (POUND_KG * STANDARD_GRAVITY_M_PER_S2) / (FOOT_M * FOOT_M),
} as const;
