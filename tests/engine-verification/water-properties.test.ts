import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { readFixture } from './read-fixture';
import {
  waterDensityKgPerM3,
  waterDynamicViscosityPaS,
  waterKinematicViscosityM2PerS,
} from './engine-parts';

const within = (value: number, reference: number, relative: number): void => {
  expect(Math.abs(value / reference - 1), `${value} vs ${reference}`).toBeLessThanOrEqual(relative);
};

// IAPWS-95 / IAPWS 2008 through the `iapws` package (Debian python3-iapws), written by
// scripts/fixtures/generate-water-fixture.py.
const WaterFixtureSchema = z.object({
  versions: z.object({ iapws: z.string() }),
  rows: z.array(
    z.object({
      temperatureC: z.number(),
      densityKgPerM3: z.number(),
      dynamicViscosityPaS: z.number(),
      kinematicViscosityM2PerS: z.number(),
    }),
  ),
});

describe('water properties against IAPWS values', () => {
  it.each([
    [15, 999.1, 1.1376e-3, 1.1386e-6],
    [20, 998.207, 1.0016e-3, 1.0034e-6],
    [25, 997.048, 0.89002e-3, 0.89266e-6],
    [30, 995.65, 0.7972e-3, 0.8007e-6],
  ])(
    'IAPWS-95 (library-computed, iapws 1.5.2) at %d °C: ρ %f, μ %f, ν %f within 0.1 %%',
    (t, rho, mu, nu) => {
      within(waterDensityKgPerM3(t), rho, 1e-3);
      within(waterDynamicViscosityPaS(t), mu, 1e-3);
      within(waterKinematicViscosityM2PerS(t), nu, 1e-3);
    },
  );

  it('engineering data tables (Engineers Edge) at 20 °C: ρ 998.2, μ 1.002e-3, ν 1.004e-6 within 0.2 %', () => {
    within(waterDensityKgPerM3(20), 998.2, 2e-3);
    within(waterDynamicViscosityPaS(20), 1.002e-3, 2e-3);
    within(waterKinematicViscosityM2PerS(20), 1.004e-6, 2e-3);
  });

  const fixture = readFixture('water.json', WaterFixtureSchema);
  it(`matches iapws ${fixture.versions.iapws} from 1 to 45 °C: density within 1e-5, viscosity within 1e-4`, () => {
    expect(fixture.rows.length).toBeGreaterThan(5);
    for (const row of fixture.rows) {
      within(waterDensityKgPerM3(row.temperatureC), row.densityKgPerM3, 1e-5);
      within(waterDynamicViscosityPaS(row.temperatureC), row.dynamicViscosityPaS, 1e-4);
      within(waterKinematicViscosityM2PerS(row.temperatureC), row.kinematicViscosityM2PerS, 1e-4);
    }
  });
});
