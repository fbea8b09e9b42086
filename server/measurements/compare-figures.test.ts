import { describe, expect, it } from 'vitest';
import { compareFigures } from './compare-figures';
import { cycleFigures } from './cycle-figures';

describe('compareFigures', () => {
  it('gives simulated minus measured and the relative difference, null where a side is missing', () => {
    const measured = {
      cycles: 3,
      periodS: 400,
      floodS: 300,
      drainS: 100,
      highLevelM: 0.26,
      lowLevelM: null,
    };
    const simulated = {
      cycles: 5,
      periodS: 380,
      floodS: 290,
      drainS: 90,
      highLevelM: 0.265,
      lowLevelM: 0.025,
    };
    const rows = compareFigures(measured, simulated);
    expect(rows.map((r) => [r.metric, r.difference])).toEqual([
      ['period', -20],
      ['flood', -10],
      ['drain', -10],
      ['high', expect.closeTo(0.005, 12)],
      ['low', null],
    ]);
    expect(rows[0]?.relative).toBeCloseTo(-0.05, 12);
    expect(rows[4]).toEqual({
      metric: 'low',
      unit: 'm',
      measured: null,
      simulated: 0.025,
      difference: null,
      relative: null,
    });
  });

  it('summarises drain cycles: flood from break to next prime, drain from prime to break', () => {
    const figures = cycleFigures([
      { primeS: 100, breakS: 160, highM: 0.26, lowM: 0.02 },
      { primeS: 500, breakS: 570, highM: 0.27, lowM: 0.03 },
    ]);
    expect(figures).toEqual({
      cycles: 2,
      periodS: 400,
      floodS: 340,
      drainS: 65,
      highLevelM: 0.265,
      lowLevelM: 0.025,
    });
  });
});
