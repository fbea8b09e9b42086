import type { Standpipe } from '../../shared/scenario';
import { torricelliOutflowM3PerS } from '../hydraulics/torricelli-outflow';
import { STANDARD_GRAVITY_M_PER_S2 as G } from '../hydraulics/standard-gravity';

/**
 * Flow spilling over a standpipe rim, m³/s, at head `headM` (m) above the rim:
 *   weir control  Q = C_w·π·D_o·H^1.5   (the rim as a circular sharp-crested weir, crest = outer
 *                                       circumference), at small heads;
 *   bore control  Q = C_d·(π·D_i²/4)·√(2·g·H)  (the bore as an orifice), at larger heads;
 * the smaller of the two controls (drop-inlet and shaft-spillway practice: USBR, "Design of Small
 * Dams", 1987; USDA-SCS Engineering Field Manual ch. 6 riser equations). `boreControls` picks the
 * branch: the model keeps it as a mode switched at {@link rimControlHeadM}, where both are equal,
 * so each branch stays smooth for the integrator; `undefined` takes the minimum. 0 for H ≤ 0.
 */
export function bellSpillFlowM3PerS(
  standpipe: Standpipe,
  headM: number,
  boreControls?: boolean,
): number {
  if (!(headM > 0)) return 0;
  const boreAreaM2 = (Math.PI / 4) * standpipe.innerDiameter ** 2;
  if (boreControls === true)
    return torricelliOutflowM3PerS(standpipe.dischargeCoefficient, boreAreaM2, headM);
  // weirFlowM3PerS's law C_w·L·H^1.5, written with √ because it runs in every right-hand side.
  const weir =
    standpipe.weirCoefficient * Math.PI * standpipe.outerDiameter * headM * Math.sqrt(headM);
  if (boreControls === false) return weir;
  return Math.min(weir, torricelliOutflowM3PerS(standpipe.dischargeCoefficient, boreAreaM2, headM));
}

/**
 * Head above the rim (m) where the rim's weir flow and the bore's orifice flow of
 * {@link bellSpillFlowM3PerS} are equal: C_w·π·D_o·H^1.5 = C_d·(π·D_i²/4)·√(2gH) gives
 * H = C_d·√(2g)·D_i² / (4·C_w·D_o). Same sources.
 */
export function rimControlHeadM(standpipe: Standpipe): number {
  return (
    (standpipe.dischargeCoefficient * Math.sqrt(2 * G) * standpipe.innerDiameter ** 2) /
    (4 * standpipe.weirCoefficient * standpipe.outerDiameter)
  );
}
