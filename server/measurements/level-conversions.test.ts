import { describe, expect, it } from 'vitest';
import { hydrostaticLevelM, STANDARD_GRAVITY_M_PER_S2 } from './hydrostatic-level';
import { lengthToMetres } from './length-to-metres';
import { levelFromDistanceM } from './level-from-distance';
import { pressureToPascals } from './pressure-to-pascals';

describe('level conversions', () => {
  it('turns a gauge pressure into a water depth with p = ρ·g·h', () => {
    // 1000 kg/m³ under standard gravity: 9806.65 Pa is exactly 1 m of water.
    expect(hydrostaticLevelM(9806.65, 1000, 0)).toBeCloseTo(1, 12);
    expect(hydrostaticLevelM(0, 998.2, 0.012)).toBe(0.012);
    expect(STANDARD_GRAVITY_M_PER_S2).toBe(9.80665);
  });

  it('agrees with the published 1 psi = 27.68 inH2O and 2.31 ft of 4 °C water', () => {
    // NIST SP 811 Appendix B.8 factors; "1 psi = 27.68 in of water" is the usual published round value.
    expect(pressureToPascals(1, 'psi') / pressureToPascals(1, 'inH2O')).toBeCloseTo(27.68, 2);
    // Water at 4 °C is 999.97 kg/m³ (Kell 1975): 1 psi ≈ 0.7031 m ≈ 2.307 ft.
    expect(hydrostaticLevelM(pressureToPascals(1, 'psi'), 999.97, 0) / 0.3048).toBeCloseTo(
      2.307,
      3,
    );
    expect(pressureToPascals(12.5, 'mbar')).toBe(1250);
    expect(pressureToPascals(1.2, 'kPa')).toBe(1200);
  });

  it('subtracts the distance read from above from the mounting height', () => {
    expect(levelFromDistanceM(0.5, lengthToMetres(180, 'mm'))).toBeCloseTo(0.32, 12);
    expect(levelFromDistanceM(0.5, lengthToMetres(600, 'mm'))).toBeLessThan(0);
  });

  it('converts length units exactly', () => {
    expect(lengthToMetres(12, 'in')).toBeCloseTo(0.3048, 15);
    expect(lengthToMetres(1, 'ft')).toBe(0.3048);
    expect(lengthToMetres(25, 'cm')).toBe(0.25);
  });
});
