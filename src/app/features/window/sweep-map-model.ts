import type { Sweep, SweepAxis, SweepCell } from '../../../../shared/contracts/sweeps';
import type { UnitSystem } from '../../../../shared/scenario';
import { axisUnits, formatAxisValue } from './axis-units';

/** Which cycle figure the map draws as contours (and the line chart as lines). */
export type CycleMetric = 'periodS' | 'floodS' | 'drainS';

/** Words for each cycle figure. */
export const METRIC_NAMES: Readonly<Record<CycleMetric, string>> = {
  periodS: 'Period',
  floodS: 'Flood time',
  drainS: 'Drain time',
};

/** One axis as drawn: its title with unit, its values and the current design, in display units. */
export interface MapAxis {
  readonly title: string;
  readonly values: readonly number[];
  readonly current: number | null;
  readonly axis: SweepAxis;
}

/** One cell as drawn: grid position, display values and what happened there. */
export interface MapCell {
  readonly index: number;
  readonly i: number;
  readonly j: number;
  readonly x: number;
  readonly y: number | null;
  readonly cell: SweepCell | null;
  /** A one-line description for the tooltip and screen readers. */
  readonly caption: string;
}

/** Everything a map or line chart needs from a sweep. */
export interface MapModel {
  readonly x: MapAxis;
  readonly y: MapAxis | null;
  readonly cells: readonly MapCell[];
}

function axisValues(axis: SweepAxis): number[] {
  return Array.from({ length: axis.steps }, (_, i) =>
    i === axis.steps - 1 ? axis.to : axis.from + ((axis.to - axis.from) * i) / (axis.steps - 1),
  );
}

function mapAxis(axis: SweepAxis, system: UnitSystem): MapAxis {
  const { scale, label } = axisUnits(axis.parameter, system);
  const show = (si: number) => scale.offset + scale.factor * si;
  return {
    title: `${axis.label} (${label})`,
    values: axisValues(axis).map(show),
    current: axis.current === null ? null : show(axis.current),
    axis,
  };
}

function caption(cell: SweepCell | null, where: string): string {
  if (!cell) return `${where}: not run yet`;
  if (cell.regime === 'cycling' && cell.periodS !== null)
    return `${where}: cycling every ${Number((cell.periodS / 60).toPrecision(3))} min`;
  return `${where}: ${cell.regime.replace('-', ' ')}${cell.error ? ` (${cell.error})` : ''}`;
}

/** The drawing model of a sweep in the reader's units. */
export function sweepMapModel(sweep: Sweep, system: UnitSystem): MapModel {
  const [first, second] = sweep.parameters.axes;
  if (!first) throw new Error('A sweep has at least one axis.');
  const x = mapAxis(first, system);
  const y = second ? mapAxis(second, system) : null;
  const byIndex = new Map((sweep.cells ?? []).map((c) => [c.index, c]));
  const firstValues = axisValues(first);
  const secondValues = second ? axisValues(second) : [];
  const cells = Array.from({ length: sweep.cellsTotal }, (_, index): MapCell => {
    const i = index % first.steps;
    const j = Math.floor(index / first.steps);
    const where = [
      formatAxisValue(first.parameter, firstValues[i] ?? 0, system),
      ...(second ? [formatAxisValue(second.parameter, secondValues[j] ?? 0, system)] : []),
    ].join(', ');
    const cell = byIndex.get(index) ?? null;
    return {
      index,
      i,
      j,
      x: x.values[i] ?? 0,
      y: y ? (y.values[j] ?? 0) : null,
      cell,
      caption: caption(cell, where),
    };
  });
  return { x, y, cells };
}

/** The cycle figure of a cell in minutes, or NaN when it did not cycle. */
export function metricMinutes(cell: SweepCell | null, metric: CycleMetric): number {
  const value = cell?.regime === 'cycling' ? cell[metric] : null;
  return value === null || value === undefined ? Number.NaN : value / 60;
}

/**
 * The field a contour plot needs on the whole grid: each cycling cell's figure, and every other
 * cell given its nearest cycling cell's figure (the plot is clipped to the cycling cells, so the
 * fill only keeps contour lines from bending round the edge of the region). NaN when none cycles.
 */
export function filledField(model: MapModel, metric: CycleMetric): number[] {
  const nx = model.x.values.length;
  const values = model.cells.map((c) => metricMinutes(c.cell, metric));
  const known = model.cells.filter((_, k) => Number.isFinite(values[k]));
  if (known.length === 0) return values;
  return values.map((v, k) => {
    if (Number.isFinite(v)) return v;
    const i = k % nx;
    const j = Math.floor(k / nx);
    let best = Infinity;
    let value = Number.NaN;
    for (const c of known) {
      const d = (c.i - i) ** 2 + (c.j - j) ** 2;
      if (d < best) {
        best = d;
        value = values[c.index] ?? Number.NaN;
      }
    }
    return value;
  });
}
