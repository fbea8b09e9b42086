/**
 * Calibration from a stopwatch log: the fill and drain times and high mark of the engine's own
 * cycles with known coefficients, typed in as a person would (m:ss, mm), give back those
 * coefficients; applying a second fit keeps the values of the first that it did not refit, and
 * clearing keeps the history.
 */
import type { Express } from 'express';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { simulate } from '../../engine/index';
import {
  CalibrationListSchema,
  CalibrationSchema,
  CurrentCalibrationSchema,
  MeasurementSchema,
  type Calibration,
} from '../../shared/contracts/measurements';
import { SystemSchema, type System } from '../../shared/contracts/systems';
import { EXAMPLE_SCENARIO_FILE } from '../../shared/scenario/index';
import { createApp } from '../../server/app';
import { withCoefficients } from '../../server/measurements/with-coefficients';
import { signedInClient, type TestClient } from '../../server/testing/test-client';
import { createTestContext, type TestContext } from '../../server/testing/test-context';
import { exampleScenario } from './measured-log';

/** Stopwatch reading of a time in seconds, to a tenth: "4:05.3". */
function reading(seconds: number): string {
  const minutes = Math.floor(seconds / 60);
  return `${minutes}:${(seconds - minutes * 60).toFixed(1).padStart(4, '0')}`;
}

/** Tolerance on a coefficient fitted to noise-free but rounded stopwatch figures: 3 %. */
const TOLERANCE = 0.03;

describe('calibration from a stopwatch log', () => {
  let t: TestContext;
  let app: Express;
  let owner: TestClient;
  let system: System;

  beforeEach(async () => {
    t = await createTestContext();
    app = createApp(t.ctx);
    owner = (await signedInClient(app, t.ctx, { name: 'Stella Stopwatch' })).client;
    system = SystemSchema.parse(
      (await owner.post('/api/systems').send({ name: 'Bench', scenario: EXAMPLE_SCENARIO_FILE }))
        .body,
    );
  });
  afterEach(async () => {
    await t.close();
  });

  async function timedLog(): Promise<string> {
    const truth = withCoefficients(exampleScenario(), [
      { key: 'primingCoefficient', target: 'bed-a', value: 0.6 },
      { key: 'dischargeLossMultiplier', target: 'bed-a', value: 1.3 },
    ]);
    const bed = simulate(truth, { durationS: 2 * 3600, outputIntervalS: 60 }).result.summary
      .beds[0];
    if (!bed?.floodMean_s || !bed.drainMean_s || !bed.highLevel_m)
      throw new Error('The truth run did not cycle.');
    const entry = {
      bed: 'bed-a',
      fillTime: reading(bed.floodMean_s),
      drainTime: reading(bed.drainMean_s),
      highMark: `${(bed.highLevel_m * 1000).toFixed(1)} mm`,
    };
    const res = await owner
      .post(`/api/systems/${system.id}/measurements/stopwatch`)
      .send({ name: 'Sunday', entries: [entry, entry] });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    return MeasurementSchema.parse(res.body).id;
  }

  async function calibrate(body: object): Promise<Calibration> {
    const res = await owner.post(`/api/systems/${system.id}/calibrations`).send(body);
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    return CalibrationSchema.parse(res.body);
  }

  it('recovers k_p and the drain-loss multiplier from typed fill and drain times and a high mark', async () => {
    const id = await timedLog();
    const fit = await calibrate({ measurementIds: [id] });
    expect(fit.fit.status).toBe('converged');
    const value = (key: string): number =>
      fit.parameters.find((p) => p.key === key)?.fitted ?? Number.NaN;
    expect(Math.abs(value('primingCoefficient') / 0.6 - 1)).toBeLessThan(TOLERANCE);
    expect(Math.abs(value('dischargeLossMultiplier') / 1.3 - 1)).toBeLessThan(TOLERANCE);
    expect(fit.applied).toBe(false);
    expect(
      CurrentCalibrationSchema.parse(
        (await owner.get(`/api/systems/${system.id}/calibration`)).body,
      ).calibration,
    ).toBeNull();
  });

  it('keeps earlier calibrated values that a later fit did not touch, and keeps every fit after clearing', async () => {
    const id = await timedLog();
    const first = await calibrate({
      measurementIds: [id],
      fit: { primingCoefficient: true, dischargeLossMultiplier: false },
      apply: true,
    });
    const second = await calibrate({
      measurementIds: [id],
      fit: { primingCoefficient: false, dischargeLossMultiplier: true },
      apply: true,
    });
    const current = CurrentCalibrationSchema.parse(
      (await owner.get(`/api/systems/${system.id}/calibration`)).body,
    ).calibration;
    expect(current?.calibrationId).toBe(second.id);
    expect(current?.beds).toEqual([
      {
        bed: 'bed-a',
        primingCoefficient: first.parameters[0]?.fitted,
        dischargeLossMultiplier: second.parameters[0]?.fitted,
      },
    ]);
    expect(current?.appliedBy.name).toBe('Stella Stopwatch');
    expect((await owner.delete(`/api/systems/${system.id}/calibration`)).status).toBe(204);
    expect(
      CurrentCalibrationSchema.parse(
        (await owner.get(`/api/systems/${system.id}/calibration`)).body,
      ).calibration,
    ).toBeNull();
    const history = CalibrationListSchema.parse(
      (await owner.get(`/api/systems/${system.id}/calibrations`)).body,
    ).items;
    expect(history.map((c) => [c.id, c.applied])).toEqual([
      [second.id, false],
      [first.id, false],
    ]);
    const reapplied = await owner.post(`/api/calibrations/${first.id}/apply`).send({});
    expect(CurrentCalibrationSchema.parse(reapplied.body).calibration?.beds[0]).toEqual({
      bed: 'bed-a',
      primingCoefficient: first.parameters[0]?.fitted,
    });
  });
});
