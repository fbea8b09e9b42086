import type { RunSeries, RunSummary } from '../../../../shared/contracts/runs';
import type { ChartSeriesSet } from '../../ui/time-series-chart/chart-series';

/** The figures a runs table shows for one run. */
export interface RunFigures {
  /** Cycles of every bed added up. */
  readonly cycles: number;
  /** Mean of the beds' mean periods, s (null when no bed completed a cycle). */
  readonly periodS: number | null;
  /** The lowest level any tank or sump fell to, m above its floor, and where. */
  readonly lowest: { readonly id: string; readonly levelM: number } | null;
}

/** Reads the table figures from a run's summary (beds are the vessels the summary lists as beds). */
export function runFigures(summary: RunSummary): RunFigures {
  const cycles = summary.beds.reduce((sum, bed) => sum + bed.cycles, 0);
  const periods = summary.beds.flatMap((bed) =>
    bed.periodMean_s === null ? [] : [bed.periodMean_s],
  );
  const periodS = periods.length === 0 ? null : periods.reduce((a, b) => a + b, 0) / periods.length;
  const bedIds = new Set(summary.beds.map((bed) => bed.id));
  let lowest: RunFigures['lowest'] = null;
  for (const vessel of summary.vessels) {
    if (bedIds.has(vessel.id) || vessel.minLevel_m === null) continue;
    if (lowest === null || vessel.minLevel_m < lowest.levelM)
      lowest = { id: vessel.id, levelM: vessel.minLevel_m };
  }
  return { cycles, periodS, lowest };
}

/** Which channels a chart shows. */
export type ChartChoice = 'levels' | 'flows';

/**
 * The chart lines of one kind from a run's series: every vessel level for `levels`; pump and drain
 * flows for `flows` (rim and overflow flows are mostly zero and would crowd the chart).
 */
export function chartSet(series: RunSeries, choice: ChartChoice): ChartSeriesSet {
  const channels = series.channels.filter((channel) =>
    choice === 'levels'
      ? channel.kind === 'level'
      : channel.kind === 'flow' &&
        (/^flow:[^.]+$/.test(channel.id) || channel.id.endsWith('.drain')),
  );
  return {
    t_s: series.t_s,
    lines: channels.map((channel) => ({
      id: channel.id,
      label: lineLabel(channel.id),
      values: channel.values,
    })),
  };
}

/** "level:tank" → "tank"; "flow:bed-a.drain" → "bed-a drain"; "flow:pump" → "pump". */
function lineLabel(channelId: string): string {
  const [, where = channelId] = channelId.split(':');
  return where.replace('.', ' ');
}
