import { describe, expect, it } from 'vitest';
import { EXAMPLE_SCENARIO_FILE } from '../../shared/scenario/index';
import { describeSystem } from './describe-system';

describe('describeSystem', () => {
  it('counts beds and pumps and reads the largest curve flow in L/h', () => {
    const figures = describeSystem(EXAMPLE_SCENARIO_FILE);
    expect(figures.bedsCount).toBe(1);
    expect(figures.pumpsCount).toBe(1);
    expect(figures.pumpsMaxFlowM3PerS).toBeCloseTo(2000 / 3.6e6, 15);
    expect(figures.pumpSummary).toBe('1 pump, up to 2000 L/h');
  });
  it('sums two pumps given by maxFlow and by a curve in SI numbers', () => {
    const figures = describeSystem({
      vessels: [{ kind: 'bed' }, { kind: 'bed' }, { kind: 'sump' }],
      pumps: [{ maxFlow: '1 m^3/h' }, { curve: [{ flow: 0 }, { flow: 5e-4 }] }],
    });
    expect(figures.bedsCount).toBe(2);
    expect(figures.pumpsMaxFlowM3PerS).toBeCloseTo(1 / 3600 + 5e-4, 15);
    expect(figures.pumpSummary).toBe('2 pumps, up to 2800 L/h in all');
  });
  it('says "No pump" and tolerates a document of another shape', () => {
    expect(describeSystem({ vessels: [] })).toEqual({
      bedsCount: 0,
      pumpsCount: 0,
      pumpSummary: 'No pump',
      pumpsMaxFlowM3PerS: null,
    });
    expect(describeSystem('not an object').bedsCount).toBe(0);
  });
});
