/**
 * A vector function of one variable tabulated on demand: values at the nodes of a uniform grid
 * are computed the first time a cell needs them (each node once), slopes come from the
 * fourth-order central difference (f[k−2] − 8f[k−1] + 8f[k+1] − f[k+2]) / (12Δ), and each cell is
 * a cubic Hermite piece, so the table is continuously differentiable and its error is O(Δ⁴) like
 * the slopes'. Used to make the expensive exact solves (pump operating point, full-bore siphon)
 * cheap inside the integrator's right-hand side.
 */
export interface LazyHermiteTable {
  /** Writes f(x) into `out`; returns false (leaving `out` alone) when x is outside the table. */
  evaluate(x: number, out: Float64Array): boolean;
  /** Number of exact evaluations made so far. */
  readonly evaluations: number;
}

/**
 * Tabulates `fn` (which writes `width` outputs for an x) over [x0, x1] in `cells` cells. `fn` must
 * accept x up to two cells beyond either end (the slope stencil reaches there).
 */
export function makeLazyHermiteTable(
  width: number,
  fn: (x: number, out: Float64Array) => void,
  x0: number,
  x1: number,
  cells: number,
): LazyHermiteTable {
  const spacing = (x1 - x0) / cells;
  const slots = cells + 5;
  const values = new Float64Array(slots * width);
  const slopes = new Float64Array(slots * width);
  const valueKnown = new Uint8Array(slots);
  const slopeKnown = new Uint8Array(slots);
  const scratch = new Float64Array(width);
  let evaluations = 0;
  /** Offset of node k's values, computing them on first use (k from −2 to cells + 2). */
  const value = (k: number): number => {
    const slot = k + 2;
    if (valueKnown[slot] === 0) {
      fn(x0 + k * spacing, scratch);
      values.set(scratch, slot * width);
      valueKnown[slot] = 1;
      evaluations += 1;
    }
    return slot * width;
  };
  /** Offset of node k's slopes (k from 0 to cells), computing them on first use. */
  const slope = (k: number): number => {
    const slot = k + 2;
    if (slopeKnown[slot] === 0) {
      const a = value(k - 2);
      const b = value(k - 1);
      const c = value(k + 1);
      const d = value(k + 2);
      for (let j = 0; j < width; j += 1) {
        slopes[slot * width + j] =
          ((values[a + j] as number) -
            8 * (values[b + j] as number) +
            8 * (values[c + j] as number) -
            (values[d + j] as number)) /
          (12 * spacing);
      }
      value(k);
      slopeKnown[slot] = 1;
    }
    return slot * width;
  };
  return {
    get evaluations() {
      return evaluations;
    },
    evaluate: (x, out) => {
      const position = (x - x0) / spacing;
      if (!(position >= 0 && position <= cells)) return false;
      const k = Math.min(Math.floor(position), cells - 1);
      const lo = slope(k);
      const hi = slope(k + 1);
      const s = position - k;
      const s2 = s * s;
      const s3 = s2 * s;
      const a0 = 2 * s3 - 3 * s2 + 1;
      const b0 = (s3 - 2 * s2 + s) * spacing;
      const a1 = -2 * s3 + 3 * s2;
      const b1 = (s3 - s2) * spacing;
      for (let j = 0; j < width; j += 1) {
        out[j] =
          a0 * (values[lo + j] as number) +
          b0 * (slopes[lo + j] as number) +
          a1 * (values[hi + j] as number) +
          b1 * (slopes[hi + j] as number);
      }
      return true;
    },
  };
}
