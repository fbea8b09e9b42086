import { describe, expect, it } from 'vitest';
import { parseScenario, type BedVessel, type Scenario } from '../../shared/scenario/index';
import { withChanges } from '../../shared/scenario/testing/with-changes';
import { bedCutList } from './bed-cut-list';
import { defaultFittingDepthM, nominalPipeSize } from './pipe-sizes';
import { coldStart, powerCut, withLeak } from './what-if-scenarios';

function example(changes: Record<string, unknown> = {}): Scenario {
  const parsed = parseScenario(withChanges(changes));
  if (!parsed.success) throw new Error(JSON.stringify(parsed.issues));
  return parsed.scenario;
}

const bedOf = (s: Scenario): BedVessel => {
  const bed = s.vessels[1];
  if (bed?.kind !== 'bed') throw new Error('no bed');
  return bed;
};

describe('bedCutList', () => {
  it('cuts the standpipe to its height above the floor plus the fitting depth, and the bell to the cap gap above it', () => {
    const cut = bedCutList(bedOf(example()), 0.03);
    expect(cut.standpipe).toMatchObject({
      size: '1 in Schedule 40',
      heightAboveFloorM: 0.25,
      fittingDepthM: 0.03,
      fittingDepthSource: 'entered',
    });
    expect(cut.standpipe.cutLengthM).toBeCloseTo(0.28, 12);
    // No slots: the bell stands on 25 mm spacers, so it is that much shorter.
    expect(cut.bell).toMatchObject({
      size: '3 in Schedule 40',
      standsOn: 'spacers',
      intakeHeightM: 0.025,
    });
    expect(cut.bell?.lengthM).toBeCloseTo(0.25 + 0.025 - 0.025, 12);
    expect(cut.parts.find((p) => p.item === '90° elbow')).toMatchObject({
      quantity: 2,
      size: '1 in Schedule 40',
    });
  });

  it('stands a slotted bell on the floor and lists its slots; takes the socket depth of the size by default', () => {
    const slotted = bedOf(
      example({ 'vessels[1].drain.bell.slotCount': 6, 'vessels[1].drain.bell.slotWidth': '6 mm' }),
    );
    const cut = bedCutList(slotted);
    expect(cut.bell).toMatchObject({ standsOn: 'slots', slotCount: 6, slotWidthM: 0.006 });
    expect(cut.bell?.lengthM).toBeCloseTo(0.275, 12);
    expect(cut.standpipe.fittingDepthM).toBe(defaultFittingDepthM(0.0334));
    expect(cut.standpipe.fittingDepthSource).toMatch(/from memory/);
  });
});

describe('pipe sizes', () => {
  it('names Schedule 40 sizes by bore or outside diameter, and nothing for an odd size', () => {
    expect(nominalPipeSize({ insideM: 0.0158 })).toBe('½ in Schedule 40');
    expect(nominalPipeSize({ outsideM: 0.0603 })).toBe('2 in Schedule 40');
    expect(nominalPipeSize({ insideM: 0.09, outsideM: 0.09 })).toBeNull();
  });
});

describe('what-if scenarios', () => {
  it('starts every bed empty on a cold start and cuts the power for a while, then restores it', () => {
    const base = example({
      'vessels[1].initialLevel': '0.1 m',
      schedule: [{ at: '1 h', pump: 'pump', state: 'off' }],
    });
    expect(bedOf(coldStart(base, 3600)).initialLevel).toBe(0);
    const cut = powerCut(base, 300, 1800);
    expect(cut.schedule).toEqual([
      { at: 300, power: 'off' },
      { at: 2100, power: 'on' },
    ]);
    expect(cut.run.duration).toBe(300 + 1800 + 3600);
    const leaky = withLeak(base, 'tank', 0.3, 0.01, 600, 7200);
    expect(leaky.leaks).toEqual([
      { from: 'tank', elevation: 0.3, diameter: 0.01, start: 600, dischargeCoefficient: 0.61 },
    ]);
    expect(leaky.schedule).toEqual([]);
  });
});
