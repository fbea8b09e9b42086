import { describe, expect, it } from 'vitest';
import { checkWords } from './check-words';
import { bedTankRatioCheck } from './practice-checks';
import { exampleScenario } from './testing/example-scenario';
import { METRIC_NUMBER } from './testing/metric-number';
import { threeDigits } from './testing/three-digits';
import { US_CUSTOMARY } from './testing/us-customary';

/** The example's tank: 1.2 × 0.8 m, 0.7 m high. */
const TANK_M3 = 1.2 * 0.8 * 0.7;

describe('bedTankRatioCheck', () => {
  it('gives a US customary reader the media and the tank in gallons', () => {
    const [check] = bedTankRatioCheck(exampleScenario(), checkWords('us'));
    const bedM3 = (check?.value ?? NaN) * TANK_M3;
    const gallons = (m3: number): string => `${threeDigits(m3 / US_CUSTOMARY.gallonM3)} gal`;
    expect(check?.detail).toContain(
      `The beds hold ${gallons(bedM3)} of media against ${gallons(TANK_M3)} of fish tank`,
    );
    expect(check?.detail).not.toMatch(METRIC_NUMBER);
  });

  it('gives a metric reader the media and the tank in litres', () => {
    const [check] = bedTankRatioCheck(exampleScenario(), checkWords('metric'));
    const bedM3 = (check?.value ?? NaN) * TANK_M3;
    expect(check?.detail).toContain(
      `The beds hold ${threeDigits(bedM3 * 1000)} L of media against ${threeDigits(TANK_M3 * 1000)} L of fish tank`,
    );
  });
});
