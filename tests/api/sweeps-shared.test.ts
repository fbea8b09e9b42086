/**
 * With a PostgreSQL server (TEST_DATABASE_URL), sweep cells are pg-boss jobs that every server
 * process on the database works from. Two app contexts over one database stand for two processes,
 * each with its own job workers and run pool.
 */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { SweepSchema } from '../../shared/contracts/sweeps';
import { createApp } from '../../server/app';
import type { AppContext } from '../../server/app-context';
import { PgBossSweepQueue, SWEEP_CHUNK_CELLS } from '../../server/sweeps/pg-boss-sweep-queue';
import { closeSweepQueue, startSweepWorkers, sweepQueueFor } from '../../server/sweeps/sweep-queue';
import { createTestContext, type TestContext } from '../../server/testing/test-context';
import { ownerWithSystem, waitForSweep } from './sweeps-support';

const url = process.env['TEST_DATABASE_URL'];

describe.skipIf(!url)('sweeps shared by several server processes (PostgreSQL job queue)', () => {
  let t: TestContext;
  let other: AppContext;
  beforeEach(async () => {
    t = await createTestContext();
    other = { ...t.ctx, runPool: undefined };
  });
  afterEach(async () => {
    await closeSweepQueue(other);
    await closeSweepQueue(t.ctx);
    await t.close();
  });

  it('lets a second process take chunks of a sweep the first one started, and completes it once', async () => {
    const first = sweepQueueFor(t.ctx);
    const second = sweepQueueFor(other);
    if (!(first instanceof PgBossSweepQueue) || !(second instanceof PgBossSweepQueue))
      throw new Error('expected the pg-boss queue');
    await startSweepWorkers(other);
    const app = createApp(t.ctx);
    const { client, systemId } = await ownerWithSystem(app, t.ctx);
    const steps = 8;
    const started = await client.post(`/api/systems/${systemId}/sweeps`).send({
      axes: [
        { parameter: 'pump-flow-scale', target: 'pump', from: 0.5, to: 2.5, steps: 25 },
        { parameter: 'standpipe-height', target: 'bed', from: '150 mm', to: '240 mm', steps },
      ],
      duration: '1 h',
    });
    expect(started.status, JSON.stringify(started.body)).toBe(202);
    const sweep = await waitForSweep(client, SweepSchema.parse(started.body).id, 240_000);
    expect(sweep).toMatchObject({ status: 'completed', cellsDone: 25 * steps });
    expect(new Set(sweep.cells?.map((c) => c.index)).size).toBe(25 * steps);
    expect(first.chunksRun).toBeGreaterThan(0);
    expect(second.chunksRun).toBeGreaterThan(0);
    expect(first.chunksRun + second.chunksRun).toBe((25 * steps) / SWEEP_CHUNK_CELLS);
  }, 300_000);
});
