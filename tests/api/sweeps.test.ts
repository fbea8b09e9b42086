/**
 * The operating-window API with the real engine: sweeps over one and two parameters, the map's
 * regimes against the inflow window solved from the flow balance, impossible cells, cancelling,
 * opening a cell as a stored run, validation and limits, and the inflow-window endpoint.
 */
import type { Express } from 'express';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { cyclingInflowWindow, regimeAtInflow } from '../../engine/index';
import { InflowWindowsSchema, SweepSchema, type SweepCell } from '../../shared/contracts/sweeps';
import { ApiErrorSchema } from '../../shared/contracts/api-error';
import { RunSchema } from '../../shared/contracts/runs';
import { createApp } from '../../server/app';
import { closeSweepQueue } from '../../server/sweeps/sweep-queue';
import { createTestContext, type TestContext } from '../../server/testing/test-context';
import { oneBedSystem } from '../engine-analysis/one-bed-system';
import { ownerWithSystem, sweepsTestTimeoutMs, waitForSweep } from './sweeps-support';

// Tests wait for sweeps of real engine runs, so the timeout comes from the sweeps a test waits for
// one after another (at most two, when listing), not from a guess at how fast the machine is.
describe('the operating-window API', { timeout: sweepsTestTimeoutMs(2) }, () => {
  let t: TestContext;
  let app: Express;
  beforeEach(async () => {
    t = await createTestContext();
    app = createApp(t.ctx);
  });
  afterEach(async () => {
    await closeSweepQueue(t.ctx);
    await t.close();
  });

  it('maps a sweep of the pump flow with the regimes the inflow window predicts, and marks the current design', async () => {
    const { client, systemId } = await ownerWithSystem(app, t.ctx);
    const started = await client.post(`/api/systems/${systemId}/sweeps`).send({
      axes: [{ parameter: 'pump-flow-scale', target: 'pump', from: 0.5, to: 2.6, steps: 8 }],
    });
    expect(started.status, JSON.stringify(started.body)).toBe(202);
    const sweep = await waitForSweep(client, SweepSchema.parse(started.body).id);
    expect(sweep).toMatchObject({ status: 'completed', cellsTotal: 8, cellsDone: 8, progress: 1 });
    expect(sweep.parameters.axes[0]?.current).toBe(1);
    expect(sweep.parameters.durationS).toBe(7200);
    const window = cyclingInflowWindow(oneBedSystem(), 'bed');
    if (!window) throw new Error('the test system has a bell siphon');
    const bounds = [window.primingInflowM3PerS, window.breakingInflowM3PerS];
    const clear = (sweep.cells ?? []).filter((c) =>
      bounds.every((b) => Math.abs((c.inflowM3PerS ?? 0) / b - 1) > 0.03),
    );
    expect(clear.length).toBeGreaterThanOrEqual(6);
    expect(clear.map((c) => c.regime)).toEqual(
      clear.map((c) => regimeAtInflow(window, c.inflowM3PerS ?? 0)),
    );
    expect(new Set(clear.map((c) => c.regime))).toEqual(
      new Set(['spill-stall', 'cycling', 'siphon-lock']),
    );
    for (const cell of clear.filter((c) => c.regime === 'cycling')) {
      expect(cell.periodS).toBeCloseTo((cell.floodS ?? 0) + (cell.drainS ?? 0), 0);
    }
  });

  it('runs a 2-D sweep, marking the cells whose intake would sit above the standpipe as impossible', async () => {
    const { client, systemId } = await ownerWithSystem(app, t.ctx);
    const started = await client.post(`/api/systems/${systemId}/sweeps`).send({
      axes: [
        { parameter: 'standpipe-height', target: 'bed', from: '120 mm', to: '240 mm', steps: 3 },
        { parameter: 'intake-height', target: 'bed', from: '20 mm', to: '180 mm', steps: 3 },
      ],
      duration: '30 min',
    });
    expect(started.status, JSON.stringify(started.body)).toBe(202);
    const sweep = await waitForSweep(client, SweepSchema.parse(started.body).id);
    expect(sweep.status).toBe('completed');
    const cells = sweep.cells ?? [];
    expect(cells.map((c) => c.index)).toEqual([0, 1, 2, 3, 4, 5, 6, 7, 8]);
    const at = (i: number, j: number): SweepCell | undefined => cells[i + 3 * j];
    expect(at(0, 2)?.regime).toBe('invalid');
    expect(at(0, 2)?.error).toMatch(/vessels\[1\]\.drain\.bell/);
    expect(at(1, 2)?.regime).toBe('invalid');
    expect(at(2, 2)?.regime).not.toBe('invalid');
    expect(at(1, 0)?.regime).not.toBe('invalid');
    expect(sweep.parameters.axes.map((a) => a.current)).toEqual([0.22, 0.025]);
  });

  it('cancels a sweep: it stops, keeps the cells done, and records nothing more', async () => {
    const { client, systemId } = await ownerWithSystem(app, t.ctx);
    const started = await client.post(`/api/systems/${systemId}/sweeps`).send({
      axes: [{ parameter: 'pump-flow-scale', target: 'pump', from: 0.5, to: 2.5, steps: 50 }],
      duration: '24 h',
    });
    const id = SweepSchema.parse(started.body).id;
    const cancelled = SweepSchema.parse(
      (await client.post(`/api/sweeps/${id}/cancel`).expect(200)).body,
    );
    expect(cancelled.status).toBe('cancelled');
    await new Promise((resolve) => setTimeout(resolve, 500));
    const later = SweepSchema.parse((await client.get(`/api/sweeps/${id}`).expect(200)).body);
    expect(later.status).toBe('cancelled');
    expect(later.cellsDone).toBe(cancelled.cellsDone);
    expect(later.cellsDone).toBeLessThan(50);
    expect(later.finishedAt).not.toBeNull();
  });

  it('opens a cell as a stored run of that cell scenario, and gives the same run the second time', async () => {
    const { client, systemId } = await ownerWithSystem(app, t.ctx);
    const started = await client.post(`/api/systems/${systemId}/sweeps`).send({
      axes: [
        { parameter: 'drain-diameter', target: 'bed', from: '20.9 mm', to: '35.1 mm', steps: 3 },
      ],
      duration: '1 h',
    });
    const sweep = await waitForSweep(client, SweepSchema.parse(started.body).id);
    const opened = await client.post(`/api/sweeps/${sweep.id}/cell-runs`).send({ index: 2 });
    expect(opened.status, JSON.stringify(opened.body)).toBe(201);
    const runId = (opened.body as { runId: string }).runId;
    const run = (await client.get(`/api/runs/${runId}?snapshot=1`).expect(200)).body as {
      scenario: {
        vessels: { drain?: { pipe: { innerDiameter: number } } }[];
        run: { duration: number };
      };
    };
    expect(RunSchema.parse(run).status).toBe('completed');
    expect(run.scenario.vessels[1]?.drain?.pipe.innerDiameter).toBeCloseTo(0.0351, 9);
    expect(run.scenario.run.duration).toBe(3600);
    const again = await client
      .post(`/api/sweeps/${sweep.id}/cell-runs`)
      .send({ index: 2 })
      .expect(201);
    expect((again.body as { runId: string }).runId).toBe(runId);
    const reread = SweepSchema.parse(
      (await client.get(`/api/sweeps/${sweep.id}`).expect(200)).body,
    );
    expect(reread.cells?.[2]?.runId).toBe(runId);
    expect((await client.post(`/api/sweeps/${sweep.id}/cell-runs`).send({ index: 3 })).status).toBe(
      400,
    );
  });

  it('refuses unknown parts, quantities of the wrong kind and a second sweep at once, naming the fields', async () => {
    const { client, systemId } = await ownerWithSystem(app, t.ctx);
    const bad = await client.post(`/api/systems/${systemId}/sweeps`).send({
      axes: [
        {
          parameter: 'standpipe-height',
          target: 'no-such-bed',
          from: '10 mm',
          to: '20 mm',
          steps: 2,
        },
        { parameter: 'vessel-volume', target: 'tank', from: '2 h', to: '400 L', steps: 2 },
      ],
    });
    expect(bad.status).toBe(400);
    const paths = ApiErrorSchema.parse(bad.body).error.fields?.map((f) => f.path);
    expect(paths).toEqual(expect.arrayContaining(['axes[0].target', 'axes[1].from']));
    const first = await client.post(`/api/systems/${systemId}/sweeps`).send({
      axes: [{ parameter: 'pump-flow-scale', target: 'pump', from: 0.5, to: 2, steps: 50 }],
      duration: '24 h',
    });
    expect(first.status).toBe(202);
    const second = await client.post(`/api/systems/${systemId}/sweeps`).send({
      axes: [{ parameter: 'pump-flow-scale', target: 'pump', from: 0.5, to: 2, steps: 2 }],
    });
    expect(second.status).toBe(429);
    expect(ApiErrorSchema.parse(second.body).error.code).toBe('TOO_MANY_SWEEPS');
    await client.post(`/api/sweeps/${SweepSchema.parse(first.body).id}/cancel`).expect(200);
  });

  it('answers the inflow window of each bell-siphon bed as the engine solves it', async () => {
    const { client, systemId } = await ownerWithSystem(app, t.ctx);
    const body = InflowWindowsSchema.parse(
      (await client.get(`/api/systems/${systemId}/inflow-window`).expect(200)).body,
    );
    const expected = cyclingInflowWindow(oneBedSystem(), 'bed');
    expect(body.beds).toHaveLength(1);
    expect(body.beds[0]?.primingInflowM3PerS).toBeCloseTo(expected?.primingInflowM3PerS ?? 0, 12);
    expect(body.beds[0]?.breakingInflowM3PerS).toBeCloseTo(expected?.breakingInflowM3PerS ?? 0, 12);
    expect(body.beds[0]?.regime).toBe('cycling');
  });

  it('lists a system’s sweeps newest first, and deletes one', async () => {
    const { client, systemId } = await ownerWithSystem(app, t.ctx);
    const request = {
      axes: [{ parameter: 'valve-opening', target: 'pump', outlet: 0, from: 0.3, to: 1, steps: 2 }],
      duration: '10 min',
    };
    const a = await waitForSweep(
      client,
      SweepSchema.parse((await client.post(`/api/systems/${systemId}/sweeps`).send(request)).body)
        .id,
    );
    const b = await waitForSweep(
      client,
      SweepSchema.parse((await client.post(`/api/systems/${systemId}/sweeps`).send(request)).body)
        .id,
    );
    const list = (await client.get(`/api/systems/${systemId}/sweeps`).expect(200)).body as {
      items: { id: string; cells?: unknown }[];
    };
    expect(list.items.map((s) => s.id)).toEqual([b.id, a.id]);
    expect(list.items[0]?.cells).toBeUndefined();
    await client.delete(`/api/sweeps/${a.id}`).expect(204);
    await client.get(`/api/sweeps/${a.id}`).expect(404);
  });
});
