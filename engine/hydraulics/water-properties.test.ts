import { describe, expect, it } from 'vitest';
import {
  waterDensityKgPerM3,
  waterDynamicViscosityPaS,
  waterKinematicViscosityM2PerS,
} from './water-properties';

describe('water properties', () => {
  it('gives the IAPWS-95 density and IAPWS 2008 viscosity at 20 °C (998.207 kg/m³, 1.0016e-3 Pa·s)', () => {
    expect(waterDensityKgPerM3(20)).toBeCloseTo(998.207, 2);
    expect(waterDynamicViscosityPaS(20) / 1.0016e-3).toBeCloseTo(1, 4);
    expect(waterKinematicViscosityM2PerS(20) / 1.0034e-6).toBeCloseTo(1, 4);
  });

  it('puts the density maximum near 3.98 °C (Kell 1975) and 999.97 kg/m³', () => {
    let best = 0;
    for (let t = 0; t <= 10; t += 0.01)
      if (waterDensityKgPerM3(t) > waterDensityKgPerM3(best)) best = t;
    expect(best).toBeCloseTo(3.98, 1);
    expect(waterDensityKgPerM3(best)).toBeCloseTo(999.97, 1);
  });

  it('has viscosity falling with temperature over 0–100 °C, about halving from 20 to 55 °C', () => {
    for (let t = 0; t < 100; t += 1)
      expect(waterDynamicViscosityPaS(t + 1)).toBeLessThan(waterDynamicViscosityPaS(t));
    expect(waterDynamicViscosityPaS(55) / waterDynamicViscosityPaS(20)).toBeCloseTo(0.5, 1);
  });
});
