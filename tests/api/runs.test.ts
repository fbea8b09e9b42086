/**
 * The runs API end to end with the real engine in worker threads: synchronous and polled runs,
 * stored results, the reproduction of a result from its stored snapshot, series as JSON and CSV,
 * the result download, limits, cancel, listing and the system's last verdict.
 */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { ApiErrorSchema } from '../../shared/contracts/api-error';
import {
  RUN_EVENTS_SHOWN,
  RunListSchema,
  RunResultFileSchema,
  RunSchema,
  RunSeriesSchema,
  RunStartedSchema,
  RunWithSnapshotSchema,
} from '../../shared/contracts/runs';
import { SystemListSchema, SystemSchema } from '../../shared/contracts/systems';
import type { Scenario } from '../../shared/scenario/index';
import { simulate } from '../../engine/index';
import {
  createRunsWorld,
  createSystem,
  exampleScenario,
  pollRun,
  runEnded,
  runsTestTimeoutMs,
  runSystem,
  type RunsWorld,
} from './runs-support';

// Every test waits for real engine runs in a worker thread, so the timeout comes from the pool's
// wall-time limit and the runs a test does one after another (at most three, when listing runs),
// not from a guess at how fast the machine is.
describe('runs API', { timeout: runsTestTimeoutMs(3) }, () => {
  let w: RunsWorld;
  beforeEach(async () => {
    w = await createRunsWorld();
  });
  afterEach(async () => {
    await w.close();
  });

  it('runs a short simulation synchronously (201) and stores its result, verdicts and series', async () => {
    const system = await createSystem(w.owner);
    const res = await w.owner.post(`/api/systems/${system.id}/runs`).send({ duration: '30 min' });
    expect(res.status).toBe(201);
    const run = RunSchema.parse(res.body);
    expect(res.headers['location']).toBe(`/api/runs/${run.id}`);
    expect(run).toMatchObject({
      systemId: system.id,
      systemVersion: 1,
      status: 'completed',
      progress: 1,
      durationS: 1800,
      error: null,
    });
    expect(run.summary?.beds.map((b) => b.id)).toEqual(['bed-a']);
    expect(run.summary?.beds[0]?.cycles).toBeGreaterThan(0);
    expect(run.verdicts?.length).toBeGreaterThan(0);
    expect(run.events?.some((e) => e.kind === 'primed' && e.where === 'bed-a')).toBe(true);
    expect(run.sampleCount).toBeGreaterThan(300);
    expect(run.eventCount).toBe(run.events?.length);
    expect(run.massBalanceError).toBeLessThan(1e-6);
    expect(run.stats?.wall_ms).toBeGreaterThanOrEqual(0);
    expect(RunSchema.parse((await w.owner.get(`/api/runs/${run.id}`)).body)).toEqual(run);
  });

  it("stores a snapshot that reproduces the run's result exactly when simulated again", async () => {
    const system = await createSystem(w.owner);
    const run = await runSystem(w.owner, system.id, { duration: 2400 });
    const stored = RunWithSnapshotSchema.parse(
      (await w.owner.get(`/api/runs/${run.id}?snapshot=1`)).body,
    );
    const snapshot = stored.scenario as unknown as Scenario;
    expect(snapshot.run.duration).toBe(2400);
    expect(
      snapshot.vessels[1]?.kind === 'bed' &&
        snapshot.vessels[1].drain.type === 'bell-siphon' &&
        snapshot.vessels[1].drain.primingCoefficient,
    ).toBeGreaterThan(0);
    const maxSamples = stored.stats?.maxSamples;
    expect(maxSamples).toBe(w.pool.options.maxSamples);
    const again = simulate(snapshot, {
      durationS: snapshot.run.duration,
      outputIntervalS: snapshot.run.outputInterval,
      maxSamples,
    });
    const file = RunResultFileSchema.parse(
      JSON.parse((await w.owner.get(`/api/runs/${run.id}/result.json`)).text),
    );
    const viaJson = <T>(value: T): T => JSON.parse(JSON.stringify(value)) as T;
    expect(again.status).toBe('completed');
    expect(viaJson(again.result.summary)).toEqual(stored.summary);
    expect(viaJson(again.result.verdicts)).toEqual(stored.verdicts);
    expect(viaJson(again.result.events)).toEqual(stored.events);
    expect(again.result.massBalanceError).toBe(stored.massBalanceError);
    expect(file.series?.t_s).toEqual(again.result.series.t_s);
    expect(file.series?.channels.map((c) => c.values)).toEqual(
      again.result.series.channels.map((c) => c.values),
    );
  });

  it('takes the duration as seconds or with a unit, and names the field when it is wrong', async () => {
    const system = await createSystem(w.owner);
    expect((await runSystem(w.owner, system.id, { duration: '0.25 h' })).durationS).toBe(900);
    expect((await runSystem(w.owner, system.id, { duration: 600 })).durationS).toBe(600);
    const wrongUnit = await w.owner
      .post(`/api/systems/${system.id}/runs`)
      .send({ duration: '3 m' });
    expect(wrongUnit.status).toBe(400);
    expect(ApiErrorSchema.parse(wrongUnit.body).error.fields).toEqual([
      { path: 'duration', message: expect.stringMatching(/time/) },
    ]);
    const tooLong = await w.owner
      .post(`/api/systems/${system.id}/runs`)
      .send({ duration: '40 days' });
    const tooLongError = ApiErrorSchema.parse(tooLong.body).error;
    expect(tooLongError).toMatchObject({
      code: 'VALIDATION_FAILED',
      fields: [{ path: 'duration' }],
    });
    expect(tooLongError.message).toMatch(/at most 30 days/);
    const extra = await w.owner
      .post(`/api/systems/${system.id}/runs`)
      .send({ duration: 60, speed: 'fast' });
    expect(extra.status).toBe(400);
  });

  it('serves the series as chart JSON (all, chosen channels, thinned) and refuses an unknown channel', async () => {
    const system = await createSystem(w.owner);
    const run = await runSystem(w.owner, system.id);
    const all = RunSeriesSchema.parse((await w.owner.get(`/api/runs/${run.id}/series`)).body);
    expect(all.t_s.length).toBe(run.sampleCount);
    expect(all.t_s[0]).toBe(0);
    expect(all.t_s.at(-1)).toBe(1800);
    expect(all.channels.map((c) => c.id)).toEqual(
      expect.arrayContaining(['level:tank', 'level:bed-a', 'phase:bed-a']),
    );
    const tank = all.channels.find((c) => c.id === 'level:tank');
    expect(tank).toMatchObject({ kind: 'level', where: 'tank', unit: 'm' });
    const levels = (tank?.values ?? []).filter((v): v is number => v !== null);
    const tankSummary = run.summary?.vessels.find((v) => v.id === 'tank');
    expect(Math.max(...levels)).toBeLessThanOrEqual(0.55);
    expect(Math.min(...levels)).toBeGreaterThanOrEqual(tankSummary?.minLevel_m ?? Number.NaN);
    const picked = RunSeriesSchema.parse(
      (await w.owner.get(`/api/runs/${run.id}/series?channels=level:bed-a&maxPoints=50`)).body,
    );
    expect(picked.channels.map((c) => c.id)).toEqual(['level:bed-a']);
    expect(picked.t_s).toHaveLength(50);
    expect(picked.t_s.at(-1)).toBe(1800);
    const unknown = await w.owner.get(`/api/runs/${run.id}/series?channels=level:pond`);
    expect(unknown.status).toBe(400);
    expect(ApiErrorSchema.parse(unknown.body).error.message).toContain('level:pond');
  });

  it('exports the series as CSV with a t_s header and one row per sample, equal to the JSON', async () => {
    const system = await createSystem(w.owner);
    const run = await runSystem(w.owner, system.id, { duration: '10 min' });
    const res = await w.owner.get(`/api/runs/${run.id}/series.csv`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    expect(res.headers['content-disposition']).toMatch(
      /^attachment; filename="?run-.*-series\.csv"?$/,
    );
    const json = RunSeriesSchema.parse((await w.owner.get(`/api/runs/${run.id}/series`)).body);
    const lines = res.text.trimEnd().split('\n');
    expect(lines[0]).toBe(['t_s', ...json.channels.map((c) => c.id)].join(','));
    expect(lines).toHaveLength(run.sampleCount + 1);
    const middle = Math.floor(run.sampleCount / 2);
    const cells = (lines[middle + 1] ?? '').split(',').map(Number);
    expect(cells).toEqual([json.t_s[middle], ...json.channels.map((c) => c.values[middle])]);
  });

  it('offers the whole result as a JSON download', async () => {
    const system = await createSystem(w.owner);
    const run = await runSystem(w.owner, system.id, { duration: '10 min' });
    const res = await w.owner.get(`/api/runs/${run.id}/result.json`);
    expect(res.headers['content-disposition']).toMatch(
      /^attachment; filename="?run-.*-result\.json"?$/,
    );
    const file = RunResultFileSchema.parse(JSON.parse(res.text));
    expect(file.run).toMatchObject({ id: run.id, status: 'completed', durationS: 600 });
    expect(file.summary).toEqual(run.summary);
    expect(file.scenario['format']).toBe('scenario/1');
    expect(file.series?.t_s).toHaveLength(run.sampleCount);
  });

  it('answers 202 for an async run, reports progress while it runs, and keeps the event loop free', async () => {
    const system = await createSystem(w.owner);
    const res = await w.owner
      .post(`/api/systems/${system.id}/runs`)
      .send({ duration: '30 days', async: true });
    expect(res.status).toBe(202);
    const started = RunStartedSchema.parse(res.body);
    expect(res.headers['location']).toBe(`/api/runs/${started.id}`);
    const running = await pollRun(
      w.owner,
      started.id,
      (r) => r.status === 'running' && r.progress > 0,
    );
    expect(running.progress).toBeLessThan(1);
    expect(running.summary).toBeNull();
    expect((await w.owner.get('/api/health')).status).toBe(200);
    expect(RunSchema.parse((await w.owner.get(`/api/runs/${started.id}`)).body).status).toBe(
      'running',
    );
    const cancelled = RunSchema.parse((await w.owner.post(`/api/runs/${started.id}/cancel`)).body);
    expect(cancelled).toMatchObject({ status: 'cancelled', progress: 1 });
    expect(cancelled.error).toMatch(/Cancelled/);
    expect(cancelled.summary?.beds[0]?.id).toBe('bed-a');
    const again = RunSchema.parse((await w.owner.post(`/api/runs/${started.id}/cancel`)).body);
    expect(again.status).toBe('cancelled');
  });

  it('answers a long run with 202 even without async, and finishes it in the background', async () => {
    const system = await createSystem(w.owner);
    const res = await w.owner.post(`/api/systems/${system.id}/runs`).send({ duration: '25 h' });
    expect(res.status).toBe(202);
    const started = RunStartedSchema.parse(res.body);
    const ended = await pollRun(w.owner, started.id, runEnded);
    expect(ended).toMatchObject({ status: 'completed', progress: 1, durationS: 25 * 3600 });
  });

  it('carries the first 5000 events of a long run and its event count; the download has them all', async () => {
    const created = await w.owner
      .post('/api/systems')
      .send({ template: 'greenhouse', name: 'Greenhouse' });
    const system = SystemSchema.parse(created.body);
    const res = await w.owner.post(`/api/systems/${system.id}/runs`).send({ duration: '3 days' });
    const started = RunStartedSchema.parse(res.body);
    const run = await pollRun(w.owner, started.id, runEnded);
    expect(run.status, run.error ?? '').toBe('completed');
    expect(run.eventCount).toBeGreaterThan(RUN_EVENTS_SHOWN);
    expect(run.events).toHaveLength(RUN_EVENTS_SHOWN);
    const file = RunResultFileSchema.parse(
      JSON.parse((await w.owner.get(`/api/runs/${run.id}/result.json`)).text),
    );
    expect(file.events).toHaveLength(run.eventCount);
    expect(file.events?.slice(0, RUN_EVENTS_SHOWN)).toEqual(run.events);
  });

  it('lists runs with sort, filters and pages', async () => {
    const system = await createSystem(w.owner);
    for (const duration of [1200, 600, 1800]) await runSystem(w.owner, system.id, { duration });
    const page1 = RunListSchema.parse(
      (await w.owner.get(`/api/systems/${system.id}/runs?sort=durationS&pageSize=2`)).body,
    );
    expect(page1).toMatchObject({ total: 3, page: 1, pageSize: 2 });
    expect(page1.items.map((r) => r.durationS)).toEqual([600, 1200]);
    expect(page1.items[0]).toMatchObject({
      status: 'completed',
      createdByName: 'Rita Runner',
      progress: 1,
    });
    const page2 = RunListSchema.parse(
      (await w.owner.get(`/api/systems/${system.id}/runs?sort=durationS&pageSize=2&page=2`)).body,
    );
    expect(page2.items.map((r) => r.durationS)).toEqual([1800]);
    const newest = RunListSchema.parse((await w.owner.get(`/api/systems/${system.id}/runs`)).body);
    expect(newest.items.map((r) => r.durationS)).toEqual([1800, 600, 1200]);
    const failed = RunListSchema.parse(
      (await w.owner.get(`/api/systems/${system.id}/runs?status=failed`)).body,
    );
    expect(failed).toMatchObject({ total: 0, items: [] });
    const bad = await w.owner.get(`/api/systems/${system.id}/runs?sort=colour&pageSize=1000`);
    expect(
      ApiErrorSchema.parse(bad.body)
        .error.fields?.map((f) => f.path)
        .sort(),
    ).toEqual(['pageSize', 'sort']);
  });

  it("keeps the system's last verdict as the worst status of its latest completed run", async () => {
    const system = await createSystem(w.owner);
    const first = await runSystem(w.owner, system.id);
    expect(first.verdict).toBe('ok');
    const listed = async () => SystemListSchema.parse((await w.owner.get('/api/systems')).body);
    expect((await listed()).items[0]?.lastVerdict).toBe('ok');
    const strict = exampleScenario((s) => {
      (s['vessels'] as Array<Record<string, unknown>>)[0]!['minLevel'] = '0.54 m';
    });
    const saved = SystemSchema.parse(
      (await w.owner.put(`/api/systems/${system.id}`).send({ version: 1, scenario: strict })).body,
    );
    const second = await runSystem(w.owner, system.id);
    expect(second.systemVersion).toBe(saved.version);
    expect(second.verdict).toBe('fails');
    expect(second.verdicts?.find((v) => v.status === 'fails')?.check).toMatch(/tank/);
    expect((await listed()).items[0]?.lastVerdict).toBe('fails');
    expect((await w.owner.delete(`/api/runs/${second.id}`)).status).toBe(204);
    expect((await w.owner.get(`/api/runs/${second.id}`)).status).toBe(404);
    expect((await listed()).items[0]?.lastVerdict).toBe('ok');
    await w.owner.delete(`/api/runs/${first.id}`);
    expect((await listed()).items[0]?.lastVerdict).toBeNull();
  });
});
