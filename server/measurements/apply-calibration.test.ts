import { describe, expect, it } from 'vitest';
import { EXAMPLE_SCENARIO_FILE, parseScenario, type Scenario } from '../../shared/scenario/index';
import { applyCalibration } from './apply-calibration';

function example(): Scenario {
  const parsed = parseScenario(EXAMPLE_SCENARIO_FILE);
  if (!parsed.success) throw new Error('example does not parse');
  return parsed.scenario;
}

const calibration = {
  calibrationId: '00000000-0000-4000-8000-000000000001',
  beds: [
    { bed: 'bed-a', primingCoefficient: 0.55, dischargeLossMultiplier: 1.6 },
    { bed: 'gone', primingCoefficient: 0.9 },
  ],
  pumps: [{ pump: 'pump', flowScale: 0.85 }],
  appliedAt: '2024-06-01T10:00:00.000Z',
  appliedBy: { id: '00000000-0000-4000-8000-000000000002', name: 'Cal' },
};

describe('applyCalibration', () => {
  it('sets the calibrated k_p, loss multiplier and flow scale on a copy of the scenario', () => {
    const scenario = example();
    const calibrated = applyCalibration(scenario, calibration);
    const bed = calibrated.vessels.find((v) => v.id === 'bed-a');
    expect(
      bed?.kind === 'bed' && bed.drain.type === 'bell-siphon'
        ? [bed.drain.primingCoefficient, bed.drain.dischargeLossMultiplier]
        : null,
    ).toEqual([0.55, 1.6]);
    expect(calibrated.pumps[0]?.flowScale).toBe(0.85);
    const original = scenario.vessels.find((v) => v.id === 'bed-a');
    expect(original?.kind === 'bed' && original.drain.dischargeLossMultiplier).toBe(1);
    expect(calibrated.vessels).toHaveLength(scenario.vessels.length);
  });

  it('returns the scenario itself for no calibration or a value that is not one', () => {
    const scenario = example();
    expect(applyCalibration(scenario, null)).toBe(scenario);
    expect(applyCalibration(scenario, { beds: 'all' })).toBe(scenario);
  });
});
