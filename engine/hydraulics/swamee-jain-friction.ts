/**
 * Darcy friction factor, explicit approximation of Colebrook–White:
 * f = 0.25 / [log10(ε/(3.7·D) + 5.74/Re^0.9)]².
 * `reynolds` dimensionless, `relativeRoughness` ε/D dimensionless. Valid 5e3 < Re < 1e8 and
 * 1e-6 < ε/D < 1e-2, within about 1 % of Colebrook. Source: P. K. Swamee & A. K. Jain, "Explicit
 * equations for pipe-flow problems", J. Hydraul. Div. ASCE 102(5):657–664, 1976.
 */
export function swameeJainFrictionFactor(reynolds: number, relativeRoughness: number): number {
  const logTerm = Math.log10(relativeRoughness / 3.7 + 5.74 / reynolds ** 0.9);
  return 0.25 / (logTerm * logTerm);
}
