/**
 * Head (m) below which a free orifice is treated as run dry: Torricelli outflow Q ∝ √h takes the
 * level to the orifice in finite time, but near h = 0 its slope dQ/dh ∝ 1/√h makes the equations
 * stiff and an explicit integrator crawl. Below 10 µm of head the orifice is closed as a mode
 * (a film of 10 µm, 10 mL per m² of surface, stays behind); it opens again above twice that.
 */
export const ORIFICE_DRY_HEAD_M = 1e-5;

/** Event function of an orifice's run-dry mode at head `headM`: fires (≤ 0) when the mode should flip. */
export function orificeDryEventValue(dry: boolean, headM: number): number {
  return dry ? 2 * ORIFICE_DRY_HEAD_M - headM : headM - ORIFICE_DRY_HEAD_M;
}
