import { describe, expect, it } from 'vitest';
import { locateCrossing } from './locate-crossing';

describe('locateCrossing', () => {
  it('finds the root of a smooth decreasing function to the tolerance, on the fired side', () => {
    const g = (t: number): number => Math.cos(t);
    const root = locateCrossing(g, 0, 3, g(0), g(3), 1e-12);
    expect(Math.abs(root - Math.PI / 2)).toBeLessThan(2e-12);
    expect(g(root)).toBeLessThanOrEqual(0);
  });

  it('converges on a function with a kink, where regula falsi alone stalls', () => {
    const g = (t: number): number => (t < 0.3 ? 1e-6 * (0.3 - t) : 50 * (0.3 - t));
    const root = locateCrossing(g, 0, 1, g(0), g(1), 1e-10);
    expect(Math.abs(root - 0.3)).toBeLessThan(1e-10);
  });

  it('returns the right end when the bracket is already narrower than the tolerance', () => {
    expect(locateCrossing((t) => 1 - t, 0.9999, 1.0001, 1e-4, -1e-4, 1e-3)).toBe(1.0001);
  });
});
