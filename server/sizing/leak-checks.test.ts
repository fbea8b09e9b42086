import { describe, expect, it } from 'vitest';
import type { SizingCheck } from '../../shared/contracts/sizing';
import type { UnitSystem } from '../../shared/scenario/index';
import { checkWords } from './check-words';
import { leakCases, leakCheck } from './leak-checks';
import { exampleScenario } from './testing/example-scenario';
import { METRIC_NUMBER } from './testing/metric-number';
import { threeDigits } from './testing/three-digits';
import { US_CUSTOMARY } from './testing/us-customary';
import { whatIfParts } from './testing/what-if-parts';

/** The example system: its pump's intake (0.30 m) sits below the tank's fish-safe minimum (0.40 m). */
const scenario = exampleScenario();
const FLOOR_HOLE_M = 0.01;
const cases = leakCases(scenario, FLOOR_HOLE_M);
const runs = cases.map((leak) => whatIfParts(leak.scenario));

function checksFor(system: UnitSystem): { line: SizingCheck; floor: SizingCheck } {
  const checks = cases.map((leak, k) => {
    const run = runs[k];
    if (!run) throw new Error('every leak case has a run');
    return leakCheck(leak, run, checkWords(system));
  });
  const line = checks.find((c) => c.check === 'pump-line-leak');
  const floor = checks.find((c) => c.check === 'tank-leak-time');
  if (!line || !floor) throw new Error('the example has a pump-line and a floor leak');
  return { line, floor };
}

describe('leakCheck', () => {
  const pump = scenario.pumps[0];
  if (!pump) throw new Error('the example has a pump');
  const inches = (m: number | null): string => `${threeDigits((m ?? NaN) / US_CUSTOMARY.inchM)} in`;

  it('gives a US customary reader the bore, the intake, the lowest level and the minimum in inches', () => {
    const { line, floor } = checksFor('us');
    expect(line.status).toBe('fails');
    expect(line.detail).toContain(
      `a hole the size of its ${inches(pump.main.innerDiameter)} bore at the intake, ${inches(pump.intakeHeight)}) takes tank down to ${inches(line.value)}`,
    );
    expect(line.detail).toContain(`its fish-safe minimum is ${inches(line.limit)}.`);
    expect(floor.title).toBe(`A ${inches(FLOOR_HOLE_M)} hole at the floor of tank`);
    expect(floor.detail).toContain(`fish-safe minimum of ${inches(line.limit)}`);
    for (const check of [line, floor]) {
      expect(check.title).not.toMatch(METRIC_NUMBER);
      expect(check.detail).not.toMatch(METRIC_NUMBER);
    }
  });

  it('gives a metric reader the bore and the hole in millimetres and the levels in metres', () => {
    const { line, floor } = checksFor('metric');
    expect(line.detail).toContain(
      `a hole the size of its ${threeDigits(pump.main.innerDiameter * 1000)} mm bore at the intake, ${threeDigits(pump.intakeHeight)} m) takes tank down to ${threeDigits(line.value ?? NaN)} m`,
    );
    expect(floor.title).toBe('A 10 mm hole at the floor of tank');
    expect(floor.detail).toMatch(
      /^A 10 mm hole at its floor takes tank below its fish-safe minimum of 0\.4 m /,
    );
  });
});
