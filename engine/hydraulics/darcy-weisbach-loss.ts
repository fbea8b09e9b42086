import { colebrookFrictionFactor } from './colebrook-friction';
import { STANDARD_GRAVITY_M_PER_S2 as G } from './standard-gravity';

/**
 * Friction head loss of a full circular pipe by Darcy–Weisbach, m of water:
 * h_f = f·(L/D)·v²/(2g), v = 4Q/(πD²), Re = v·D/ν, f from `colebrookFrictionFactor` (laminar 64/Re,
 * Colebrook–White, smooth blend between). Sign of Q (an odd function, for backflow); 0 at Q = 0,
 * where the laminar form h_f = 32·ν·L·v/(g·D²) is used so no 0·∞ occurs.
 * `lengthM` m, `diameterM` bore m, `flowM3PerS` m³/s, `roughnessM` absolute roughness m,
 * `kinematicViscosityM2PerS` m²/s. Valid for any full-pipe flow of a Newtonian liquid.
 * Source: H. Darcy (1857), J. Weisbach (1845); L. F. Moody, Trans. ASME 66:671, 1944.
 */
export function darcyWeisbachHeadLossM(
  lengthM: number,
  diameterM: number,
  flowM3PerS: number,
  roughnessM: number,
  kinematicViscosityM2PerS: number,
): number {
  const velocity = Math.abs(flowM3PerS) / ((Math.PI * diameterM * diameterM) / 4);
  const reynolds = (velocity * diameterM) / kinematicViscosityM2PerS;
  const magnitude =
    reynolds <= 2000
      ? (32 * kinematicViscosityM2PerS * lengthM * velocity) / (G * diameterM * diameterM)
      : (colebrookFrictionFactor(reynolds, roughnessM / diameterM) *
          lengthM *
          velocity *
          velocity) /
        (diameterM * 2 * G);
  return flowM3PerS < 0 ? -magnitude : magnitude;
}
