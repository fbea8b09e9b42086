/** Helpers for the sweeps API tests: a signed-in owner with an imported system, and polling. */
import type { Express } from 'express';
import { expect } from 'vitest';
import { SweepSchema, type Sweep } from '../../shared/contracts/sweeps';
import { signedInClient, type TestClient } from '../../server/testing/test-client';
import type { AppContext } from '../../server/app-context';
import { ONE_BED_SYSTEM_FILE } from '../engine-analysis/one-bed-system';

/** A member who owns the one-bed test system (a near-constant pump feeding one gravel bed). */
export async function ownerWithSystem(
  app: Express,
  ctx: AppContext,
): Promise<{ client: TestClient; systemId: string }> {
  const { client } = await signedInClient(app, ctx);
  const res = await client.post('/api/systems/import').send(ONE_BED_SYSTEM_FILE);
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return { client, systemId: (res.body as { id: string }).id };
}

/**
 * How long `waitForSweep` waits for a sweep of a few short cells by default, ms. A test waiting for
 * such a sweep took up to 8 s on the idle 2-core test machine and up to 20 s with both cores busy;
 * 60 s leaves room.
 */
export const SWEEP_WAIT_MS = 60_000;

/**
 * The vitest timeout of a sweeps test that waits for `sweeps` sweeps one after another: each
 * sweep's wait, plus 30 s for the requests around them (sign-in, import, reading cells and runs).
 * Larger than the waits, so a wait that gives up reports the sweep's progress before vitest's own
 * timeout could hide it.
 */
export function sweepsTestTimeoutMs(sweeps = 1): number {
  return sweeps * SWEEP_WAIT_MS + 30_000;
}

/** Polls `GET /api/sweeps/:id?cells=0` until the sweep has ended; then reads it with its cells. */
export async function waitForSweep(
  client: TestClient,
  sweepId: string,
  timeoutMs = SWEEP_WAIT_MS,
): Promise<Sweep> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const head = SweepSchema.parse(
      (await client.get(`/api/sweeps/${sweepId}?cells=0`).expect(200)).body,
    );
    if (head.status !== 'queued' && head.status !== 'running') break;
    if (Date.now() > deadline)
      throw new Error(
        `The sweep is still ${head.status} after ${timeoutMs} ms (${head.cellsDone}/${head.cellsTotal}).`,
      );
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  return SweepSchema.parse((await client.get(`/api/sweeps/${sweepId}`).expect(200)).body);
}
