import { brentRoot } from './brent-root';

/**
 * Flow Q ≥ 0 (m³/s) at which an increasing head-loss function reaches `headM`:
 * solves headAtFlow(Q) = H on [0, upperBoundM3PerS] by Brent's method to about 1e-14 of the bound
 * plus 4·ε relative, so better than 1e-10 relative for any flow above 1e-4 of the bound. `headAtFlow`
 * must be continuous and increasing with headAtFlow(0) = 0 and headAtFlow(bound) ≥ H.
 * Returns 0 for H ≤ 0.
 */
export function flowForMonotoneHeadM3PerS(
  headAtFlow: (flowM3PerS: number) => number,
  headM: number,
  upperBoundM3PerS: number,
): number {
  if (!(headM > 0)) return 0;
  if (!Number.isFinite(upperBoundM3PerS)) {
    throw new Error(
      'A flow path has no resistance to limit its flow; give it a length or a loss coefficient.',
    );
  }
  return brentRoot(
    (flow) => headAtFlow(flow) - headM,
    0,
    upperBoundM3PerS,
    1e-14 * upperBoundM3PerS,
  );
}
