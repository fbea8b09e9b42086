import { describe, expect, it } from 'vitest';
import { checkWords } from './check-words';
import { powerCutChecks, powerCutMoment } from './power-cut-checks';
import { exampleScenario } from './testing/example-scenario';
import { METRIC_NUMBER } from './testing/metric-number';
import { threeDigits } from './testing/three-digits';
import { US_CUSTOMARY } from './testing/us-customary';
import { whatIfParts } from './testing/what-if-parts';
import { coldStart, powerCut } from './what-if-scenarios';

const scenario = exampleScenario();
const cut = powerCutMoment(whatIfParts(coldStart(scenario, 2 * 3600)));
const CUT_S = 3600;
const run = whatIfParts(powerCut(scenario, cut.atS, CUT_S));
/** The same run as if 12 L had overflowed from the tank (to exercise the sentence about lost water). */
const LOST_M3 = 0.012;
const spilledRun = {
  ...run,
  summary: {
    ...run.summary,
    vessels: run.summary.vessels.map((v) => (v.id === 'tank' ? { ...v, lost_m3: LOST_M3 } : v)),
  },
};

describe('powerCutChecks', () => {
  it('tells a US customary reader the lost water in gallons and the times in minutes', () => {
    const [lost] = powerCutChecks(scenario, spilledRun, cut, CUT_S, checkWords('us'));
    expect(lost?.status).toBe('fails');
    expect(lost?.detail).toContain(
      `The power went off at ${threeDigits(cut.atS / 60)} min, ${cut.when}, for 60 min. ` +
        `${threeDigits(LOST_M3 / US_CUSTOMARY.gallonM3)} gal of water left the system`,
    );
    expect(lost?.detail).not.toMatch(METRIC_NUMBER);
  });

  it('tells a metric reader the lost water in litres', () => {
    const [lost] = powerCutChecks(scenario, spilledRun, cut, CUT_S, checkWords('metric'));
    expect(lost?.detail).toContain('for 60 min. 12 L of water left the system');
  });

  it('finds nothing lost in the example system’s own power cut', () => {
    const [lost] = powerCutChecks(scenario, run, cut, CUT_S, checkWords('us'));
    expect(lost).toMatchObject({ status: 'ok', value: 0 });
  });
});
