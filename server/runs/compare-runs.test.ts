import { describe, expect, it } from 'vitest';
import type { RunSummary, Verdict } from '../../shared/contracts/runs';
import { compareRuns } from './compare-runs';

const bed = (
  id: string,
  cycles: number,
  period: number | null,
  state: RunSummary['beds'][number]['state'],
) => ({
  id,
  cycles,
  periodMean_s: period,
  floodMean_s: period === null ? null : period * 0.8,
  drainMean_s: period === null ? null : period * 0.2,
  highLevel_m: 0.25,
  lowLevel_m: 0.03,
  state,
});
const summary = (beds: RunSummary['beds'], minTank: number): RunSummary => ({
  beds,
  vessels: [{ id: 'tank', minLevel_m: minTank, minLevelAt_s: 100, maxLevel_m: 0.55, lost_m3: 0 }],
  pumps: [{ id: 'pump', meanFlow_m3s: 3e-4, dry_s: 0, energy_J: 1000 }],
});
const verdict = (check: string, status: Verdict['status']): Verdict => ({
  check,
  status,
  value: 1,
  limit: 2,
  source: 'test',
});

describe('compareRuns', () => {
  const a = {
    summary: summary([bed('bed-a', 10, 600, 'cycling')], 0.45),
    verdicts: [verdict('tank-min', 'ok'), verdict('bed-a-cycles', 'ok')],
  };
  const b = {
    summary: summary([bed('bed-a', 8, 750, 'cycling'), bed('bed-b', 0, null, 'siphon-lock')], 0.38),
    verdicts: [verdict('tank-min', 'fails'), verdict('bed-b-cycles', 'fails')],
  };
  const table = compareRuns(a, b);

  it('gives per-bed rows with b − a and marks changes', () => {
    const period = table.beds.find((r) => r.where === 'bed-a' && r.metric === 'periodMean_s');
    expect(period).toEqual({
      where: 'bed-a',
      metric: 'periodMean_s',
      unit: 's',
      a: 600,
      b: 750,
      delta: 150,
      changed: true,
    });
    const high = table.beds.find((r) => r.where === 'bed-a' && r.metric === 'highLevel_m');
    expect(high?.changed).toBe(false);
    expect(high?.delta).toBe(0);
  });

  it('lists a bed present in one run only, with nulls on the other side', () => {
    const cycles = table.beds.find((r) => r.where === 'bed-b' && r.metric === 'cycles');
    expect(cycles).toMatchObject({ a: null, b: 0, delta: null, changed: true });
    expect(table.bedStates).toEqual([
      { where: 'bed-a', a: 'cycling', b: 'cycling', changed: false },
      { where: 'bed-b', a: null, b: 'siphon-lock', changed: true },
    ]);
  });

  it('compares vessel minima and maxima and pump figures', () => {
    const min = table.vessels.find((r) => r.metric === 'minLevel_m');
    expect(min?.a).toBe(0.45);
    expect(min?.b).toBe(0.38);
    expect(min?.delta).toBeCloseTo(-0.07, 12);
    expect(table.pumps.map((r) => r.changed)).toEqual([false, false, false]);
  });

  it('shows each verdict check with its status in both runs', () => {
    expect(table.verdicts).toEqual([
      { check: 'tank-min', a: 'ok', b: 'fails', changed: true },
      { check: 'bed-a-cycles', a: 'ok', b: null, changed: true },
      { check: 'bed-b-cycles', a: null, b: 'fails', changed: true },
    ]);
  });

  it('handles a run without results', () => {
    const empty = compareRuns({ summary: null, verdicts: null }, a);
    expect(empty.beds.every((r) => r.a === null)).toBe(true);
    expect(empty.verdicts.map((v) => v.a)).toEqual([null, null]);
  });
});
