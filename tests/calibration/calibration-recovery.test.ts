/**
 * Calibration end to end: a level log made by the engine with known coefficients plus 1 mm of
 * noise is uploaded, calibrated through the API (the fit runs in a worker thread), and the known
 * coefficients come back within a stated tolerance; the values are kept on the system with who
 * and when; a run compared with the log shows the measured and simulated cycles side by side.
 */
import type { Express } from 'express';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import {
  CalibrationSchema,
  CurrentCalibrationSchema,
  MeasurementComparisonSchema,
  MeasurementSchema,
  type Calibration,
} from '../../shared/contracts/measurements';
import { RunSchema } from '../../shared/contracts/runs';
import { SystemSchema, type System } from '../../shared/contracts/systems';
import { EXAMPLE_SCENARIO_FILE } from '../../shared/scenario/index';
import { createApp } from '../../server/app';
import { applyCalibration } from '../../server/measurements/apply-calibration';
import { defaultRunPoolOptions, RunPool } from '../../server/runs/run-pool';
import { signedInClient, type TestClient } from '../../server/testing/test-client';
import { createTestContext, type TestContext } from '../../server/testing/test-context';
import { exampleScenario, measuredLog } from './measured-log';

/**
 * Tolerance on each recovered coefficient: 5 %. With 1 mm noise on a 2 s log of 13 cycles the
 * fit's own standard errors are 1–2 %; the knee detector's small bias on the high mark moves k_p
 * by about 1.5 %.
 */
const TOLERANCE = 0.05;
const TRUTH = { primingCoefficient: 0.55, dischargeLossMultiplier: 1.6, flowScale: 0.85 };

function fitted(calibration: Calibration, key: keyof typeof TRUTH): number {
  const parameter = calibration.parameters.find((p) => p.key === key);
  if (!parameter) throw new Error(`No ${key} in the calibration.`);
  return parameter.fitted;
}

