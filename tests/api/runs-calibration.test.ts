/** A system's applied calibration (fitted from measurements) is what its later runs simulate. */
import { eq } from 'drizzle-orm';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { RunWithSnapshotSchema } from '../../shared/contracts/runs';
import type { Scenario } from '../../shared/scenario/index';
import { systems } from '../../server/db/schema';
import {
  createRunsWorld,
  createSystem,
  runsTestTimeoutMs,
  runSystem,
  type RunsWorld,
} from './runs-support';

// The test waits for a real engine run in a worker thread: its timeout comes from the pool's
// wall-time limit, not from a guess at how fast the machine is.
describe('runs of a calibrated system', { timeout: runsTestTimeoutMs() }, () => {
  let w: RunsWorld;
  beforeEach(async () => {
    w = await createRunsWorld();
  });
  afterEach(async () => {
    await w.close();
  });

  it('simulate the calibrated priming coefficient, drain-loss multiplier and pump flow scale', async () => {
    const system = await createSystem(w.owner);
    await w.t.ctx.db
      .update(systems)
      .set({
        calibration: {
          calibrationId: '00000000-0000-4000-8000-000000000001',
          beds: [{ bed: 'bed-a', primingCoefficient: 0.43, dischargeLossMultiplier: 1.7 }],
          pumps: [{ pump: 'pump', flowScale: 0.8 }],
          appliedAt: new Date().toISOString(),
          appliedBy: { id: w.ownerUser.id, name: 'Rita Runner' },
        },
      })
      .where(eq(systems.id, system.id));
    const run = await runSystem(w.owner, system.id, { duration: 1800 });
    const stored = RunWithSnapshotSchema.parse(
      (await w.owner.get(`/api/runs/${run.id}?snapshot=1`)).body,
    );
    const snapshot = stored.scenario as unknown as Scenario;
    const bed = snapshot.vessels.find((v) => v.id === 'bed-a');
    expect(
      bed?.kind === 'bed' && bed.drain.type === 'bell-siphon' && bed.drain.primingCoefficient,
    ).toBe(0.43);
    expect(bed?.kind === 'bed' && bed.drain.dischargeLossMultiplier).toBe(1.7);
    expect(snapshot.pumps[0]?.flowScale).toBe(0.8);
  });
});
