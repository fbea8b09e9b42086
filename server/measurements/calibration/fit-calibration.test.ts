import { describe, expect, it } from 'vitest';
import type { SimulationOutcome } from '../../../engine/index';
import type { Scenario } from '../../../shared/scenario/index';
import type { CalibrationProblem, FigureTarget } from './calibration-problem';
import { fitCalibration } from './fit-calibration';
import type { SimulateFn } from './model-spreads';

/**
 * A stand-in for the engine with closed-form cycles, so the fit itself is tested fast and
 * exactly: high mark 0.25 + 0.02·k_p^(2/3) m, flood 200/scale + 50·k_p s, drain 100·√mult·(1 + 0.2·scale) s;
 * k_p above 2 never primes (a spill stall).
 */
function figuresOf(kp: number, mult: number, scale: number) {
  return {
    high: 0.25 + 0.02 * kp ** (2 / 3),
    flood: 200 / scale + 50 * kp,
    drain: 100 * Math.sqrt(mult) * (1 + 0.2 * scale),
  };
}

const fakeSimulate: SimulateFn = (scenario, options) => {
  const bed = scenario.vessels[0];
  const kp =
    bed?.kind === 'bed' && bed.drain.type === 'bell-siphon' ? bed.drain.primingCoefficient : 0;
  const mult = bed?.kind === 'bed' ? bed.drain.dischargeLossMultiplier : 1;
  const scale = scenario.pumps[0]?.flowScale ?? 1;
  const { high, flood, drain } = figuresOf(kp, mult, scale);
  const events: SimulationOutcome['result']['events'] = [];
  for (let t = flood; kp <= 2 && t + drain < (options?.durationS ?? 0); t += flood + drain) {
    events.push({ t_s: t, kind: 'primed', where: 'bed', detail: '', values: { levelM: high } });
    events.push({
      t_s: t + drain,
      kind: 'siphon-break',
      where: 'bed',
      detail: '',
      values: { levelM: 0.025 },
    });
  }
  const state = kp <= 2 ? 'cycling' : 'spill-stall';
  const summaryBed = {
    id: 'bed',
    cycles: events.length / 2,
    periodMean_s: null,
    periodMin_s: null,
    periodMax_s: null,
    floodMean_s: null,
    drainMean_s: null,
    highLevel_m: null,
    lowLevel_m: null,
    fractionFlooded: 0,
    state,
  } as const;
  const outcome: SimulationOutcome = {
    status: 'completed',
    result: {
      summary: { beds: [summaryBed], vessels: [], pumps: [] },
      events,
      verdicts: [],
      massBalanceError: 0,
      stats: {
        steps: 0,
        rejected: 0,
        rhsEvaluations: 0,
        events: events.length,
        wall_ms: 0,
        simulated_s: 0,
        eventsOmitted: 0,
      },
      series: { t_s: [], channels: [] },
    },
  };
  return outcome;
};

const scenario = {
  vessels: [
    {
      id: 'bed',
      kind: 'bed',
      drain: { type: 'bell-siphon', primingCoefficient: 0.7, dischargeLossMultiplier: 1 },
    },
  ],
  pumps: [{ id: 'pump', flowScale: 1 }],
  run: { outputInterval: 5 },
} as unknown as Scenario;

function problemFor(
  truth: { kp: number; mult: number; scale: number },
  initialKp = 0.7,
): CalibrationProblem {
  const f = figuresOf(truth.kp, truth.mult, truth.scale);
  const figure = (
    metric: FigureTarget['metric'],
    measured: number,
    sigma: number,
    unit: 's' | 'm',
  ): FigureTarget => ({ metric, unit, measured, sigma, fitted: true });
  return {
    scenario,
    parameters: [
      { key: 'primingCoefficient', target: 'bed', initial: initialKp, lower: 0.05, upper: 5 },
      { key: 'dischargeLossMultiplier', target: 'bed', initial: 1, lower: 0.1, upper: 20 },
      { key: 'flowScale', target: 'pump', initial: 1, lower: 0.2, upper: 3 },
    ],
    targets: [
      {
        measurementId: '00000000-0000-4000-8000-000000000001',
        bed: 'bed',
        figures: [
          figure('flood', f.flood, 1, 's'),
          figure('drain', f.drain, 1, 's'),
          figure('high', f.high, 0.0005, 'm'),
        ],
      },
    ],
    durationS: 6000,
  };
}

const limits = { maxEvaluations: 200, maxIterations: 40, deadlineMs: 60_000 };
const clock = 0;
const now = (): number => clock;

describe('fitCalibration', () => {
  it('recovers exact coefficients from exact figures and reports their standard errors', () => {
    const outcome = fitCalibration(
      problemFor({ kp: 0.5, mult: 2.2, scale: 0.8 }),
      fakeSimulate,
      limits,
      now,
    );
    expect(outcome.fit.status).toBe('converged');
    expect(outcome.values[0]).toBeCloseTo(0.5, 4);
    expect(outcome.values[1]).toBeCloseTo(2.2, 4);
    expect(outcome.values[2]).toBeCloseTo(0.8, 4);
    expect(outcome.fit.chiSquareAfter).toBeLessThan(1e-6);
    expect(outcome.fit.chiSquareBefore).toBeGreaterThan(100);
    expect(outcome.standardErrors.every((se) => se !== null && se > 0 && se < 0.05)).toBe(true);
    expect(outcome.fit.residuals.map((r) => [r.metric, r.fitted])).toEqual([
      ['flood', true],
      ['drain', true],
      ['high', true],
    ]);
    expect(outcome.fit.degreesOfFreedom).toBe(0);
  });

  it('stops at the simulation budget and keeps the best point found', () => {
    const outcome = fitCalibration(
      problemFor({ kp: 0.5, mult: 2.2, scale: 0.8 }),
      fakeSimulate,
      { ...limits, maxEvaluations: 6 },
      now,
    );
    expect(outcome.fit.status).toBe('time-limit');
    expect(outcome.fit.evaluations).toBe(6);
    expect(outcome.fit.chiSquareAfter).toBeLessThanOrEqual(outcome.fit.chiSquareBefore ?? 0);
  });

  it('stops at the deadline on the clock it is given', () => {
    let ticks = 0;
    const slowClock = (): number => (ticks += 1000);
    const outcome = fitCalibration(
      problemFor({ kp: 0.5, mult: 2.2, scale: 0.8 }),
      fakeSimulate,
      { ...limits, deadlineMs: 4500 },
      slowClock,
    );
    expect(outcome.fit.status).toBe('time-limit');
    expect(outcome.fit.evaluations).toBeLessThan(10);
  });

  it('fails, saying why, when the model never cycles near the start', () => {
    const outcome = fitCalibration(
      problemFor({ kp: 0.5, mult: 2.2, scale: 0.8 }, 4),
      fakeSimulate,
      limits,
      now,
    );
    expect(outcome.fit.status).toBe('failed');
    expect(outcome.fit.message).toContain('did not cycle');
  });
});
