/**
 * The systems-table figures of a stored scenario document: beds, pumps and the pumps' largest
 * free flow. Reads the raw document (cheap; no full parse per row) and tolerates odd shapes.
 */
import { parseQuantity } from '../../shared/scenario/index';

/** The figures one systems-table row shows. */
export interface SystemFigures {
  bedsCount: number;
  pumpsCount: number;
  /** e.g. "1 pump, up to 2000 L/h" or "No pump". */
  pumpSummary: string;
  /** Sum of each pump's largest datasheet flow, m³/s; null without pumps or readable flows. */
  pumpsMaxFlowM3PerS: number | null;
}

const asArray = (value: unknown): unknown[] => (Array.isArray(value) ? value : []);
const field = (value: unknown, key: string): unknown =>
  typeof value === 'object' && value !== null ? (value as Record<string, unknown>)[key] : undefined;

/** A pump's largest flow, m³/s: `maxFlow`, else the largest curve point's flow. */
function pumpMaxFlowM3PerS(pump: unknown): number | null {
  const candidates = [
    field(pump, 'maxFlow'),
    ...asArray(field(pump, 'curve')).map((p) => field(p, 'flow')),
  ];
  let best: number | null = null;
  for (const value of candidates) {
    if (value === undefined) continue;
    const parsed = parseQuantity(value, 'flow', '');
    if (parsed.success && (best === null || parsed.value > best)) best = parsed.value;
  }
  return best;
}

/** Counts beds and pumps and sums the pumps' maximum flows. */
export function describeSystem(scenario: unknown): SystemFigures {
  const bedsCount = asArray(field(scenario, 'vessels')).filter(
    (v) => field(v, 'kind') === 'bed',
  ).length;
  const pumps = asArray(field(scenario, 'pumps'));
  const flows = pumps.map(pumpMaxFlowM3PerS).filter((q): q is number => q !== null);
  const total = flows.length > 0 ? flows.reduce((a, b) => a + b, 0) : null;
  const litresPerHour = total === null ? null : Math.round(total * 3.6e6);
  const count = pumps.length === 1 ? '1 pump' : `${pumps.length} pumps`;
  const pumpSummary =
    pumps.length === 0
      ? 'No pump'
      : litresPerHour === null
        ? count
        : `${count}, up to ${litresPerHour} L/h${pumps.length > 1 ? ' in all' : ''}`;
  return { bedsCount, pumpsCount: pumps.length, pumpSummary, pumpsMaxFlowM3PerS: total };
}
