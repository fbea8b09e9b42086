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

/** The pool settings of a runs world: the server's defaults for 2 cores, one worker, `overrides`. */
export function runsWorldPoolOptions(overrides: Partial<RunPoolOptions> = {}): RunPoolOptions {
  return { ...defaultRunPoolOptions(2), size: 1, ...overrides };
}

/**
 * Time a fresh pool's worker thread may take to load the engine through tsx before it takes its
 * first job, ms. Measured 1.3-2.1 s on the idle 2-core test machine and 3.7-5.1 s with both cores
 * busy; 30 s leaves room for a machine loaded harder than that.
 */
const WORKER_START_ALLOWANCE_MS = 30_000;

/**
 * Time a test may spend on its requests and database work around the engine (sign-in, creating a
 * system, storing a result with thousands of events, reading and downloading it), ms. Measured up
 * to 14 s on the 2-core test machine with both cores busy; 30 s leaves room.
 */
const REQUESTS_ALLOWANCE_MS = 30_000;

/**
 * The longest one run can stay queued or running on an otherwise idle one-worker pool, ms: the
 * worker's start, then the pool's wall-time limit (the engine stops there) and the grace period
 * after which the pool ends the job itself. A run that has not ended by then is a defect.
 */
export function runEndBoundMs(options: RunPoolOptions = runsWorldPoolOptions()): number {
  return WORKER_START_ALLOWANCE_MS + options.timeLimitMs + options.graceMs;
}

/**
 * The vitest timeout of a runs-world test that runs the engine `runs` times one after another (each
 * start answered 201 when the run ends, or polled): one worker start, each run's time limit and
 * grace, and the requests around them. Larger than `runEndBoundMs`, so a poll that gives up reports
 * the run's status before vitest's own timeout could hide it.
 */
export function runsTestTimeoutMs(runs = 1, overrides: Partial<RunPoolOptions> = {}): number {
  const { timeLimitMs, graceMs } = runsWorldPoolOptions(overrides);
  return WORKER_START_ALLOWANCE_MS + runs * (timeLimitMs + graceMs) + REQUESTS_ALLOWANCE_MS;
}

/** A fresh database, a one-worker pool (limits overridable) and a signed-in owner. */
export async function createRunsWorld(pool: Partial<RunPoolOptions> = {}): Promise<RunsWorld> {
  const t = await createTestContext();
  const runPool = new RunPool(runsWorldPoolOptions(pool));
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

/** Whether a run has ended (completed, stopped, failed or cancelled). */
export const runEnded = (run: Run): boolean => run.status !== 'queued' && run.status !== 'running';

/**
 * Polls `GET /api/runs/:id` until `done(run)`; returns that run. Gives up, naming the run's status,
 * after `timeoutMs` (by default the longest a run of a default runs world can take).
 */
export async function pollRun(
  client: TestClient,
  runId: string,
  done: (run: Run) => boolean,
  timeoutMs = runEndBoundMs(),
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
