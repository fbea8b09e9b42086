import type { Sweep, SweepCell } from '../../../../shared/contracts/sweeps';
import { filledField, metricMinutes, sweepMapModel } from './sweep-map-model';

const cell = (
  index: number,
  regime: SweepCell['regime'],
  periodS: number | null = null,
): SweepCell => ({
  index,
  regime,
  cycles: periodS === null ? 0 : 4,
  periodS,
  floodS: periodS === null ? null : periodS / 2,
  drainS: periodS === null ? null : periodS / 2,
  inflowM3PerS: 1e-4,
  verdict: 'ok',
});

function sweep(cells: SweepCell[]): Sweep {
  return {
    id: 's',
    systemId: 'x',
    status: 'completed',
    parameters: {
      axes: [
        {
          parameter: 'pump-flow-scale',
          target: 'pump',
          from: 0.5,
          to: 1.5,
          steps: 3,
          current: 1,
          label: 'Flow scale of pump pump',
        },
        {
          parameter: 'standpipe-height',
          target: 'bed',
          from: 0.1,
          to: 0.2,
          steps: 2,
          current: 0.15,
          label: 'Standpipe height of bed',
        },
      ],
      bedId: 'bed',
      durationS: 7200,
    },
    cellsTotal: 6,
    cellsDone: cells.length,
    progress: cells.length / 6,
    error: null,
    createdAt: '2026-01-01T00:00:00Z',
    finishedAt: null,
    cells,
  };
}

describe('sweepMapModel', () => {
  it('places cell i + 3·j at the i-th value across and the j-th up, in the reader’s units', () => {
    const model = sweepMapModel(sweep([cell(0, 'spill-stall'), cell(4, 'cycling', 360)]), 'metric');
    expect(model.x.values).toEqual([0.5, 1, 1.5]);
    expect(model.y?.values).toEqual([0.1, 0.2]);
    expect(model.y?.title).toBe('Standpipe height of bed (m)');
    expect(model.x.current).toBe(1);
    const fifth = model.cells[4];
    expect(fifth).toMatchObject({ i: 1, j: 1, x: 1, y: 0.2 });
    expect(fifth?.caption).toBe('×1, 0.2 m: cycling every 6 min');
    expect(model.cells[5]?.cell).toBeNull();
    expect(model.cells[5]?.caption).toMatch(/not run yet/);
  });

  it('shows US customary values in inches', () => {
    const model = sweepMapModel(sweep([]), 'us');
    expect(model.y?.values[0]).toBeCloseTo(0.1 / 0.0254, 9);
  });
});

describe('cycle figures for contours', () => {
  it('gives minutes only for cycling cells, and fills the rest from the nearest cycling cell', () => {
    const model = sweepMapModel(
      sweep([
        cell(0, 'cycling', 600),
        cell(1, 'spill-stall'),
        cell(2, 'siphon-lock'),
        cell(5, 'cycling', 120),
      ]),
      'metric',
    );
    expect(metricMinutes(model.cells[0]?.cell ?? null, 'periodS')).toBe(10);
    expect(metricMinutes(model.cells[1]?.cell ?? null, 'periodS')).toBeNaN();
    // Grid 3 × 2: cells 1 and 3 lie next to cell 0 (5 min flood), cells 2 and 4 next to cell 5 (1 min).
    expect(filledField(model, 'floodS')).toEqual([5, 5, 1, 5, 1, 1]);
  });
});
