import { describe, expect, it } from 'vitest';
import type { Vessel } from '../../shared/scenario';
import { makeVesselComponent } from '../components/vessel';
import type { ModelContext } from './model-context';
import { applyVesselLimits } from './vessel-flow-balance';

const box = (id: string): Vessel => ({
  id,
  kind: 'tank',
  shape: { type: 'box', length: 1, width: 1 },
  floorElevation: 0,
  height: 1,
  initialLevel: 0.5,
});

/** Three vessels a, b, c (state 0–2) and two rim sinks (3, 4); channels a→b, b→c, b→rim(4), c→a. */
function setup() {
  const a = makeVesselComponent(box('a'), 0, 3, 5);
  const b = makeVesselComponent(box('b'), 1, 4, 2);
  const c = makeVesselComponent(box('c'), 2, 5, 6);
  const ends = { from: Int32Array.from([0, 1, 1, 2]), to: Int32Array.from([1, 2, 4, 0]) };
  const ctx: ModelContext = {
    timeS: 0,
    state: new Float64Array(6),
    levelM: new Float64Array(3),
    surfaceM: new Float64Array(3),
    flowM3PerS: new Float64Array(4),
    inflowM3PerS: new Float64Array(3),
    netInflowM3PerS: new Float64Array(3),
  };
  return {
    vessels: [a, b, c],
    ends,
    ctx,
    scratch: [new Float64Array(3), new Float64Array(3)] as const,
  };
}

describe('applyVesselLimits', () => {
  it('scales an empty vessel’s outflows down to its inflow, for both ends of each flow', () => {
    const { vessels, ends, ctx, scratch } = setup();
    ctx.flowM3PerS.set([1, 3, 0, 0.5]);
    const b = vessels[1];
    if (!b) throw new Error('no b');
    b.empty = true;
    applyVesselLimits(ctx, ends, vessels, scratch[0], scratch[1]);
    expect(ctx.netInflowM3PerS[1]).toBe(-2);
    expect(ctx.flowM3PerS[1]).toBeCloseTo(1, 15);
    expect(ctx.flowM3PerS[0]).toBe(1);
  });

  it('sends a brimful vessel’s surplus over its rim and nothing when it is losing water', () => {
    const { vessels, ends, ctx, scratch } = setup();
    const b = vessels[1];
    if (!b) throw new Error('no b');
    b.brimful = true;
    ctx.flowM3PerS.set([2, 0.5, 0, 0]);
    applyVesselLimits(ctx, ends, vessels, scratch[0], scratch[1]);
    expect(ctx.flowM3PerS[2]).toBeCloseTo(1.5, 15);
    ctx.flowM3PerS.set([0.2, 0.5, 0, 0]);
    applyVesselLimits(ctx, ends, vessels, scratch[0], scratch[1]);
    expect(ctx.flowM3PerS[2]).toBe(0);
  });

  it('counts a reverse flow as leaving its downstream end', () => {
    const { vessels, ends, ctx, scratch } = setup();
    ctx.flowM3PerS.set([-0.7, 0, 0, 0]);
    applyVesselLimits(ctx, ends, vessels, scratch[0], scratch[1]);
    expect(ctx.netInflowM3PerS[0]).toBeCloseTo(0.7, 15);
    expect(ctx.netInflowM3PerS[1]).toBeCloseTo(-0.7, 15);
    expect(ctx.inflowM3PerS[0]).toBeCloseTo(0.7, 15);
  });
});
