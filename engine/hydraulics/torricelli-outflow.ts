import { STANDARD_GRAVITY_M_PER_S2 as G } from './standard-gravity';

/** Below this head (m) the square root is replaced by a straight line so derivatives stay finite. */
export const REGULARISATION_HEAD_M = 1e-6;

/**
 * Flow out of an orifice under a head, m³/s (Torricelli with a discharge coefficient):
 * Q = C_d·a·√(2·g·Δh) for Δh ≥ 1e-6 m; Q = C_d·a·√(2·g·1e-6 m)·Δh/1e-6 m below (linear, continuous,
 * finite slope); Q = 0 for Δh ≤ 0.
 * `cd` dimensionless (sharp edge ≈ 0.61, short tube ≈ 0.82, rounded ≈ 0.97), `areaM2` m², `headM` m
 * of water above the orifice centre (or above the downstream surface when submerged).
 * Valid for a small orifice (diameter small against the head) at fully turbulent exit.
 * Source: Encyclopaedia Britannica 11th ed. (1911), "Hydromechanics" (W. C. Unwin), §§17–20.
 */
export function torricelliOutflowM3PerS(cd: number, areaM2: number, headM: number): number {
  if (headM <= 0) return 0;
  if (headM < REGULARISATION_HEAD_M) {
    return cd * areaM2 * Math.sqrt(2 * G * REGULARISATION_HEAD_M) * (headM / REGULARISATION_HEAD_M);
  }
  return cd * areaM2 * Math.sqrt(2 * G * headM);
}
