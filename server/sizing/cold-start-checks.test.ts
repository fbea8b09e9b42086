import { describe, expect, it } from 'vitest';
import type { SizingCheck } from '../../shared/contracts/sizing';
import { checkWords } from './check-words';
import { coldStartChecks } from './cold-start-checks';
import { exampleScenario } from './testing/example-scenario';
import { METRIC_NUMBER } from './testing/metric-number';
import { threeDigits } from './testing/three-digits';
import { US_CUSTOMARY } from './testing/us-customary';
import { whatIfParts } from './testing/what-if-parts';
import { coldStart } from './what-if-scenarios';

/** The example system with its tank starting 5 cm above the fish-safe minimum: the bed's fill takes it below. */
const scenario = exampleScenario({ 'vessels[0].initialLevel': '0.45 m' });
const run = whatIfParts(coldStart(scenario, 2 * 3600));

const find = (checks: SizingCheck[], check: string): SizingCheck => {
  const found = checks.find((c) => c.check === check);
  if (!found) throw new Error(`no ${check} check`);
  return found;
};

describe('coldStartChecks', () => {
  it('gives a US customary reader the lowest level and the reserve in inches and gallons, from the checks’ own SI values', () => {
    const checks = coldStartChecks(scenario, run, checkWords('us'));
    const level = find(checks, 'cold-start-min-level');
    expect(level.status).toBe('fails');
    expect(level.detail).toContain(
      `fell to ${threeDigits((level.value ?? NaN) / US_CUSTOMARY.inchM)} in (fish-safe minimum ${threeDigits((level.limit ?? NaN) / US_CUSTOMARY.inchM)} in)`,
    );
    const reserve = find(checks, 'cold-start-reserve');
    expect(reserve.detail).toContain(
      `takes ${threeDigits((reserve.value ?? NaN) / US_CUSTOMARY.gallonM3)} gal from tank, which holds ${threeDigits((reserve.limit ?? NaN) / US_CUSTOMARY.gallonM3)} gal above`,
    );
    for (const check of checks) expect(check.detail).not.toMatch(METRIC_NUMBER);
  });

  it('gives a metric reader the sentences in litres and metres, and the same verdicts and values as a US reader', () => {
    const metric = coldStartChecks(scenario, run, checkWords('metric'));
    const level = find(metric, 'cold-start-min-level');
    expect(level.detail).toBe(
      `While every bed filled from empty, tank fell to ${threeDigits(level.value ?? NaN)} m (fish-safe minimum ${threeDigits(level.limit ?? NaN)} m).`,
    );
    const reserve = find(metric, 'cold-start-reserve');
    expect(reserve.detail).toContain(
      `takes ${threeDigits((reserve.value ?? NaN) * 1000)} L from tank, which holds ${threeDigits((reserve.limit ?? NaN) * 1000)} L above`,
    );
    const us = coldStartChecks(scenario, run, checkWords('us'));
    const withoutWords = (checks: SizingCheck[]) => checks.map(({ detail: _, ...rest }) => rest);
    expect(withoutWords(us)).toEqual(withoutWords(metric));
  });
});
