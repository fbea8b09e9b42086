import { swameeJainFrictionFactor } from './swamee-jain-friction';

/** Reynolds numbers bounding the blend from laminar to turbulent friction. */
export const LAMINAR_LIMIT_REYNOLDS = 2000;
export const TURBULENT_LIMIT_REYNOLDS = 4000;

/**
 * Solves Colebrook–White for x = 1/√f by Newton's method from the Swamee–Jain value:
 * F(x) = x + 2·log10(ε/(3.7D) + 2.51·x/Re) = 0, F' = 1 + 2·(2.51/Re)/((ε/(3.7D) + 2.51x/Re)·ln 10).
 * F is increasing and concave, so Newton converges monotonically (after at most one overshoot);
 * stops at |Δx| ≤ 1e-15·x.
 */
function colebrookTurbulent(reynolds: number, relativeRoughness: number): number {
  const a = relativeRoughness / 3.7;
  const b = 2.51 / reynolds;
  let x = 1 / Math.sqrt(swameeJainFrictionFactor(reynolds, relativeRoughness));
  for (let iteration = 0; iteration < 50; iteration += 1) {
    const inner = a + b * x;
    const step = (x + 2 * Math.log10(inner)) / (1 + (2 * b) / (inner * Math.LN10));
    x -= step;
    if (Math.abs(step) <= 1e-15 * x) break;
  }
  return 1 / (x * x);
}

/**
 * Darcy friction factor f (dimensionless) for a full pipe, from the Reynolds number and the
 * relative roughness ε/D:
 * - laminar, Re ≤ 2000: f = 64/Re (Hagen–Poiseuille);
 * - turbulent, Re ≥ 4000: Colebrook–White 1/√f = −2·log10(ε/(3.7D) + 2.51/(Re·√f)), solved to
 *   machine precision (better than 1e-10 relative);
 * - 2000 < Re < 4000: f = (1 − w)·64/Re + w·f_Colebrook, w = s²(3 − 2s), s = (Re − 2000)/2000, a
 *   smooth (C¹) blend across the transition, where no formula is reliable.
 * Valid for Re > 0 and 0 ≤ ε/D ≤ 0.05. Sources: C. F. Colebrook, J. Inst. Civ. Eng. 11:133–156,
 * 1939; D. Clamond, Ind. Eng. Chem. Res. 48:3665, 2009 (solution accuracy).
 */
export function colebrookFrictionFactor(reynolds: number, relativeRoughness: number): number {
  if (reynolds <= LAMINAR_LIMIT_REYNOLDS) return 64 / reynolds;
  const turbulent = colebrookTurbulent(reynolds, relativeRoughness);
  if (reynolds >= TURBULENT_LIMIT_REYNOLDS) return turbulent;
  const s =
    (reynolds - LAMINAR_LIMIT_REYNOLDS) / (TURBULENT_LIMIT_REYNOLDS - LAMINAR_LIMIT_REYNOLDS);
  const w = s * s * (3 - 2 * s);
  return (1 - w) * (64 / reynolds) + w * turbulent;
}
