import { describe, expect, it } from 'vitest';
import { swameeJainFrictionFactor } from './swamee-jain-friction';

describe('swameeJainFrictionFactor', () => {
  it('gives f = 0.0288 at Re 4e5, ε/D 0.004 (Lindeburg, Civil Eng. Reference Manual, Ex. 17.2)', () => {
    expect(swameeJainFrictionFactor(4e5, 0.004)).toBeCloseTo(0.0288, 4);
  });

  it('tends to the fully rough value 0.25/log10(ε/3.7D)² as Re grows', () => {
    expect(swameeJainFrictionFactor(1e14, 0.001)).toBeCloseTo(
      0.25 / Math.log10(0.001 / 3.7) ** 2,
      8,
    );
  });
});