describe('calibration against a log made with known coefficients', () => {
  let t: TestContext;
  let pool: RunPool;
  let app: Express;
  let owner: TestClient;
  let system: System;

  beforeEach(async () => {
    t = await createTestContext();
    pool = new RunPool({ ...defaultRunPoolOptions(2), size: 1 });
    const ctx = { ...t.ctx, runPool: pool };
    app = createApp(ctx);
    owner = (await signedInClient(app, ctx, { name: 'Cal Ibrator' })).client;
    system = SystemSchema.parse(
      (await owner.post('/api/systems').send({ name: 'Bench', scenario: EXAMPLE_SCENARIO_FILE }))
        .body,
    );
  });
  afterEach(async () => {
    await pool.close();
    await t.close();
  });

  async function uploadLog(): Promise<string> {
    const { csv } = measuredLog({
      truth: [
        { key: 'primingCoefficient', target: 'bed-a', value: TRUTH.primingCoefficient },
        { key: 'dischargeLossMultiplier', target: 'bed-a', value: TRUTH.dischargeLossMultiplier },
        { key: 'flowScale', target: 'pump', value: TRUTH.flowScale },
      ],
      noiseM: 0.001,
      intervalS: 2,
      skipS: 1800,
      durationS: 2.5 * 3600,
      mountingHeightM: 0.4,
      seed: 2024,
    });
    const options = {
      time: { column: 'time', timeZone: 'Europe/Lisbon' },
      level: { kind: 'distance', column: 'distance_mm', unit: 'mm', mountingHeight: '400 mm' },
      bed: 'bed-a',
    };
    const res = await owner
      .post(`/api/systems/${system.id}/measurements`)
      .field('options', JSON.stringify(options))
      .attach('file', Buffer.from(csv), 'bench.csv');
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    return MeasurementSchema.parse(res.body).id;
  }

  it('recovers k_p, the drain-loss multiplier and the pump flow scale within 5 % and keeps them on the system', async () => {
    const measurementId = await uploadLog();
    const res = await owner.post(`/api/systems/${system.id}/calibrations`).send({
      measurementIds: [measurementId],
      fit: { primingCoefficient: true, dischargeLossMultiplier: true, flowScale: true },
      apply: true,
    });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const calibration = CalibrationSchema.parse(res.body);
    expect(calibration.fit.status).toBe('converged');
    for (const key of Object.keys(TRUTH) as (keyof typeof TRUTH)[]) {
      expect(Math.abs(fitted(calibration, key) / TRUTH[key] - 1), key).toBeLessThan(TOLERANCE);
      const parameter = calibration.parameters.find((p) => p.key === key);
      expect(parameter?.standardError, key).toBeGreaterThan(0);
    }
    expect(calibration.fit.chiSquareAfter).toBeLessThan(
      (calibration.fit.chiSquareBefore ?? 0) / 100,
    );
    const drain = calibration.fit.residuals.find((r) => r.metric === 'drain');
    expect(Math.abs(drain?.normalised ?? 99)).toBeLessThan(1);
    expect(Math.abs((drain?.before ?? 0) - (drain?.measured ?? 0))).toBeGreaterThan(60);

    const current = CurrentCalibrationSchema.parse(
      (await owner.get(`/api/systems/${system.id}/calibration`)).body,
    ).calibration;
    expect(current).toMatchObject({
      calibrationId: calibration.id,
      appliedBy: { name: 'Cal Ibrator' },
    });
    expect(Date.now() - Date.parse(current?.appliedAt ?? '')).toBeLessThan(120_000);
    const stored = SystemSchema.parse((await owner.get(`/api/systems/${system.id}`)).body);
    const calibrated = applyCalibration(exampleScenario(), stored.calibration);
    const bed = calibrated.vessels.find((v) => v.id === 'bed-a');
    expect(
      bed?.kind === 'bed' && bed.drain.type === 'bell-siphon' && bed.drain.primingCoefficient,
    ).toBeCloseTo(fitted(calibration, 'primingCoefficient'), 12);
    expect(calibrated.pumps[0]?.flowScale).toBeCloseTo(fitted(calibration, 'flowScale'), 12);
  });

  it('compares the log with a run of the uncalibrated system, aligned on a priming', async () => {
    const measurementId = await uploadLog();
    const run = RunSchema.parse(
      (await owner.post(`/api/systems/${system.id}/runs`).send({ duration: '2 h' })).body,
    );
    const res = await owner
      .get(`/api/measurements/${measurementId}/compare`)
      .query({ run: run.id });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const comparison = MeasurementComparisonSchema.parse(res.body);
    expect(comparison.bed).toBe('bed-a');
    const drain = comparison.rows.find((r) => r.metric === 'drain');
    // The log's drain is slower (loss multiplier 1.6, weaker pump): the model drains faster.
    expect(drain?.difference).toBeLessThan(-60);
    expect(comparison.measured.cycles).toBeGreaterThanOrEqual(10);
    expect(comparison.simulated.cycles).toBeGreaterThanOrEqual(5);
    // After the shift, the measured peak of the first complete cycle sits on the run's second
    // priming (its first steady cycle).
    const primes = (run.events ?? [])
      .filter((e) => e.kind === 'primed' && e.where === 'bed-a')
      .map((e) => e.t_s);
    const secondPrime = primes[1] ?? Number.NaN;
    const near = (comparison.measuredSeries?.t_s ?? [])
      .map((t, i) => ({ t, y: comparison.measuredSeries?.level_m[i] ?? 0 }))
      .filter((p) => Math.abs(p.t - secondPrime) < 120);
    expect(near.length).toBeGreaterThan(50);
    const peak = near.reduce((a, b) => (b.y > a.y ? b : a));
    expect(Math.abs(peak.t - secondPrime)).toBeLessThan(6);
    expect(comparison.offsetS).toBeGreaterThan(0);
  });
});
