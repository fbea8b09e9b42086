/**
 * Opening a cell of the map: a full run of that cell's scenario, stored like any other run of the
 * system (with its series), so the run page can show it. The run is made once per cell and reused.
 */
import type { CellRun, SweepParameters } from '../../shared/contracts/sweeps';
import type { Scenario } from '../../shared/scenario/index';
import type { SessionUser } from '../auth/session-user';
import { requireSystemAccess } from '../auth/system-access';
import { badRequest, HttpError } from '../http/http-error';
import type { RunsDeps } from '../runs/runs-service';
import { RunQueueFullError } from '../runs/run-pool';
import { countActiveRunsOfUser, deleteRunRow, findRun, insertRun } from '../runs/runs-repository';
import { storeRunOutcome } from '../runs/store-run-outcome';
import { cellCount, cellScenario } from './cell-scenario';
import { requireSweep } from './sweeps-service';
import { findSweep, setCellRunId } from './sweeps-repository';

type User = Pick<SessionUser, 'id'>;

function storedRunId(cells: unknown, index: number): string | undefined {
  if (typeof cells !== 'object' || cells === null) return undefined;
  const cell: unknown = (cells as Record<string, unknown>)[String(index)];
  if (typeof cell !== 'object' || cell === null) return undefined;
  const runId: unknown = (cell as { runId?: unknown }).runId;
  return typeof runId === 'string' ? runId : undefined;
}

/** Queues the run and waits for its outcome to be stored. */
async function runToEnd(
  deps: RunsDeps,
  row: { id: string; systemId: string },
  scenario: Scenario,
): Promise<void> {
  const options = {
    durationS: scenario.run.duration,
    outputIntervalS: scenario.run.outputInterval,
    maxSamples: deps.pool.options.maxSamples,
  };
  try {
    await deps.pool.submit({
      id: row.id,
      scenario,
      options,
      onEnd: (outcome) => storeRunOutcome(deps.db, deps.logger, row, outcome, options),
    });
  } catch (error) {
    if (!(error instanceof RunQueueFullError)) throw error;
    await deleteRunRow(deps.db, row.id);
    throw new HttpError(503, error.code, error.message, undefined, { 'Retry-After': '60' });
  }
}

/**
 * `POST /api/sweeps/:id/cell-runs`: the stored run of cell `index` (made now when the cell
 * has none yet, or its run was deleted). Needs write access to the system, like starting a run.
 */
export async function runSweepCell(
  deps: RunsDeps,
  user: User,
  sweepId: string,
  index: number,
): Promise<CellRun> {
  const head = await requireSweep(deps.db, user, sweepId, 'write');
  if (index >= head.cellsTotal) {
    throw badRequest(`Choose a cell index from 0 to ${head.cellsTotal - 1}.`, [
      { path: 'index', message: 'No such cell.' },
    ]);
  }
  const sweep = await findSweep(deps.db, head.id);
  const existing = storedRunId(sweep?.cells, index);
  if (existing && (await findRun(deps.db, existing))) return { runId: existing };
  const parameters = head.parameters as SweepParameters;
  if (cellCount(parameters) !== head.cellsTotal)
    throw new Error('The stored sweep does not match its cell count.');
  const made = cellScenario(head.scenario as Scenario, parameters, index);
  if ('problem' in made)
    throw badRequest(`This cell is not a possible system: ${made.problem}`, [
      { path: 'index', message: made.problem },
    ]);
  const { system } = await requireSystemAccess(deps.db, user, head.systemId, 'write');
  const { maxActivePerUser } = deps.pool.options;
  if ((await countActiveRunsOfUser(deps.db, user.id)) >= maxActivePerUser) {
    throw new HttpError(
      429,
      'TOO_MANY_RUNS',
      `You already have ${maxActivePerUser} runs going; wait for one to end or cancel one.`,
    );
  }
  const snapshot = JSON.parse(JSON.stringify(made.scenario)) as Scenario;
  const row = await insertRun(deps.db, {
    systemId: head.systemId,
    createdBy: user.id,
    durationS: parameters.durationS,
    systemVersion: system.version,
    scenario: snapshot,
  });
  await runToEnd(deps, row, snapshot);
  await setCellRunId(deps.db, head.id, index, row.id);
  return { runId: row.id };
}
