/** The table of differences between two runs' summaries and verdicts (`GET /api/runs/compare`). */
import type {
  CompareRow,
  RunComparison,
  RunSummary,
  Verdict,
  VerdictChange,
} from '../../shared/contracts/runs';

/** The result parts of one run that a comparison reads (null when the run produced none). */
export interface ComparedResult {
  summary: RunSummary | null;
  verdicts: Verdict[] | null;
}

type Metric = readonly [key: string, unit: string];

const BED_METRICS: readonly Metric[] = [
  ['cycles', ''],
  ['periodMean_s', 's'],
  ['floodMean_s', 's'],
  ['drainMean_s', 's'],
  ['highLevel_m', 'm'],
  ['lowLevel_m', 'm'],
];
const VESSEL_METRICS: readonly Metric[] = [
  ['minLevel_m', 'm'],
  ['maxLevel_m', 'm'],
  ['lost_m3', 'm3'],
];
const PUMP_METRICS: readonly Metric[] = [
  ['meanFlow_m3s', 'm3/s'],
  ['dry_s', 's'],
  ['energy_J', 'J'],
];

type Row = { id: string } & Record<string, unknown>;

const numberOrNull = (value: unknown): number | null =>
  typeof value === 'number' && Number.isFinite(value) ? value : null;

/** Ids of `a` in order, then those only in `b`. */
function unionIds(a: readonly Row[], b: readonly Row[]): string[] {
  const ids = a.map((r) => r.id);
  for (const r of b) if (!ids.includes(r.id)) ids.push(r.id);
  return ids;
}

/** One row per (item, metric) present in either run. */
export function compareRows(
  a: readonly Row[],
  b: readonly Row[],
  metrics: readonly Metric[],
): CompareRow[] {
  const rows: CompareRow[] = [];
  for (const id of unionIds(a, b)) {
    const left = a.find((r) => r.id === id);
    const right = b.find((r) => r.id === id);
    for (const [metric, unit] of metrics) {
      const va = numberOrNull(left?.[metric]);
      const vb = numberOrNull(right?.[metric]);
      rows.push({
        where: id,
        metric,
        unit,
        a: va,
        b: vb,
        delta: va !== null && vb !== null ? vb - va : null,
        changed: va !== vb,
      });
    }
  }
  return rows;
}

/** One row per verdict check present in either run, with its status in each. */
export function compareVerdicts(a: readonly Verdict[], b: readonly Verdict[]): VerdictChange[] {
  const checks = a.map((v) => v.check);
  for (const v of b) if (!checks.includes(v.check)) checks.push(v.check);
  return checks.map((check) => {
    const va = a.find((v) => v.check === check)?.status ?? null;
    const vb = b.find((v) => v.check === check)?.status ?? null;
    return { check, a: va, b: vb, changed: va !== vb };
  });
}

/** Compares two runs' results; the caller fills in which run is which (`a`, `b`). */
export function compareRuns(a: ComparedResult, b: ComparedResult): Omit<RunComparison, 'a' | 'b'> {
  const beds = (r: ComparedResult): Row[] => r.summary?.beds ?? [];
  const bedStates = unionIds(beds(a), beds(b)).map((where) => {
    const stateOf = (r: ComparedResult): string | null => {
      const state = beds(r).find((row) => row.id === where)?.['state'];
      return typeof state === 'string' ? state : null;
    };
    const sa = stateOf(a);
    const sb = stateOf(b);
    return { where, a: sa, b: sb, changed: sa !== sb };
  });
  return {
    beds: compareRows(beds(a), beds(b), BED_METRICS),
    bedStates,
    vessels: compareRows(a.summary?.vessels ?? [], b.summary?.vessels ?? [], VESSEL_METRICS),
    pumps: compareRows(a.summary?.pumps ?? [], b.summary?.pumps ?? [], PUMP_METRICS),
    verdicts: compareVerdicts(a.verdicts ?? [], b.verdicts ?? []),
  };
}
