import type { SizingCheck } from '../../../../shared/contracts/sizing';
import { type UnitSystem, formatQuantity } from '../../../../shared/scenario';

/** A check's value and limit in the reader's units. */
export interface CheckReading {
  readonly value: string;
  readonly limit: string;
}

function reading(value: number | null, unit: SizingCheck['unit'], system: UnitSystem): string {
  if (value === null) return '—';
  switch (unit) {
    case 'm':
      return formatQuantity(value, 'length', system);
    case 'm3':
      return formatQuantity(value, 'volume', system);
    case 's':
      return value < 120
        ? `${Number(value.toPrecision(3))} s`
        : `${Number((value / 60).toPrecision(3))} min`;
    case 'per-hour':
      return `${Number(value.toPrecision(3))} /h`;
    case 'ratio':
      return `${Number(value.toPrecision(3))} : 1`;
    case 'count':
      return String(value);
    case 'kg':
      return system === 'us'
        ? `${Number((value * 2.20462).toPrecision(3))} lb`
        : `${Number(value.toPrecision(3))} kg`;
    case 'Pa':
      return system === 'us'
        ? `${Number((value * 0.0208854).toPrecision(3))} lb/ft²`
        : `${Number((value / 1000).toPrecision(3))} kPa`;
  }
}

/** Reads a check's value and limit in the reader's units (lb/ft² and lb for US customary). */
export function readCheck(check: SizingCheck, system: UnitSystem): CheckReading {
  return {
    value: reading(check.value, check.unit, system),
    limit: reading(check.limit, check.unit, system),
  };
}

/** Icon of a verdict status. */
export const STATUS_ICONS = { ok: 'check_circle', warning: 'warning', fails: 'error' } as const;

/** Where each check belongs on the page. */
export const CHECK_GROUPS: readonly { title: string; checks: readonly string[] }[] = [
  {
    title: 'Every bed filling at once',
    checks: ['cold-start-reserve', 'cold-start-pump-dry', 'cold-start-min-level'],
  },
  { title: 'Power cut and restart', checks: ['power-cut-water-lost', 'restart'] },
  { title: 'Leaks', checks: ['pump-line-leak', 'tank-leak-time'] },
  { title: 'Rules of thumb', checks: ['bed-tank-ratio', 'tank-turnover', 'cycles-per-hour'] },
  { title: 'Loads on supports', checks: ['bed-load'] },
];
