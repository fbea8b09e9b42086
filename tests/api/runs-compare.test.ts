/**
 * Runs across users and limits: comparing two runs, who may start and read runs, the wall-time
 * limit, the per-user limit, and deleting a system while its run is going.
 */
import { afterEach, describe, expect, it } from 'vitest';
import { ApiErrorSchema } from '../../shared/contracts/api-error';
import {
  RunComparisonSchema,
  RunListSchema,
  RunSchema,
  RunStartedSchema,
} from '../../shared/contracts/runs';
import { signedInClient } from '../../server/testing/test-client';
import {
  createRunsWorld,
  createSystem,
  exampleScenario,
  pollRun,
  runEndBoundMs,
  runEnded,
  runsTestTimeoutMs,
  runSystem,
  type RunsWorld,
} from './runs-support';

// Every test waits for real engine runs in a worker thread, so the timeout comes from the pool's
// wall-time limit and the runs a test does one after another (at most two), not from a guess at how
// fast the machine is.
describe('runs across users and limits', { timeout: runsTestTimeoutMs(2) }, () => {
  let w: RunsWorld;
  afterEach(async () => {
    await w.close();
  });

  it('compares two runs bed by bed, vessel by vessel and verdict by verdict', async () => {
    w = await createRunsWorld();
    const system = await createSystem(w.owner);
    const a = await runSystem(w.owner, system.id);
    const taller = exampleScenario((s) => {
      const bed = (s['vessels'] as Array<{ drain?: { standpipe: Record<string, unknown> } }>)[1];
      if (bed?.drain) bed.drain.standpipe['height'] = '0.20 m';
      (s['vessels'] as Array<Record<string, unknown>>)[0]!['minLevel'] = '0.54 m';
    });
    const other = await createSystem(w.owner, taller, 'Shorter standpipe');
    const b = await runSystem(w.owner, other.id);
    const res = await w.owner.get(`/api/runs/compare?a=${a.id}&b=${b.id}`);
    expect(res.status).toBe(200);
    const table = RunComparisonSchema.parse(res.body);
    expect(table.a).toMatchObject({ id: a.id, systemName: 'One bed', verdict: 'ok' });
    expect(table.b).toMatchObject({ id: b.id, systemName: 'Shorter standpipe', verdict: 'fails' });
    const period = table.beds.find((r) => r.where === 'bed-a' && r.metric === 'periodMean_s');
    expect(period?.a).toBe(a.summary?.beds[0]?.periodMean_s);
    expect(period?.b).toBe(b.summary?.beds[0]?.periodMean_s);
    expect(period?.changed).toBe(true);
    expect(period?.delta).toBeCloseTo((period?.b ?? 0) - (period?.a ?? 0), 9);
    expect(table.beds.map((r) => r.metric)).toEqual([
      'cycles',
      'periodMean_s',
      'floodMean_s',
      'drainMean_s',
      'highLevel_m',
      'lowLevel_m',
    ]);
    const tankMin = table.vessels.find((r) => r.where === 'tank' && r.metric === 'minLevel_m');
    expect(tankMin?.a).toBe(a.summary?.vessels.find((v) => v.id === 'tank')?.minLevel_m);
    expect(table.verdicts.some((v) => v.changed && v.a === 'ok' && v.b === 'fails')).toBe(true);
    const same = RunComparisonSchema.parse(
      (await w.owner.get(`/api/runs/compare?a=${a.id}&b=${a.id}`)).body,
    );
    expect(
      [...same.beds, ...same.vessels, ...same.pumps].every(
        (r) => !r.changed && (r.delta === null || r.delta === 0),
      ),
    ).toBe(true);
    const bad = await w.owner.get(`/api/runs/compare?a=${a.id}`);
    expect(ApiErrorSchema.parse(bad.body).error.fields?.map((f) => f.path)).toEqual(['b']);
  });

  it('lets a viewer read and compare runs but not start, cancel or delete them; hides them from strangers', async () => {
    w = await createRunsWorld();
    const system = await createSystem(w.owner);
    const run = await runSystem(w.owner, system.id, { duration: '10 min' });
    const viewer = await signedInClient(w.app, w.t.ctx, { name: 'Vic Viewer' });
    await w.owner
      .post(`/api/systems/${system.id}/shares`)
      .send({ email: viewer.user.email, access: 'viewer' });
    expect(RunSchema.parse((await viewer.client.get(`/api/runs/${run.id}`)).body).id).toBe(run.id);
    expect(
      RunListSchema.parse((await viewer.client.get(`/api/systems/${system.id}/runs`)).body).total,
    ).toBe(1);
    expect((await viewer.client.get(`/api/runs/compare?a=${run.id}&b=${run.id}`)).status).toBe(200);
    const start = await viewer.client.post(`/api/systems/${system.id}/runs`).send({});
    expect(start.status).toBe(403);
    expect(ApiErrorSchema.parse(start.body).error.code).toBe('SYSTEM_READ_ONLY');
    expect((await viewer.client.delete(`/api/runs/${run.id}`)).status).toBe(403);
    expect((await viewer.client.post(`/api/runs/${run.id}/cancel`)).status).toBe(403);
    const stranger = await signedInClient(w.app, w.t.ctx, { name: 'Stan Stranger' });
    for (const path of [
      `/api/runs/${run.id}`,
      `/api/runs/${run.id}/series`,
      `/api/runs/${run.id}/series.csv`,
      `/api/runs/compare?a=${run.id}&b=${run.id}`,
    ]) {
      expect((await stranger.client.get(path)).status, path).toBe(404);
    }
    expect((await w.owner.get('/api/runs/not-a-uuid')).status).toBe(404);
  });

  it('fails a run that passes the wall-time limit, saying what to do, and keeps its partial result', async () => {
    // 30 simulated days take seconds; a 5 ms limit stops them early. A long grace lets the engine's
    // own stop (with its partial result) come before the pool's hard kill.
    w = await createRunsWorld({ timeLimitMs: 5, graceMs: 60_000 });
    const system = await createSystem(w.owner);
    const started = RunStartedSchema.parse(
      (await w.owner.post(`/api/systems/${system.id}/runs`).send({ duration: '30 days' })).body,
    );
    const run = await pollRun(w.owner, started.id, runEnded, runEndBoundMs(w.pool.options));
    expect(run.status).toBe('failed');
    expect(run.error).toMatch(/5 ms time limit/);
    expect(run.error).toMatch(/shorten the duration/);
    expect(run.summary).not.toBeNull();
    expect(run.stats?.simulated_s).toBeLessThan(30 * 86400);
  });

  it('refuses a run beyond the per-user limit of runs going at once with 429', async () => {
    w = await createRunsWorld({ maxActivePerUser: 1 });
    const system = await createSystem(w.owner);
    const first = RunStartedSchema.parse(
      (
        await w.owner
          .post(`/api/systems/${system.id}/runs`)
          .send({ duration: '30 days', async: true })
      ).body,
    );
    const second = await w.owner.post(`/api/systems/${system.id}/runs`).send({ duration: 60 });
    expect(second.status).toBe(429);
    expect(ApiErrorSchema.parse(second.body).error.code).toBe('TOO_MANY_RUNS');
    await w.owner.post(`/api/runs/${first.id}/cancel`);
    expect(
      (await w.owner.post(`/api/systems/${system.id}/runs`).send({ duration: 60 })).status,
    ).toBe(201);
  });

  it('cancels the runs of a system that is deleted while they are going', async () => {
    w = await createRunsWorld();
    const system = await createSystem(w.owner);
    const started = RunStartedSchema.parse(
      (
        await w.owner
          .post(`/api/systems/${system.id}/runs`)
          .send({ duration: '30 days', async: true })
      ).body,
    );
    await pollRun(w.owner, started.id, (r) => r.status === 'running');
    expect((await w.owner.delete(`/api/systems/${system.id}`)).status).toBe(204);
    expect(w.pool.status(started.id)).toBeUndefined();
    expect((await w.owner.get(`/api/runs/${started.id}`)).status).toBe(404);
  });
});
