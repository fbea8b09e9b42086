import { describe, expect, it } from 'vitest';
import { checkWords } from './check-words';
import { bedLoads, loadChecks, RESIDENTIAL_FLOOR_LOAD_PA } from './load-checks';
import { exampleScenario } from './testing/example-scenario';
import { METRIC_NUMBER } from './testing/metric-number';
import { threeDigits } from './testing/three-digits';
import { US_CUSTOMARY } from './testing/us-customary';

const loads = bedLoads(exampleScenario());

describe('loadChecks', () => {
  it('gives a US customary reader the weights in pounds, the pressure in lb/ft² and the footprint in ft²', () => {
    const [load] = loads;
    const [check] = loadChecks(loads, checkWords('us'));
    if (!load || !check) throw new Error('the example has a bed');
    const pounds = (kg: number): string => `${threeDigits(kg / US_CUSTOMARY.poundKg)} lb`;
    expect(check.detail).toContain(
      `weighs ${pounds(load.totalAtRimKg)}: ${pounds(load.wetMediaKg)} of wet media and ${pounds(load.waterAtRimKg)} of water, ` +
        `${threeDigits(load.pressureAtRimPa / US_CUSTOMARY.poundForcePerSquareFootPa)} lb/ft² over its ${threeDigits(load.footprintM2 / US_CUSTOMARY.squareFootM2)} ft² footprint (${pounds(load.totalAtFloodKg)} at flood level).`,
    );
    expect(check.detail).not.toMatch(METRIC_NUMBER);
  });

  it('compares a heavy bed with the 40 lb/ft² a home floor is rated for, in the US reader’s units', () => {
    const heavy = loads.map((load) => ({
      ...load,
      pressureAtRimPa: 2 * RESIDENTIAL_FLOOR_LOAD_PA,
    }));
    const [check] = loadChecks(heavy, checkWords('us'));
    expect(check?.status).toBe('warning');
    expect(check?.detail).toContain('more than the 40 lb/ft² a home floor');
  });

  it('gives a metric reader the sentence in kilograms, kilopascals and square metres', () => {
    const [load] = loads;
    const [check] = loadChecks(loads, checkWords('metric'));
    if (!load || !check) throw new Error('the example has a bed');
    const kg = (x: number): string => `${threeDigits(x)} kg`;
    const kPa = (pa: number): string => `${threeDigits(pa / 1000)} kPa`;
    const heavy = load.pressureAtRimPa > RESIDENTIAL_FLOOR_LOAD_PA;
    expect(check.detail).toBe(
      `Full to its rim (a blocked drain), ${load.bedId} weighs ${kg(load.totalAtRimKg)}: ${kg(load.wetMediaKg)} of wet media and ${kg(load.waterAtRimKg)} of water, ` +
        `${kPa(load.pressureAtRimPa)} over its ${threeDigits(load.footprintM2)} m² footprint (${kg(load.totalAtFloodKg)} at flood level). ` +
        (heavy
          ? `That is more than the ${kPa(RESIDENTIAL_FLOOR_LOAD_PA)} a home floor is commonly designed for. `
          : '') +
        'Stands, decks and floors under beds need a check by a qualified person.',
    );
  });
});
