/** Shared set-up of the runs API tests: an app with its own run pool, a signed-in owner and a system. */
import type { Express } from 'express';
import { expect } from 'vitest';
import { RunSchema, type Run } from '../../shared/contracts/runs';
import { SystemSchema, type System } from '../../shared/contracts/systems';
import { EXAMPLE_SCENARIO_FILE } from '../../shared/scenario/index';
import { createApp } from '../../server/app';
import { defaultRunPoolOptions, RunPool, type RunPoolOptions } from '../../server/runs/run-pool';
import { signedInClient, type TestClient } from '../../server/testing/test-client';
import { createTestContext, type TestContext } from '../../server/testing/test-context';
import type { User } from '../../shared/contracts/auth';

/** One test's world. */
export interface RunsWorld {
  t: TestContext;
  pool: RunPool;
  app: Express;
  owner: TestClient;
  ownerUser: User;
  close(): Promise<void>;
}

/** A fresh database, a one-worker pool (limits overridable) and a signed-in owner. */
export async function createRunsWorld(pool: Partial<RunPoolOptions> = {}): Promise<RunsWorld> {
  const t = await createTestContext();
  const runPool = new RunPool({ ...defaultRunPoolOptions(2), size: 1, ...pool });
  const ctx = { ...t.ctx, runPool };
  const app = createApp(ctx);
  const { client, user } = await signedInClient(app, ctx, { name: 'Rita Runner' });
  return {
    t,
    pool: runPool,
    app,
    owner: client,
    ownerUser: user,
    close: async () => {
      await runPool.close();
      await t.close();
    },
  };
}

/** The example scenario file (one bed, one pump, a 670 L tank), optionally changed. */
export function exampleScenario(
  change: (s: Record<string, unknown>) => void = () => {},
): Record<string, unknown> {
  const scenario = structuredClone(EXAMPLE_SCENARIO_FILE) as Record<string, unknown>;
  change(scenario);
  return scenario;
}

/** Creates a system as `client`. */
export async function createSystem(
  client: TestClient,
  scenario = exampleScenario(),
  name = 'One bed',
): Promise<System> {
  const res = await client.post('/api/systems').send({ name, scenario });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return SystemSchema.parse(res.body);
}

/** Runs a system synchronously (201) and returns the ended run. */
export async function runSystem(
  client: TestClient,
  systemId: string,
  body: object = { duration: '30 min' },
): Promise<Run> {
  const res = await client.post(`/api/systems/${systemId}/runs`).send(body);
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return RunSchema.parse(res.body);
}

/** Polls `GET /api/runs/:id` until `done(run)`; returns that run. */
export async function pollRun(
  client: TestClient,
  runId: string,
  done: (run: Run) => boolean,
  timeoutMs = 60_000,
): Promise<Run> {
  const end = Date.now() + timeoutMs;
  for (;;) {
    const run = RunSchema.parse((await client.get(`/api/runs/${runId}`)).body);
    if (done(run)) return run;
    if (Date.now() > end)
      throw new Error(`Run ${runId} still ${run.status} after ${timeoutMs} ms.`);
    await new Promise((r) => setTimeout(r, 50));
  }
}
