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

/** Polls `GET /api/sweeps/:id?cells=0` until the sweep has ended; then reads it with its cells. */
export async function waitForSweep(
  client: TestClient,
  sweepId: string,
  timeoutMs = 60_000,
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
