import type { LossCoefficients } from '../../shared/scenario';
import { brentRoot } from '../hydraulics/brent-root';
import { flowForHeadM3PerS } from '../hydraulics/pipe-flow';
import type { FrictionModel } from '../hydraulics/pipe-run';
import type { PumpLineHydraulics } from '../system/operating-point';

/**
 * Reverse flows of a stopped pump line without a check valve whose outlets are all under water,
 * m³/s, written into `out` (one per outlet, positive = back towards the pump): the line runs as a
 * siphon from the destinations' surfaces z_i through each outlet pipe to the manifold, then
 * through the main pipe and the idle pump into the source at z_S. With E the energy head at the
 * manifold, each outlet carries Q_i(E) = flow for head z_i − E (entrance K plus the pipe's own
 * losses), the main pipe Q_m(E) = flow for head E − z_S (its losses, the idle pump taken as its
 * entrance K, and the exit into the source); continuity Σ Q_i(E) = Q_m(E) is monotone in E on
 * [z_S, max z_i] and solved by Brent's method. The idle pump's own resistance beyond that is
 * neglected, which gives the fastest (worst-case) back-flow.
 * Source: energy equation for branching pipes (the three-reservoir problem), as in Streeter &
 * Wylie, Fluid Mechanics.
 */
export function backSiphonFlowsM3PerS(
  line: PumpLineHydraulics,
  sourceSurfaceM: number,
  destinationSurfacesM: readonly number[],
  model: FrictionModel,
  kinematicViscosityM2PerS: number,
  coefficients: LossCoefficients,
  out: Float64Array,
): void {
  out.fill(0);
  let top = -Infinity;
  for (const z of destinationSurfacesM) top = Math.max(top, z);
  if (!(top > sourceSurfaceM)) return;
  const nu = kinematicViscosityM2PerS;
  const outletFlow = (i: number, manifoldM: number): number => {
    const outlet = line.outlets[i];
    const head = (destinationSurfacesM[i] ?? -Infinity) - manifoldM;
    return outlet !== undefined && head > 0
      ? flowForHeadM3PerS(outlet, head, model, nu, coefficients.entrance)
      : 0;
  };
  const residual = (manifoldM: number): number => {
    let sum = 0;
    for (let i = 0; i < line.outlets.length; i += 1) sum += outletFlow(i, manifoldM);
    return (
      sum - flowForHeadM3PerS(line.main, manifoldM - sourceSurfaceM, model, nu, coefficients.exit)
    );
  };
  const manifoldM = brentRoot(residual, sourceSurfaceM, top, 1e-12 * Math.max(1, Math.abs(top)));
  for (let i = 0; i < line.outlets.length; i += 1) out[i] = outletFlow(i, manifoldM);
}
