import { describe, expect, it } from 'vitest';
import type { SweepParameters } from '../../shared/contracts/sweeps';
import { parseScenario, type BedVessel, type Scenario } from '../../shared/scenario/index';
import { withChanges } from '../../shared/scenario/testing/with-changes';
import { axisValue, cellCount, cellScenario, cellValues, describeAxisValue } from './cell-scenario';
import { chunkJobs } from './pg-boss-sweep-queue';
import { resolveSweepParameters } from './resolve-sweep-parameters';
import { vesselVolumeM3 } from './sweep-parameter-handlers';

function example(changes: Record<string, unknown> = {}): Scenario {
  const parsed = parseScenario(withChanges(changes));
  if (!parsed.success) throw new Error(JSON.stringify(parsed.issues));
  return parsed.scenario;
}

const bedOf = (s: Scenario): BedVessel => {
  const bed = s.vessels.find((v) => v.kind === 'bed');
  if (!bed || bed.kind !== 'bed') throw new Error('no bed');
  return bed;
};

function only(scenario: Scenario, parameters: SweepParameters, index: number): Scenario {
  const made = cellScenario(scenario, parameters, index);
  if ('problem' in made) throw new Error(made.problem);
  return made.scenario;
}

describe('axis values and cells', () => {
  it('spaces values evenly with both ends exact, and numbers cells i + steps·j', () => {
    const axis = { from: 0.1, to: 0.3, steps: 3 };
    expect([0, 1, 2].map((i) => axisValue(axis, i))).toEqual([0.1, 0.2, 0.3]);
    const parameters = { axes: [{ ...axis }, { from: 1, to: 2, steps: 2 }] } as SweepParameters;
    expect(cellCount(parameters)).toBe(6);
    expect(cellValues(parameters, 4)).toEqual([0.2, 2]);
  });

  it('splits a sweep into job chunks that cover every cell once', () => {
    const chunks = chunkJobs('s', 60, 25);
    expect(chunks.map((c) => c.indices.length)).toEqual([25, 25, 10]);
    expect(chunks.flatMap((c) => c.indices)).toEqual(Array.from({ length: 60 }, (_, k) => k));
  });
});

describe('cellScenario', () => {
  const base = example();

  it('writes the bore with the wall kept, the drain bore, and the run length and a name saying which cell', () => {
    const parameters = resolveSweepParameters(base, {
      axes: [
        {
          parameter: 'standpipe-diameter',
          target: 'bed-a',
          from: '20.9 mm',
          to: '35.1 mm',
          steps: 2,
        },
        { parameter: 'drain-diameter', target: 'bed-a', from: '20 mm', to: '40 mm', steps: 2 },
      ],
      duration: '30 min',
    });
    const cell = only(base, parameters, 3);
    const { standpipe, pipe } = bedOf(cell).drain;
    expect(standpipe.innerDiameter).toBeCloseTo(0.0351, 12);
    expect(standpipe.outerDiameter - standpipe.innerDiameter).toBeCloseTo(0.0334 - 0.0266, 12);
    expect(pipe.innerDiameter).toBeCloseTo(0.04, 12);
    expect(cell.run.duration).toBe(1800);
    expect(cell.name).toContain('Standpipe bore of bed-a 35.1 mm');
    expect(bedOf(base).drain.standpipe.innerDiameter).toBe(0.0266);
  });

  it('scales a tank’s plan to the volume asked for, keeping its height', () => {
    const parameters = resolveSweepParameters(base, {
      axes: [{ parameter: 'vessel-volume', target: 'tank', from: '300 L', to: '900 L', steps: 3 }],
    });
    const tank = only(base, parameters, 2).vessels[0];
    if (!tank) throw new Error('no tank');
    expect(vesselVolumeM3(tank)).toBeCloseTo(0.9, 12);
    expect(tank.height).toBe(0.7);
    expect(parameters.axes[0]?.current).toBeCloseTo(1.2 * 0.8 * 0.7, 12);
  });

  it('moves the snorkel, not the slots, when the bell breaks at a snorkel', () => {
    const snorkelled = example({ 'vessels[1].drain.bell.snorkelHeight': '40 mm' });
    const parameters = resolveSweepParameters(snorkelled, {
      axes: [{ parameter: 'intake-height', target: 'bed-a', from: '30 mm', to: '60 mm', steps: 2 }],
    });
    const drain = bedOf(only(snorkelled, parameters, 1)).drain;
    if (drain.type !== 'bell-siphon') throw new Error('expected a bell');
    expect(drain.bell.snorkelHeight).toBeCloseTo(0.06, 12);
    expect(drain.bell.intakeHeight).toBeCloseTo(0.025, 12);
  });

  it('names the broken rule when the values make an impossible system', () => {
    const parameters = resolveSweepParameters(base, {
      axes: [
        { parameter: 'standpipe-height', target: 'bed-a', from: '0.2 m', to: '0.4 m', steps: 2 },
      ],
    });
    const made = cellScenario(base, parameters, 1);
    expect('problem' in made && made.problem).toMatch(
      /^vessels\[1\]\.drain\.standpipe\.height: The standpipe must be shorter than the bed/,
    );
  });

  it('describes values as a builder reads them', () => {
    expect(describeAxisValue({ parameter: 'valve-opening' }, 0.35)).toBe('35 % open');
    expect(describeAxisValue({ parameter: 'vessel-volume' }, 0.25)).toBe('250 L');
  });
});
