import { describe, expect, it } from 'vitest';
import { SCENARIO_DEFAULTS } from '../../shared/scenario/index';
import { ballValveK, minorLossCoefficient } from './minor-loss';

const K = SCENARIO_DEFAULTS.lossCoefficients;

describe('minor losses', () => {
  it('sums count × K with the screwed-fitting table (90° elbow 0.90, 45° 0.42, tee branch 1.80: ICC IRC App. A)', () => {
    expect(
      minorLossCoefficient({ elbow90: 3, elbow45: 1, teeRun: 0, teeBranch: 1, ballValve: 1 }, K),
    ).toBeCloseTo(3 * 0.9 + 0.42 + 1.8 + 0.08, 12);
    expect(
      minorLossCoefficient({ elbow90: 0, elbow45: 0, teeRun: 0, teeBranch: 0, ballValve: 0 }, K),
    ).toBe(0);
  });

  it('gives the open K for a fully open valve and an infinite K for a closed one', () => {
    expect(ballValveK(1, 0.08)).toBeCloseTo(0.08, 15);
    expect(ballValveK(0, 0.08)).toBe(Number.POSITIVE_INFINITY);
  });

  it('rises steeply as the valve closes (half open ≈ 3.8 above the open K)', () => {
    expect(ballValveK(0.5, 0)).toBeCloseTo(3.83, 2);
    let previous = ballValveK(1, 0);
    for (let s = 0.95; s > 0.04; s -= 0.05) {
      const k = ballValveK(s, 0);
      expect(k).toBeGreaterThan(previous);
      previous = k;
    }
  });
});
