import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { makePumpCurve, type PumpCurveSource } from './pump-curve';

const LPH = 1 / 3.6e6;
const datasheet: PumpCurveSource = {
  curveKind: 'points',
  curve: [
    { flow: 0, head: 2.2 },
    { flow: 600 * LPH, head: 2.0 },
    { flow: 1200 * LPH, head: 1.4 },
    { flow: 2000 * LPH, head: 0 },
  ],
  flowScale: 1,
};

describe('makePumpCurve', () => {
  it('passes through every datasheet point', () => {
    const curve = makePumpCurve(datasheet);
    for (const point of datasheet.curve)
      expect(curve.headM(point.flow)).toBeCloseTo(point.head, 14);
    expect(curve.shutoffHeadM).toBe(2.2);
    expect(curve.maxFlowM3PerS).toBeCloseTo(2000 * LPH, 18);
  });

  it('falls strictly and never overshoots the points between them (Fritsch–Carlson monotone interpolation)', () => {
    const curve = makePumpCurve(datasheet);
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 2000 * LPH, noNaN: true }),
        fc.double({ min: 1e-9, max: 1e-4, noNaN: true }),
        (q, dq) => {
          expect(curve.headM(q + dq)).toBeLessThan(curve.headM(q));
          expect(curve.headM(q)).toBeLessThanOrEqual(2.2);
          if (q + dq <= 2000 * LPH) expect(curve.headM(q + dq)).toBeGreaterThanOrEqual(-1e-12);
        },
      ),
    );
  });

  it('evaluates the parabola H0·(1 − (Q/Q0)²) exactly for a max-head/max-flow pump', () => {
    const curve = makePumpCurve({
      curveKind: 'parabola',
      curve: [],
      maxHead: 3,
      maxFlow: 1e-3,
      flowScale: 1,
    });
    expect(curve.headM(0.5e-3)).toBeCloseTo(2.25, 15);
    expect(curve.headM(1e-3)).toBe(0);
    expect(curve.maxFlowM3PerS).toBe(1e-3);
  });

  it('scales flows for a worn pump: the same head at a fraction of the flow', () => {
    const worn = makePumpCurve(datasheet, 0.8);
    const fresh = makePumpCurve(datasheet);
    expect(worn.headM(0.8 * 900 * LPH)).toBeCloseTo(fresh.headM(900 * LPH), 14);
    expect(worn.maxFlowM3PerS).toBeCloseTo(0.8 * fresh.maxFlowM3PerS, 18);
  });

  it('extends a curve that ends above zero head linearly down to zero, and stays at shut-off for backflow', () => {
    const truncated = makePumpCurve({ ...datasheet, curve: datasheet.curve.slice(0, 3) });
    const slope = (1.4 - 2.0) / (600 * LPH);
    expect(truncated.maxFlowM3PerS).toBeCloseTo(1200 * LPH - 1.4 / slope, 15);
    expect(truncated.headM(truncated.maxFlowM3PerS)).toBeCloseTo(0, 12);
    expect(truncated.headM(-1e-4)).toBe(2.2);
  });
});
