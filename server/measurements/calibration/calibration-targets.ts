/** The measured figures of the chosen measurements, per bed, ready to fit. */
import type { MeasuredSeries, StopwatchEntry } from '../../../shared/contracts/measurements';
import type { Scenario } from '../../../shared/scenario/index';
import { cycleSpreads } from '../cycle-figures';
import { detectLevelCycles } from '../detect-level-cycles';
import { stopwatchSpreads } from '../stopwatch-spreads';
import type { BedTarget } from './calibration-problem';
import { measuredTargets } from './measured-targets';

/** One loaded measurement: a CSV's series or a stopwatch log's entries. */
export type LoadedMeasurement =
  | { id: string; kind: 'csv'; series: MeasuredSeries }
  | { id: string; kind: 'stopwatch'; entries: StopwatchEntry[] };

/**
 * For each measurement and each bed of the scenario it covers: the figures of its complete
 * cycles (a logged bed needs two located drains, i.e. one full flood between them). Series of
 * tanks and sumps are not used.
 */
export function calibrationTargets(
  scenario: Scenario,
  measurements: readonly LoadedMeasurement[],
): BedTarget[] {
  const beds = new Set(scenario.vessels.filter((v) => v.kind === 'bed').map((v) => v.id));
  const targets: BedTarget[] = [];
  for (const m of measurements) {
    if (m.kind === 'csv') {
      for (const series of m.series.beds) {
        if (!beds.has(series.bed)) continue;
        const cycles = detectLevelCycles(series.t_s, series.level_m);
        if (cycles.length >= 2)
          targets.push({
            measurementId: m.id,
            bed: series.bed,
            figures: measuredTargets(cycleSpreads(cycles), 'csv'),
          });
      }
    } else {
      for (const bed of new Set(m.entries.map((e) => e.bed))) {
        if (beds.has(bed))
          targets.push({
            measurementId: m.id,
            bed,
            figures: measuredTargets(stopwatchSpreads(m.entries, bed), 'stopwatch'),
          });
      }
    }
  }
  return targets;
}
