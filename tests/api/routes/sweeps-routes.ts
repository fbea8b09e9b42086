/**
 * Route table entries: the operating window (sweeps and inflow windows). The fixture stores an
 * ended two-cell sweep of the systems group's system (cells written directly, not run: these tests
 * are about who may call what).
 */
import { parseScenario } from '../../../shared/scenario/index';
import type { SweepCell } from '../../../shared/contracts/sweeps';
import { resolveSweepParameters } from '../../../server/sweeps/resolve-sweep-parameters';
import {
  completeSweepIfDone,
  insertSweep,
  recordCells,
} from '../../../server/sweeps/sweeps-repository';
import { findSystemAccess } from '../../../server/auth/system-access';
import type { RouteFixture, RouteGroup } from '../route-table';

const read = { need: 'read', shareable: true } as const;
const write = { need: 'write', shareable: true } as const;

/** A two-cell sweep of the pump's flow scale (10 simulated minutes per cell). */
export const SMALL_SWEEP_REQUEST = {
  axes: [{ parameter: 'pump-flow-scale' as const, target: 'pump', from: 0.8, to: 1.2, steps: 2 }],
  duration: '10 min',
};

async function storedSweep(f: RouteFixture, systemId: string): Promise<string> {
  const access = await findSystemAccess(f.ctx.db, f.owner.id, systemId);
  const parsed = parseScenario(access?.system.scenario);
  if (!parsed.success) throw new Error('The systems fixture has an invalid scenario.');
  const parameters = resolveSweepParameters(parsed.scenario, SMALL_SWEEP_REQUEST);
  const row = await insertSweep(f.ctx.db, {
    systemId,
    createdBy: f.owner.id,
    parameters,
    scenario: parsed.scenario,
    cellsTotal: 2,
  });
  const cell = (index: number): SweepCell => ({
    index,
    regime: 'cycling',
    cycles: 3,
    periodS: 500,
    floodS: 250,
    drainS: 250,
    inflowM3PerS: 3e-4,
    verdict: 'ok',
  });
  await recordCells(f.ctx.db, row.id, [cell(0), cell(1)]);
  await completeSweepIfDone(f.ctx.db, row.id);
  return row.id;
}

/** Sweeps follow their system's owner and shares: viewers read, editors also start, cancel, delete and open cells. */
export const sweepsRoutes: RouteGroup = {
  name: 'sweeps',
  fixture: async (f) => {
    const systemId = f.params['systemId'];
    if (!systemId) throw new Error('The sweeps fixture needs the systems fixture first.');
    f.params['sweepId'] = await storedSweep(f, systemId);
  },
  routes: [
    {
      method: 'post',
      path: '/api/systems/:systemId/sweeps',
      access: 'signed-in',
      ownership: write,
      body: () => SMALL_SWEEP_REQUEST,
      okStatus: 202,
      fuzzRuns: 10,
    },
    {
      method: 'get',
      path: '/api/systems/:systemId/sweeps',
      access: 'signed-in',
      ownership: read,
      okStatus: 200,
    },
    {
      method: 'get',
      path: '/api/systems/:systemId/inflow-window',
      access: 'signed-in',
      ownership: read,
      okStatus: 200,
    },
    {
      method: 'get',
      path: '/api/sweeps/:sweepId',
      access: 'signed-in',
      ownership: read,
      okStatus: 200,
    },
    {
      method: 'post',
      path: '/api/sweeps/:sweepId/cancel',
      access: 'signed-in',
      ownership: write,
      okStatus: 200,
    },
    {
      method: 'delete',
      path: '/api/sweeps/:sweepId',
      access: 'signed-in',
      ownership: write,
      okStatus: 204,
    },
    {
      method: 'post',
      path: '/api/sweeps/:sweepId/cell-runs',
      access: 'signed-in',
      ownership: write,
      body: () => ({ index: 1 }),
      okStatus: 201,
      fuzzRuns: 5,
    },
  ],
};
