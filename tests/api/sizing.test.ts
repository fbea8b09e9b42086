/**
 * The sizing checks and the build sheet through the API with the real engine: the greenhouse
 * demonstration system (in metric and in US customary words), a one-bed system short of water, and
 * the cut list's arithmetic.
 */
import { readFileSync } from 'node:fs';
import type { Express } from 'express';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { pumpDutyPoints } from '../../engine/index';
import { ApiErrorSchema } from '../../shared/contracts/api-error';
import { MeResponseSchema } from '../../shared/contracts/auth';
import {
  BuildSheetSchema,
  SizingReportSchema,
  type SizingCheck,
} from '../../shared/contracts/sizing';
import { parseScenario } from '../../shared/scenario';
import { withChanges } from '../../shared/scenario/testing/with-changes';
import { createApp } from '../../server/app';
import { signedInClient, type TestClient } from '../../server/testing/test-client';
import { createTestContext, type TestContext } from '../../server/testing/test-context';
import { ONE_BED_SYSTEM_FILE } from '../engine-analysis/one-bed-system';

const GREENHOUSE = JSON.parse(
  readFileSync(new URL('../../scenarios/greenhouse-three-beds.json', import.meta.url), 'utf8'),
) as object;

async function importSystem(client: TestClient, file: object): Promise<string> {
  const res = await client.post('/api/systems/import').send(file);
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return (res.body as { id: string }).id;
}

const find = (checks: readonly SizingCheck[], check: string, subject?: string): SizingCheck => {
  const found = checks.find(
    (c) => c.check === check && (subject === undefined || c.subject === subject),
  );
  if (!found)
    throw new Error(
      `no ${check} check${subject ? ` for ${subject}` : ''} in ${checks.map((c) => c.check).join(', ')}`,
    );
  return found;
};

