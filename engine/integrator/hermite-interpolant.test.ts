import { describe, expect, it } from 'vitest';
import { hermiteComponentAt, hermiteStateAt } from './hermite-interpolant';
import { makeStepSegment } from './step-segment';

const cubic = (t: number): number => 0.7 - 1.3 * t + 2.1 * t * t - 0.45 * t * t * t;
const cubicSlope = (t: number): number => -1.3 + 4.2 * t - 1.35 * t * t;

function segmentOf(
  fns: Array<[(t: number) => number, (t: number) => number]>,
  t0S: number,
  t1S: number,
) {
  const seg = makeStepSegment(fns.length);
  seg.t0S = t0S;
  seg.t1S = t1S;
  fns.forEach(([y, f], i) => {
    seg.y0[i] = y(t0S);
    seg.y1[i] = y(t1S);
    seg.f0[i] = f(t0S);
    seg.f1[i] = f(t1S);
  });
  return seg;
}

describe('cubic Hermite interpolant', () => {
  it('reproduces a cubic polynomial exactly inside the step', () => {
    const seg = segmentOf([[cubic, cubicSlope]], 0.4, 2.9);
    for (let k = 0; k <= 20; k += 1) {
      const t = 0.4 + (2.5 * k) / 20;
      expect(Math.abs(hermiteComponentAt(seg, 0, t) - cubic(t))).toBeLessThan(1e-13);
    }
  });

  it('returns the end points bit for bit', () => {
    const seg = segmentOf(
      [
        [Math.exp, Math.exp],
        [Math.sin, Math.cos],
      ],
      0.1,
      0.35,
    );
    const out = new Float64Array(2);
    hermiteStateAt(seg, 0.35, out);
    expect(Array.from(out)).toEqual(Array.from(seg.y1));
    hermiteStateAt(seg, 0.1, out);
    expect(Array.from(out)).toEqual(Array.from(seg.y0));
  });

  it('has an interpolation error that falls as the fourth power of the step', () => {
    const errorFor = (h: number): number => {
      const seg = segmentOf([[Math.exp, Math.exp]], 1, 1 + h);
      return Math.abs(hermiteComponentAt(seg, 0, 1 + h / 2) - Math.exp(1 + h / 2));
    };
    const order = Math.log2(errorFor(0.2) / errorFor(0.1));
    expect(order).toBeGreaterThan(3.8);
    expect(order).toBeLessThan(4.2);
  });

  it('agrees between the scalar and vector forms', () => {
    const seg = segmentOf(
      [
        [Math.exp, Math.exp],
        [Math.sin, Math.cos],
      ],
      0,
      0.5,
    );
    const out = new Float64Array(2);
    hermiteStateAt(seg, 0.21, out);
    expect(out[1]).toBeCloseTo(hermiteComponentAt(seg, 1, 0.21), 15);
  });
});
