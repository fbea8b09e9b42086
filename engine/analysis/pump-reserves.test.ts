import { describe, expect, it } from 'vitest';
import { parseScenario, type Scenario } from '../../shared/scenario/index';
import { withChanges } from '../../shared/scenario/testing/with-changes';
import { pumpReserves } from './pump-reserves';

function scenarioWith(changes: Record<string, unknown> = {}): Scenario {
  const parsed = parseScenario(withChanges(changes));
  if (!parsed.success) throw new Error(JSON.stringify(parsed.issues));
  return parsed.scenario;
}

describe('pumpReserves', () => {
  it('compares the water an empty bed takes to its standpipe top with the tank above the intake and the minimum', () => {
    const [reserve] = pumpReserves(scenarioWith());
    // Tank 1.2 × 0.8 m at 0.55 m: 0.25 m above the 0.30 m intake, 0.15 m above the 0.40 m minimum.
    expect(reserve?.aboveIntakeM3).toBeCloseTo(0.96 * 0.25, 12);
    expect(reserve?.aboveMinimumM3).toBeCloseTo(0.96 * 0.15, 12);
    expect(reserve?.bedIds).toEqual(['bed-a']);
    // Bed 1.0 × 0.6 m gravel (0.40) to 0.25 m is just under 60 L; the pipes add about 0.5 L.
    expect(reserve?.floodVolumeM3).toBeGreaterThan(0.055);
    expect(reserve?.floodVolumeM3).toBeLessThan(0.065);
  });

  it('needs less when the bed starts part full, and has no minimum reserve without a minimum level', () => {
    const [empty] = pumpReserves(scenarioWith());
    const [part] = pumpReserves(
      scenarioWith({ 'vessels[1].initialLevel': '0.1 m', 'vessels[0].minLevel': undefined }),
    );
    expect(part?.floodVolumeM3).toBeLessThan(empty?.floodVolumeM3 ?? 0);
    expect(part?.aboveMinimumM3).toBeNull();
  });
});
