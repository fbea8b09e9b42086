import type { Drain, LossCoefficients } from '../../shared/scenario';
import type { FrictionModel } from '../hydraulics/pipe-run';
import { makeLazyHermiteTable } from './lazy-hermite-table';
import { siphonFullBoreFlowM3PerS } from './siphon-flow';

/** Cells of the table over √Δz. */
const CELLS = 128;

/**
 * Full-bore drain flow as a function of the head drop Δz (m), m³/s, from a lazily built table of
 * the exact energy balance (`siphonFullBoreFlowM3PerS`). Q = s·g(s) with s = √Δz: g is smooth
 * (≈ C_d·A·√(2g), varying slowly with the friction factor) and is tabulated on [0, √Δz_max]
 * with an odd extension below 0. Outside the table, or with `exact` set, the exact solve is used.
 * Returns 0 for Δz ≤ 0.
 */
export function makeSiphonFlowFunction(
  drain: Drain,
  friction: FrictionModel,
  kinematicViscosityM2PerS: number,
  coefficients: LossCoefficients,
  maxHeadDropM: number,
  exact: boolean,
): (headDropM: number) => number {
  const solve = (headDropM: number): number =>
    siphonFullBoreFlowM3PerS(drain, headDropM, friction, kinematicViscosityM2PerS, coefficients);
  if (exact || !(maxHeadDropM > 0)) return solve;
  const table = makeLazyHermiteTable(
    1,
    (s, out) => {
      out[0] = s === 0 ? 0 : (Math.sign(s) * solve(s * s)) / Math.abs(s);
    },
    0,
    Math.sqrt(maxHeadDropM),
    CELLS,
  );
  const out = new Float64Array(1);
  return (headDropM) => {
    if (!(headDropM > 0)) return 0;
    const s = Math.sqrt(headDropM);
    return table.evaluate(s, out) ? s * (out[0] as number) : solve(headDropM);
  };
}