describe('sizing checks and the build sheet', () => {
  let t: TestContext;
  let app: Express;
  beforeEach(async () => {
    t = await createTestContext();
    app = createApp(t.ctx);
  });
  afterEach(async () => {
    await t.close();
  });

  it('checks the greenhouse: enough water for a cold start, nothing lost in a power cut, a restart, loads and rules of thumb', async () => {
    const { client } = await signedInClient(app, t.ctx);
    const id = await importSystem(client, GREENHOUSE);
    const report = SizingReportSchema.parse(
      (await client.get(`/api/systems/${id}/sizing`).expect(200)).body,
    );
    const { checks } = report;
    expect(find(checks, 'cold-start-reserve', 'sump-pump').status).toBe('ok');
    expect(find(checks, 'cold-start-pump-dry', 'sump-pump')).toMatchObject({
      status: 'ok',
      value: 0,
    });
    expect(find(checks, 'cold-start-min-level', 'tank').status).toBe('ok');
    expect(find(checks, 'power-cut-water-lost')).toMatchObject({ status: 'ok', value: 0 });
    expect(find(checks, 'restart')).toMatchObject({ status: 'ok', value: 3, limit: 3 });
    for (const bed of ['bed-north', 'bed-middle', 'bed-south']) {
      expect(find(checks, 'cycles-per-hour', bed).status).toBe('ok');
      const load = report.loads.find((l) => l.bedId === bed);
      expect(load?.pressureAtRimPa).toBeCloseTo(
        ((load?.totalAtRimKg ?? 0) * 9.80665) / (load?.footprintM2 ?? 1),
        6,
      );
      expect(find(checks, 'bed-load', bed).detail).toMatch(/qualified person/);
    }
    // Turnover: the outlet into the tank at the starting levels, per tank volume, per hour.
    const parsed = parseScenario(GREENHOUSE);
    if (!parsed.success) throw new Error('the greenhouse example is valid');
    const [duty] = pumpDutyPoints(parsed.scenario);
    const toTank =
      duty?.outletDestinations.reduce(
        (sum, to, i) => sum + (to === 'tank' ? (duty.outletFlowsM3PerS[i] ?? 0) : 0),
        0,
      ) ?? 0;
    const tank = parsed.scenario.vessels.find((v) => v.id === 'tank');
    if (tank?.shape.type !== 'box') throw new Error('the greenhouse tank is a box');
    const tankM3 = tank.shape.length * tank.shape.width * tank.height;
    expect(find(checks, 'tank-turnover', 'tank').value).toBeCloseTo((toTank * 3600) / tankM3, 9);
    expect(report.assumptions.powerCutDurationS).toBe(3600);
  }, 120_000);

  it('fails a one-bed system whose tank starts too low: the pump runs dry on a cold start', async () => {
    const { client } = await signedInClient(app, t.ctx);
    const file = withChanges(
      { 'vessels[0].initialLevel': '0.1 m', 'vessels[0].minLevel': '0.08 m' },
      ONE_BED_SYSTEM_FILE,
    ) as object;
    const id = await importSystem(client, file);
    const { checks } = SizingReportSchema.parse(
      (await client.get(`/api/systems/${id}/sizing?leakDiameter=5%20mm`).expect(200)).body,
    );
    const reserve = find(checks, 'cold-start-reserve', 'pump');
    expect(reserve.status).toBe('fails');
    expect(reserve.value).toBeGreaterThan(reserve.limit ?? Infinity);
    expect(find(checks, 'cold-start-pump-dry', 'pump').status).toBe('fails');
    expect(find(checks, 'cold-start-min-level', 'tank').status).toBe('fails');
    // The intake (50 mm) sits below the minimum (80 mm): a broken pump line drains the tank to it.
    const line = find(checks, 'pump-line-leak', 'tank');
    expect(line.status).toBe('fails');
    expect(line.value).toBeCloseTo(0.05, 3);
    expect(find(checks, 'tank-leak-time', 'tank').title).toMatch(/5 mm hole/);
  }, 120_000);

  it('writes the checks in inches, gallons and pounds once the user picks US customary units, with the same verdicts and values', async () => {
    const { client } = await signedInClient(app, t.ctx);
    const id = await importSystem(client, GREENHOUSE);
    const url = `/api/systems/${id}/sizing?leakDiameter=10%20mm`;
    const metric = SizingReportSchema.parse((await client.get(url).expect(200)).body);
    const me = await client.patch('/api/auth/me').send({ units: 'us' }).expect(200);
    expect(MeResponseSchema.parse(me.body).user.units).toBe('us');
    const us = SizingReportSchema.parse((await client.get(url).expect(200)).body);
    // Exact definitions (NIST SP 811, appendix B): 1 in = 0.0254 m, 1 US gal = 231 in³, 1 lb = 0.45359237 kg.
    const threeDigits = (x: number | null): string => Number((x ?? NaN).toPrecision(3)).toString();
    const inches = (m: number | null) => `${threeDigits((m ?? NaN) / 0.0254)} in`;
    const gallons = (m3: number | null) => `${threeDigits((m3 ?? NaN) / (231 * 0.0254 ** 3))} gal`;
    const level = find(us.checks, 'cold-start-min-level', 'tank');
    expect(level.detail).toContain(
      `tank fell to ${inches(level.value)} (fish-safe minimum ${inches(level.limit)})`,
    );
    const reserve = find(us.checks, 'cold-start-reserve', 'sump-pump');
    expect(reserve.detail).toContain(`takes ${gallons(reserve.value)} from sump`);
    expect(find(us.checks, 'tank-leak-time', 'tank').title).toBe(
      `A ${inches(0.01)} hole at the floor of tank`,
    );
    const north = us.loads.find((l) => l.bedId === 'bed-north');
    expect(find(us.checks, 'bed-load', 'bed-north').detail).toContain(
      `weighs ${threeDigits((north?.totalAtRimKg ?? NaN) / 0.45359237)} lb`,
    );
    for (const check of us.checks) {
      expect(`${check.title} ${check.detail}`).not.toMatch(/\d (?:mm|m²|m|L|kg|kPa)(?=[\s.,;)]|$)/);
    }
    // The metric reader's sentences were in metres; everything but the words is the same.
    expect(find(metric.checks, 'cold-start-min-level', 'tank').detail).toContain(
      `tank fell to ${threeDigits(level.value)} m (fish-safe minimum ${threeDigits(level.limit)} m)`,
    );
    const withoutWords = (checks: readonly SizingCheck[]) =>
      checks.map(({ check, subject, status, value, limit, unit }) => ({
        check,
        subject,
        status,
        value,
        limit,
        unit,
      }));
    expect(withoutWords(us.checks)).toEqual(withoutWords(metric.checks));
  }, 120_000);

  it('refuses a power cut longer than a day, naming the field', async () => {
    const { client } = await signedInClient(app, t.ctx);
    const id = await importSystem(client, ONE_BED_SYSTEM_FILE);
    const res = await client.get(`/api/systems/${id}/sizing?cutDuration=3%20d`);
    expect(res.status).toBe(400);
    expect(ApiErrorSchema.parse(res.body).error.fields?.[0]?.path).toBe('cutDuration');
  });

  it('gives each standpipe a cut length of its height above the floor plus the bulkhead fitting depth', async () => {
    const { client } = await signedInClient(app, t.ctx);
    const id = await importSystem(client, GREENHOUSE);
    const sheet = BuildSheetSchema.parse(
      (await client.get(`/api/systems/${id}/build-sheet`).expect(200)).body,
    );
    expect(sheet.beds.map((b) => b.bedId)).toEqual(['bed-north', 'bed-middle', 'bed-south']);
    for (const bed of sheet.beds) {
      expect(bed.standpipe.cutLengthM).toBeCloseTo(
        bed.standpipe.heightAboveFloorM + bed.standpipe.fittingDepthM,
        12,
      );
      expect(bed.parts.find((p) => p.item === 'Standpipe')?.lengthM).toBe(bed.standpipe.cutLengthM);
    }
    const north = sheet.beds[0];
    expect(north?.standpipe).toMatchObject({
      size: '1 in Schedule 40',
      heightAboveFloorM: 0.25,
      fittingDepthM: 0.0222,
    });
    const entered = BuildSheetSchema.parse(
      (await client.get(`/api/systems/${id}/build-sheet?fittingDepth=30%20mm`).expect(200)).body,
    );
    expect(entered.beds[0]?.standpipe.cutLengthM).toBeCloseTo(0.28, 12);
    expect(entered.beds[0]?.standpipe.fittingDepthSource).toBe('entered');
    const pump = sheet.pumps[0];
    expect(pump?.flowM3PerS).toBeGreaterThan(0);
    expect(pump?.outlets.reduce((sum, o) => sum + o.flowM3PerS, 0)).toBeCloseTo(
      pump?.flowM3PerS ?? 0,
      12,
    );
  });
});
