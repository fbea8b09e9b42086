import { describe, expect, it } from 'vitest';
import { brentRoot, RootBracketError } from './brent-root';

describe('brentRoot', () => {
  it('finds the Dottie number, the root of cos x = x (0.7390851332151607), to machine precision', () => {
    expect(brentRoot((x) => Math.cos(x) - x, 0, 1, 0)).toBeCloseTo(0.7390851332151607, 15);
  });

  it('finds a root at a bracket end and roots of steep and flat functions', () => {
    expect(brentRoot((x) => x - 2, 2, 5, 1e-12)).toBe(2);
    expect(brentRoot((x) => x ** 9 - 1e-9, 0, 1, 0)).toBeCloseTo(0.1, 12);
    expect(brentRoot((x) => Math.exp(x) - 1e6, 0, 50, 0)).toBeCloseTo(Math.log(1e6), 12);
  });

  it('refuses a bracket without a sign change', () => {
    expect(() => brentRoot((x) => x * x + 1, -1, 1, 1e-12)).toThrow(RootBracketError);
  });
});
