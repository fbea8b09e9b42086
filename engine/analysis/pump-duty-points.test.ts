import { describe, expect, it } from 'vitest';
import { parseScenario, type Scenario } from '../../shared/scenario/index';
import { withChanges } from '../../shared/scenario/testing/with-changes';
import { pumpDutyPoint, pumpedInflowsM3PerS } from './pump-duty-points';

function scenarioWith(changes: Record<string, unknown> = {}): Scenario {
  const parsed = parseScenario(withChanges(changes));
  if (!parsed.success) throw new Error(JSON.stringify(parsed.issues));
  return parsed.scenario;
}

const onlyPump = (scenario: Scenario) => {
  const pump = scenario.pumps[0];
  if (!pump) throw new Error('expected a pump');
  return pump;
};

describe('pumpDutyPoint', () => {
  it('sits on the pump curve, below the shut-off head and above zero flow', () => {
    const scenario = scenarioWith();
    const point = pumpDutyPoint(scenario, onlyPump(scenario));
    expect(point.dry).toBe(false);
    expect(point.flowM3PerS).toBeGreaterThan(0);
    expect(point.headM).toBeGreaterThan(1.2 - 0.55);
    expect(point.headM).toBeLessThan(2.2);
    expect(point.outletFlowsM3PerS.reduce((a, b) => a + b, 0)).toBeCloseTo(point.flowM3PerS, 12);
  });

  it('delivers nothing when the source starts at or below the intake', () => {
    const scenario = scenarioWith({ 'vessels[0].initialLevel': '0.3 m' });
    expect(pumpDutyPoint(scenario, onlyPump(scenario))).toMatchObject({ dry: true, flowM3PerS: 0 });
  });

  it('delivers less against a higher outlet, and less again with a worn pump', () => {
    const base = scenarioWith();
    const higher = scenarioWith({ 'pumps[0].outlets[0].elevation': '1.6 m' });
    const worn = scenarioWith({ faults: [{ kind: 'pump-worn', pump: 'pump', flowScale: 0.7 }] });
    const q = (s: Scenario) => pumpDutyPoint(s, onlyPump(s)).flowM3PerS;
    expect(q(higher)).toBeLessThan(q(base));
    expect(q(worn)).toBeLessThan(q(base));
  });

  it('sums the outlets into the inflow of each destination', () => {
    const scenario = scenarioWith();
    const point = pumpDutyPoint(scenario, onlyPump(scenario));
    expect(pumpedInflowsM3PerS(scenario).get('bed-a')).toBe(point.outletFlowsM3PerS[0]);
  });
});
