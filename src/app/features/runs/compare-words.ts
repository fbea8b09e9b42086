import type { CompareRow } from '../../../../shared/contracts/runs';
import { type UnitSystem, formatQuantity } from '../../../../shared/scenario';
import { durationWords } from './verdict-words';

/** Summary metrics in words. */
const METRIC_WORDS: Readonly<Record<string, string>> = {
  cycles: 'cycles',
  periodMean_s: 'mean period',
  floodMean_s: 'mean flood time',
  drainMean_s: 'mean drain time',
  highLevel_m: 'mean high water',
  lowLevel_m: 'mean low water',
  minLevel_m: 'lowest level',
  maxLevel_m: 'highest level',
  lost_m3: 'water lost',
  meanFlow_m3s: 'mean flow',
  dry_s: 'time run dry',
  energy_J: 'energy used',
};

/** A compared metric's name in words. */
export function metricWords(metric: string): string {
  return METRIC_WORDS[metric] ?? metric;
}

/** A compared figure in the reader's units, by the unit the comparison gives it. */
export function compareFigure(
  value: number | null,
  unit: CompareRow['unit'],
  system: UnitSystem,
  signed = false,
): string {
  if (value === null) return '–';
  const sign = signed && value > 0 ? '+' : '';
  switch (unit) {
    case 's':
      return value < 0 ? `−${durationWords(-value)}` : `${sign}${durationWords(value)}`;
    case 'm':
      return sign + formatQuantity(value, 'length', system);
    case 'm3':
      return sign + formatQuantity(value, 'volume', system);
    case 'm3/s':
      return sign + formatQuantity(value, 'flow', system);
    case 'J':
      return `${sign}${Number((value / 3600).toPrecision(3))} Wh`;
    default:
      return `${sign}${Number(value.toPrecision(4))}`;
  }
}

/** Relative change below which two figures count as the same (solver round-off, not design). */
const SAME_WITHIN = 1e-6;

/** True when B differs from A by more than round-off. */
export function materiallyChanged(row: CompareRow): boolean {
  if (row.a === null || row.b === null) return row.a !== row.b;
  const scale = Math.max(Math.abs(row.a), Math.abs(row.b));
  return Math.abs(row.b - row.a) > SAME_WITHIN * scale;
}
