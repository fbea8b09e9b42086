import { describe, expect, it } from 'vitest';
import { hazenWilliamsHeadLossM } from './hazen-williams-loss';

const HALF_INCH_SCH40_M = 0.622 * 0.0254;

describe('hazenWilliamsHeadLossM', () => {
  // The library-computed table gives the velocity (0.854 m/s for ½ in at 10 L/min, 0.598 m/s for
  // 1 in at 20 L/min); the bore is taken from it so the check does not depend on which ID was used.
  it.each([
    [10, 0.854, 0.0602],
    [20, 0.598, 0.01685],
  ])(
    'gives the library-computed loss at %d L/min and %f m/s, C 150: %f m/m within 0.5 %%',
    (litresPerMinute, velocity, lossPerM) => {
      const flow = litresPerMinute / 60000;
      const diameterM = Math.sqrt((4 * flow) / (Math.PI * velocity));
      expect(Math.abs(hazenWilliamsHeadLossM(1, flow, 150, diameterM) / lossPerM - 1)).toBeLessThan(
        0.005,
      );
    },
  );

  it('is about 1 % below that table with the nominal ½ in Schedule 40 bore (0.622 in)', () => {
    expect(hazenWilliamsHeadLossM(1, 10 / 60000, 150, HALF_INCH_SCH40_M) / 0.0602).toBeCloseTo(
      0.988,
      2,
    );
  });

  it('scales as Q^1.852, L and C^−1.852, and is odd in Q', () => {
    const base = hazenWilliamsHeadLossM(2, 1e-4, 150, 0.02);
    expect(hazenWilliamsHeadLossM(2, 2e-4, 150, 0.02) / base).toBeCloseTo(2 ** 1.852, 12);
    expect(hazenWilliamsHeadLossM(4, 1e-4, 150, 0.02) / base).toBeCloseTo(2, 12);
    expect(hazenWilliamsHeadLossM(2, 1e-4, 75, 0.02) / base).toBeCloseTo(2 ** 1.852, 12);
    expect(hazenWilliamsHeadLossM(2, -1e-4, 150, 0.02)).toBe(-base);
    expect(hazenWilliamsHeadLossM(2, 0, 150, 0.02)).toBe(0);
  });
});
