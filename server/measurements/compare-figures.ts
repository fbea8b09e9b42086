/** Measured against simulated cycle figures, row by row. */
import type { ComparisonRow, CycleFigures } from '../../shared/contracts/measurements';

const ROWS: readonly {
  metric: ComparisonRow['metric'];
  unit: ComparisonRow['unit'];
  pick: (f: CycleFigures) => number | null;
}[] = [
  { metric: 'period', unit: 's', pick: (f) => f.periodS },
  { metric: 'flood', unit: 's', pick: (f) => f.floodS },
  { metric: 'drain', unit: 's', pick: (f) => f.drainS },
  { metric: 'high', unit: 'm', pick: (f) => f.highLevelM },
  { metric: 'low', unit: 'm', pick: (f) => f.lowLevelM },
];

/** Period, flood and drain time, high and low mark: difference = simulated − measured, relative to measured. */
export function compareFigures(measured: CycleFigures, simulated: CycleFigures): ComparisonRow[] {
  return ROWS.map(({ metric, unit, pick }) => {
    const m = pick(measured);
    const s = pick(simulated);
    const difference = m === null || s === null ? null : s - m;
    return {
      metric,
      unit,
      measured: m,
      simulated: s,
      difference,
      relative: difference === null || !m ? null : difference / m,
    };
  });
}
