import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { REGULARISATION_HEAD_M, torricelliOutflowM3PerS } from './torricelli-outflow';

describe('torricelliOutflowM3PerS', () => {
  it('gives Q = C_d·a·√(2gh): a 1 cm² sharp orifice under 1 m passes 0.61 × 1e-4 × 4.42869 m³/s', () => {
    expect(torricelliOutflowM3PerS(0.61, 1e-4, 1)).toBeCloseTo(
      0.61 * 1e-4 * Math.sqrt(2 * 9.80665),
      15,
    );
    expect(torricelliOutflowM3PerS(1, 1, 0.5 / 9.80665)).toBeCloseTo(1, 12);
  });

  it('is zero for no head and for negative head', () => {
    expect(torricelliOutflowM3PerS(0.61, 1e-4, 0)).toBe(0);
    expect(torricelliOutflowM3PerS(0.61, 1e-4, -0.2)).toBe(0);
  });

  it('is linear below 1e-6 m and continuous where the square root takes over', () => {
    const at = torricelliOutflowM3PerS(0.61, 1e-4, REGULARISATION_HEAD_M);
    expect(torricelliOutflowM3PerS(0.61, 1e-4, REGULARISATION_HEAD_M * (1 - 1e-12))).toBeCloseTo(
      at,
      18,
    );
    expect(torricelliOutflowM3PerS(0.61, 1e-4, REGULARISATION_HEAD_M / 4)).toBeCloseTo(at / 4, 18);
  });

  it('never decreases as the head rises', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -1, max: 10, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (h, dh) => {
          expect(torricelliOutflowM3PerS(0.61, 1e-4, h + dh)).toBeGreaterThanOrEqual(
            torricelliOutflowM3PerS(0.61, 1e-4, h),
          );
        },
      ),
    );
  });
});
