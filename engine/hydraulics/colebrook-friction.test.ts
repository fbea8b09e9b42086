import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { colebrookFrictionFactor } from './colebrook-friction';

describe('colebrookFrictionFactor', () => {
  it('matches the fluids Colebrook docstring value 0.018513866077 at Re 1e5, ε/D 1e-4', () => {
    expect(colebrookFrictionFactor(1e5, 1e-4)).toBeCloseTo(0.018513866077, 11);
  });

  it('is exactly 64/Re when laminar (Re 1000 → 0.064)', () => {
    expect(colebrookFrictionFactor(1000, 0.01)).toBe(0.064);
    expect(colebrookFrictionFactor(2000, 0)).toBe(0.032);
  });

  it('satisfies the Colebrook equation to 1e-12 wherever it is turbulent', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 3.61, max: 8, noNaN: true }),
        fc.double({ min: -7, max: -1.3, noNaN: true }),
        (logRe, logRough) => {
          const re = 10 ** logRe;
          const rough = 10 ** logRough;
          const f = colebrookFrictionFactor(re, rough);
          const rhs = -2 * Math.log10(rough / 3.7 + 2.51 / (re * Math.sqrt(f)));
          expect(Math.abs(1 / Math.sqrt(f) / rhs - 1)).toBeLessThan(1e-12);
        },
      ),
    );
  });

  it('blends continuously into laminar at Re 2000 and into Colebrook at Re 4000', () => {
    expect(colebrookFrictionFactor(2000 * (1 + 1e-9), 1e-4)).toBeCloseTo(0.032, 9);
    const above = colebrookFrictionFactor(4000, 1e-4);
    expect(colebrookFrictionFactor(4000 * (1 - 1e-9), 1e-4)).toBeCloseTo(above, 9);
  });

  it('approaches the fully rough limit 1/√f = −2·log10(ε/3.7D) at very high Re (von Kármán)', () => {
    const rough = 0.01;
    expect(colebrookFrictionFactor(1e12, rough)).toBeCloseTo(
      1 / (2 * Math.log10(rough / 3.7)) ** 2,
      6,
    );
  });
});
