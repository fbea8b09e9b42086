/** Turns a run worker's outcome into the compact simulation a lesson stores and shows. */
import { LESSON_LEVEL_MAX_POINTS, type LessonSimulation } from '../../shared/contracts/classroom';
import type { RunJobOutcome } from '../runs/run-worker-messages';
import { decodeSeries, seriesToJson } from '../runs/series-codec';
import { selectSeries } from '../runs/select-series';
import { worstVerdict } from '../runs/worst-verdict';

/**
 * Keeps the status, verdicts, per-bed and per-vessel figures, and the level of every vessel
 * (metres above its floor) thinned to at most `LESSON_LEVEL_MAX_POINTS` samples for a chart.
 */
export function toLessonSimulation(outcome: RunJobOutcome, durationS: number): LessonSimulation {
  const result = outcome.result;
  return {
    status: outcome.status,
    error: outcome.error,
    durationS,
    verdict: result ? worstVerdict(result.verdicts) : null,
    verdicts: result?.verdicts ?? [],
    beds: result?.summary.beds ?? [],
    vessels: result?.summary.vessels ?? [],
    levels: outcome.series ? levelChannels(outcome.series) : { t_s: [], channels: [] },
  };
}

function levelChannels(blob: Uint8Array): LessonSimulation['levels'] {
  const decoded = decodeSeries(blob);
  const levels = decoded.channels.filter((c) => c.kind === 'level').map((c) => c.id);
  const picked = seriesToJson(
    selectSeries(decoded, { channels: levels.join(','), maxPoints: LESSON_LEVEL_MAX_POINTS }),
  );
  return {
    t_s: picked.t_s,
    channels: picked.channels.map((c) => ({ where: c.where, values: c.values })),
  };
}
