import type { StepSegment } from './step-segment';

/**
 * Cubic Hermite interpolation of one component over a step, from values and derivatives at
 * both ends:
 *   y(t) = h00(s)·y0 + h10(s)·h·f0 + h01(s)·y1 + h11(s)·h·f1,  s = (t − t0)/h,  h = t1 − t0,
 * with h00 = 2s³ − 3s² + 1, h10 = s³ − 2s² + s, h01 = −2s³ + 3s², h11 = s³ − s².
 * Exact for cubic polynomials; error O(h⁴) otherwise (Hairer, Nørsett & Wanner, "Solving
 * Ordinary Differential Equations I", 2nd ed., 1993, §II.6). Valid for t in [t0, t1]; a zero
 * length step returns y1.
 */
export function hermiteComponentAt(segment: StepSegment, index: number, timeS: number): number {
  const h = segment.t1S - segment.t0S;
  const y0 = segment.y0[index] ?? Number.NaN;
  const y1 = segment.y1[index] ?? Number.NaN;
  if (h === 0) return y1;
  const s = (timeS - segment.t0S) / h;
  const f0 = segment.f0[index] ?? Number.NaN;
  const f1 = segment.f1[index] ?? Number.NaN;
  const s2 = s * s;
  const s3 = s2 * s;
  return (
    (2 * s3 - 3 * s2 + 1) * y0 +
    (s3 - 2 * s2 + s) * h * f0 +
    (-2 * s3 + 3 * s2) * y1 +
    (s3 - s2) * h * f1
  );
}

/**
 * Writes the cubic Hermite interpolant of every component at `timeS` into `out` (same formula
 * as {@link hermiteComponentAt}). The end points are returned exactly, so output at a step's
 * end equals the integrated state bit for bit.
 */
export function hermiteStateAt(segment: StepSegment, timeS: number, out: Float64Array): void {
  const { t0S, t1S, y0, y1, f0, f1 } = segment;
  if (timeS === t1S || t1S === t0S) {
    out.set(y1);
    return;
  }
  if (timeS === t0S) {
    out.set(y0);
    return;
  }
  const h = t1S - t0S;
  const s = (timeS - t0S) / h;
  const s2 = s * s;
  const s3 = s2 * s;
  const a0 = 2 * s3 - 3 * s2 + 1;
  const b0 = (s3 - 2 * s2 + s) * h;
  const a1 = -2 * s3 + 3 * s2;
  const b1 = (s3 - s2) * h;
  for (let i = 0; i < out.length; i += 1) {
    out[i] =
      a0 * (y0[i] as number) +
      b0 * (f0[i] as number) +
      a1 * (y1[i] as number) +
      b1 * (f1[i] as number);
  }
}
