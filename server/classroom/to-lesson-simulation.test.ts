import { describe, expect, it } from 'vitest';
import { LESSON_LEVEL_MAX_POINTS, LessonSimulationSchema } from '../../shared/contracts/classroom';
import type { RunJobOutcome } from '../runs/run-worker-messages';
import { encodeSeries } from '../runs/series-codec';
import { toLessonSimulation } from './to-lesson-simulation';

function outcomeWithSeries(n: number): RunJobOutcome {
  const t = Float64Array.from({ length: n }, (_, i) => i * 5);
  const level = Float64Array.from({ length: n }, (_, i) => 0.5 - i * 1e-4);
  const series = encodeSeries({
    t_s: t,
    channels: [
      { id: 'level:tank', kind: 'level', where: 'tank', unit: 'm', values: level },
      {
        id: 'flow:pump',
        kind: 'flow',
        where: 'pump',
        unit: 'm3/s',
        values: new Float64Array(n).fill(3e-4),
      },
    ],
  });
  return {
    status: 'completed',
    error: null,
    result: {
      summary: {
        beds: [
          {
            id: 'bed',
            cycles: 4,
            periodMean_s: 612,
            floodMean_s: 500,
            drainMean_s: 112,
            highLevel_m: 0.25,
            lowLevel_m: 0.03,
            state: 'cycling',
          },
        ],
        vessels: [{ id: 'tank', minLevel_m: 0.41, minLevelAt_s: 100, maxLevel_m: 0.5, lost_m3: 0 }],
        pumps: [],
      },
      events: [],
      verdicts: [
        {
          check: 'fish-safe level',
          status: 'ok',
          value: 0.41,
          limit: 0.4,
          source: 'common practice',
        },
        { check: 'siphon', status: 'warning', value: null, limit: null, source: 'model' },
      ],
      stats: { steps: 1, rejected: 0, rhsEvaluations: 6, events: 0, wall_ms: 1 },
      massBalanceError: 0,
    },
    series: new Uint8Array(series),
    sampleCount: n,
    wallMs: 1,
  };
}

describe('toLessonSimulation', () => {
  it('keeps the figures and verdicts, the worst verdict and only the level channels, thinned', () => {
    const simulation = LessonSimulationSchema.parse(
      toLessonSimulation(outcomeWithSeries(2001), 10_000),
    );
    expect(simulation.verdict).toBe('warning');
    expect(simulation.beds[0]?.periodMean_s).toBe(612);
    expect(simulation.vessels[0]?.minLevel_m).toBe(0.41);
    expect(simulation.levels.channels.map((c) => c.where)).toEqual(['tank']);
    expect(simulation.levels.t_s).toHaveLength(LESSON_LEVEL_MAX_POINTS);
    expect(simulation.levels.t_s[0]).toBe(0);
    expect(simulation.levels.t_s.at(-1)).toBe(10_000);
    expect(simulation.levels.channels[0]?.values.at(-1)).toBeCloseTo(0.3, 12);
  });

  it('keeps a failed run without a result as empty figures with its error', () => {
    const failed: RunJobOutcome = {
      status: 'failed',
      error: 'Stopped at the time limit.',
      result: null,
      series: null,
      sampleCount: 0,
      wallMs: 0,
    };
    expect(toLessonSimulation(failed, 60)).toEqual({
      status: 'failed',
      error: 'Stopped at the time limit.',
      durationS: 60,
      verdict: null,
      verdicts: [],
      beds: [],
      vessels: [],
      levels: { t_s: [], channels: [] },
    });
  });
});
