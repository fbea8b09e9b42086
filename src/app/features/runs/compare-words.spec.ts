import type { CompareRow } from '../../../../shared/contracts/runs';
import { compareFigure, materiallyChanged, metricWords } from './compare-words';
import { chartSet, runFigures } from './run-figures';

const row = (a: number | null, b: number | null): CompareRow => ({
  where: 'bed-a',
  metric: 'periodMean_s',
  unit: 's',
  a,
  b,
  delta: a !== null && b !== null ? b - a : null,
  changed: a !== b,
});

describe('run comparison words and figures', () => {
  it('treats solver round-off as no change and a real change as one', () => {
    expect(materiallyChanged(row(0.25, 0.25 + 1e-12))).toBe(false);
    expect(materiallyChanged(row(480, 451))).toBe(true);
    expect(materiallyChanged(row(null, 451))).toBe(true);
  });

  it("shows compared figures in the reader's units with a sign on differences", () => {
    expect(compareFigure(0.0254, 'm', 'us')).toBe('1.00 in');
    expect(compareFigure(-29, 's', 'metric', true)).toBe('−29 s');
    expect(compareFigure(7200, 'J', 'metric', true)).toBe('+2 Wh');
    expect(metricWords('periodMean_s')).toBe('mean period');
  });

  it('adds up cycles, averages periods and finds the lowest tank level, ignoring beds', () => {
    const figures = runFigures({
      beds: [
        {
          id: 'bed-a',
          cycles: 3,
          periodMean_s: 400,
          floodMean_s: null,
          drainMean_s: null,
          highLevel_m: null,
          lowLevel_m: null,
          state: 'cycling',
        },
        {
          id: 'bed-b',
          cycles: 0,
          periodMean_s: null,
          floodMean_s: null,
          drainMean_s: null,
          highLevel_m: null,
          lowLevel_m: null,
          state: 'spill-stall',
        },
      ],
      vessels: [
        { id: 'bed-a', minLevel_m: 0, minLevelAt_s: 0, maxLevel_m: 0.2, lost_m3: 0 },
        { id: 'tank', minLevel_m: 0.45, minLevelAt_s: 10, maxLevel_m: 0.5, lost_m3: 0 },
        { id: 'sump', minLevel_m: 0.12, minLevelAt_s: 10, maxLevel_m: 0.3, lost_m3: 0 },
      ],
      pumps: [],
    });
    expect(figures).toEqual({ cycles: 3, periodS: 400, lowest: { id: 'sump', levelM: 0.12 } });
  });

  it('charts levels, and pump and drain flows without rim and overflow flows', () => {
    const series = {
      t_s: [0, 5],
      channels: [
        {
          id: 'level:tank',
          kind: 'level' as const,
          where: 'tank',
          unit: 'm' as const,
          values: [0.5, 0.49],
        },
        {
          id: 'flow:pump',
          kind: 'flow' as const,
          where: 'pump',
          unit: 'm3/s' as const,
          values: [1e-3, 1e-3],
        },
        {
          id: 'flow:bed-a.drain',
          kind: 'flow' as const,
          where: 'bed-a',
          unit: 'm3/s' as const,
          values: [0, 2e-3],
        },
        {
          id: 'flow:tank.rim',
          kind: 'flow' as const,
          where: 'tank',
          unit: 'm3/s' as const,
          values: [0, 0],
        },
      ],
    };
    expect(chartSet(series, 'levels').lines.map((l) => l.label)).toEqual(['tank']);
    expect(chartSet(series, 'flows').lines.map((l) => l.label)).toEqual(['pump', 'bed-a drain']);
  });
});
