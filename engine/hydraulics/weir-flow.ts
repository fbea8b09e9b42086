import { STANDARD_GRAVITY_M_PER_S2 as G } from './standard-gravity';
import { torricelliOutflowM3PerS } from './torricelli-outflow';

/**
 * Flow over a sharp crest, m³/s: Q = C_w·L·H^1.5 for H > 0, else 0.
 * `cw` in m^0.5/s (1.838 m^0.5/s = 3.33 ft^0.5/s = (2/3)·0.62·√(2g)), `crestLengthM` m (π·D for a
 * pipe rim), `headM` m of water above the crest. Valid while the head is small against the crest
 * length and the nappe is free (no submergence). Source: USDA-SCS Engineering Field Manual, riser
 * weir equation (C = 3.33 in ft units); EPA SWMM 5 uses C_w/√(2g) = 0.414.
 */
export function weirFlowM3PerS(cw: number, crestLengthM: number, headM: number): number {
  return headM > 0 ? cw * crestLengthM * headM ** 1.5 : 0;
}

/**
 * Flow into the top of a vertical pipe (a standpipe rim, a riser), m³/s: the smaller of the rim's
 * weir flow C_w·π·D·H^1.5 and the bore's orifice flow C_d·(π·D²/4)·√(2gH). Weir control holds at
 * small heads; past H/D = C_d·√(2g)/(4·C_w) (0.362 for C_d 0.6, C_w 1.834) the bore controls.
 * `diameterM` the bore diameter, m; `headM` m above the rim; `cw` m^0.5/s; `cd` dimensionless.
 * Source: shaft (morning-glory) spillway practice, USBR "Design of Small Dams" (1987), drop-inlet
 * chapter (crest then orifice control); EPA SWMM 5 weir/orifice switch for circular openings.
 */
export function rimSpillFlowM3PerS(
  diameterM: number,
  headM: number,
  cw: number,
  cd: number,
): number {
  if (headM <= 0) return 0;
  const weir = weirFlowM3PerS(cw, Math.PI * diameterM, headM);
  const orifice = torricelliOutflowM3PerS(cd, (Math.PI * diameterM * diameterM) / 4, headM);
  return Math.min(weir, orifice);
}

/**
 * Head above a pipe rim (m) where weir flow and orifice flow are equal, so control passes from the
 * rim to the bore: H = C_d·√(2g)·D / (4·C_w). Same sources as `rimSpillFlowM3PerS`.
 */
export function rimControlSwitchHeadM(diameterM: number, cw: number, cd: number): number {
  return (cd * Math.sqrt(2 * G) * diameterM) / (4 * cw);
}
