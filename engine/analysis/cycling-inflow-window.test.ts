import { describe, expect, it } from 'vitest';
import { parseScenario, type Scenario } from '../../shared/scenario/index';
import { withChanges } from '../../shared/scenario/testing/with-changes';
import { primingFlowM3PerS } from '../components/siphon-flow';
import type { BellSiphonDrain } from '../../shared/scenario/index';
import { cyclingInflowWindow, cyclingInflowWindows, regimeAtInflow } from './cycling-inflow-window';

function scenarioWith(changes: Record<string, unknown> = {}): Scenario {
  const parsed = parseScenario(withChanges(changes));
  if (!parsed.success) throw new Error(JSON.stringify(parsed.issues));
  return parsed.scenario;
}

const bounds = {
  bedId: 'b',
  primingInflowM3PerS: 2,
  breakingInflowM3PerS: 5,
  spillAtRimM3PerS: 3,
  siphonAtRimM3PerS: 8,
  rimOverflowInflowM3PerS: 8,
  cyclingRange: { lowM3PerS: 2, highM3PerS: 5 },
  tailWaterM: 0,
};

describe('regimeAtInflow', () => {
  it('orders the regimes idle, spill stall, cycling, siphon lock, rim overflow as the inflow grows', () => {
    expect([0, 1, 2, 2.01, 4.99, 5, 7.99, 8, 20].map((q) => regimeAtInflow(bounds, q))).toEqual([
      'idle',
      'spill-stall',
      'spill-stall',
      'cycling',
      'cycling',
      'siphon-lock',
      'siphon-lock',
      'rim-overflow',
      'rim-overflow',
    ]);
  });

  it('never cycles when the rim spill cannot reach the priming flow: it stalls, then overflows the rim', () => {
    const low = { ...bounds, spillAtRimM3PerS: 1.5 };
    expect([1, 1.49, 1.5, 3, 6].map((q) => regimeAtInflow(low, q))).toEqual([
      'spill-stall',
      'spill-stall',
      'rim-overflow',
      'rim-overflow',
      'rim-overflow',
    ]);
  });

  it('goes from spill stall straight to siphon lock when the siphon at the break level carries less than the priming flow', () => {
    const narrow = { ...bounds, breakingInflowM3PerS: 1.5 };
    expect([1, 2, 2.5, 9].map((q) => regimeAtInflow(narrow, q))).toEqual([
      'spill-stall',
      'spill-stall',
      'siphon-lock',
      'rim-overflow',
    ]);
  });
});

describe('cyclingInflowWindow', () => {
  it('takes the priming flow k_p·√(g·D_s⁵) as the lowest inflow and orders the full-bore flows by level', () => {
    const scenario = scenarioWith();
    const window = cyclingInflowWindow(scenario, 'bed-a');
    const bed = scenario.vessels[1];
    if (!window || bed?.kind !== 'bed') throw new Error('expected the example bed');
    expect(window.primingInflowM3PerS).toBe(primingFlowM3PerS(bed.drain as BellSiphonDrain));
    expect(window.siphonAtRimM3PerS).toBeGreaterThan(window.breakingInflowM3PerS);
    expect(window.inflowM3PerS).toBeGreaterThan(0);
  });

  it('lowers the breaking inflow when the drain is half blocked, by exactly half', () => {
    const open = cyclingInflowWindow(scenarioWith(), 'bed-a');
    const blocked = cyclingInflowWindow(
      scenarioWith({ faults: [{ kind: 'drain-blocked', bed: 'bed-a', fraction: 0.5 }] }),
      'bed-a',
    );
    expect(blocked?.breakingInflowM3PerS).toBeCloseTo(0.5 * (open?.breakingInflowM3PerS ?? 0), 12);
  });

  it('uses the receiving surface as tail water when it stands above the drain outlet', () => {
    const drowned = cyclingInflowWindow(
      scenarioWith({ 'vessels[1].drain.outletElevation': '0.5 m' }),
      'bed-a',
    );
    expect(drowned?.tailWaterM).toBeCloseTo(0.55, 12);
  });

  it('answers with a given inflow instead of the pump delivery, and skips beds without a bell siphon', () => {
    const window = cyclingInflowWindow(scenarioWith(), 'bed-a', { inflowM3PerS: 0 });
    expect(window?.regime).toBe('idle');
    expect(cyclingInflowWindow(scenarioWith(), 'tank')).toBeNull();
    expect(cyclingInflowWindows(scenarioWith()).map((w) => w.bedId)).toEqual(['bed-a']);
  });
});
