/**
 * Sweeps: start one over a system's scenario, read it (with or without cells), list, cancel and
 * delete. No HTTP objects here; errors are HttpErrors.
 */
import type { Logger } from 'pino';
import {
  SweepParametersSchema,
  SweepCellSchema,
  type StartSweepRequest,
  type Sweep,
  type SweepCell,
  type SweepList,
} from '../../shared/contracts/sweeps';
import { parseScenario, type Scenario } from '../../shared/scenario/index';
import type { SessionUser } from '../auth/session-user';
import { requireSystemAccess, type SystemAccessNeed } from '../auth/system-access';
import type { Database } from '../db/database';
import { badRequest, HttpError, notFound } from '../http/http-error';
import { cellCount } from './cell-scenario';
import { resolveSweepParameters } from './resolve-sweep-parameters';
import type { SweepQueue } from './sweep-queue';
import {
  ACTIVE_SWEEP_STATUSES,
  countActiveSweepsOfUser,
  deleteSweepRow,
  endSweep,
  findSweep,
  findSweepHead,
  insertSweep,
  listSweepsOfSystem,
  type SweepHeadRow,
  type SweepRow,
} from './sweeps-repository';

/** What the sweeps service works with. */
export interface SweepsDeps {
  db: Database;
  queue: SweepQueue;
  logger: Logger;
}

type User = Pick<SessionUser, 'id'>;

/** Sweeps one user may have queued or running at once. */
export const MAX_ACTIVE_SWEEPS_PER_USER = 1;

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** The normalised scenario of a stored system, or a 400 naming the fields when it no longer validates. */
export function systemScenario(document: unknown): Scenario {
  const parsed = parseScenario(document);
  if (parsed.success) return parsed.scenario;
  const fields = parsed.issues.map((i) => ({
    path: i.path ? `scenario.${i.path}` : 'scenario',
    message: i.message,
  }));
  throw badRequest('The system has scenario problems to fix first.', fields);
}

function storedCells(value: unknown): SweepCell[] {
  if (typeof value !== 'object' || value === null) return [];
  return Object.values(value)
    .map((cell) => SweepCellSchema.parse(cell))
    .sort((a, b) => a.index - b.index);
}

/** The API shape of a sweep row; cells only when the row has them and they are wanted. */
export function toSweep(row: SweepHeadRow | SweepRow, withCells: boolean): Sweep {
  const sweep: Sweep = {
    id: row.id,
    systemId: row.systemId,
    status: row.status as Sweep['status'],
    parameters: SweepParametersSchema.parse(row.parameters),
    cellsTotal: row.cellsTotal,
    cellsDone: row.cellsDone,
    progress: row.cellsTotal > 0 ? Math.min(1, row.cellsDone / row.cellsTotal) : 0,
    error: row.error,
    createdAt: row.createdAt.toISOString(),
    finishedAt: row.finishedAt ? row.finishedAt.toISOString() : null,
  };
  return withCells && 'cells' in row ? { ...sweep, cells: storedCells(row.cells) } : sweep;
}

/** Loads a sweep the user may use as `need` on its system; 404 when absent or not visible. */
export async function requireSweep(
  db: Database,
  user: User,
  sweepId: string,
  need: SystemAccessNeed,
): Promise<SweepHeadRow> {
  const row = UUID.test(sweepId) ? await findSweepHead(db, sweepId) : undefined;
  if (!row) throw notFound('That sweep');
  try {
    await requireSystemAccess(db, user, row.systemId, need);
  } catch (error) {
    if (error instanceof HttpError && error.status === 404) throw notFound('That sweep');
    throw error;
  }
  return row;
}

/** A sweep left going by a server that stopped is marked failed when read (PGlite: no one resumes it). */
async function settleOrphan(deps: SweepsDeps, row: SweepHeadRow): Promise<SweepHeadRow> {
  const active = (ACTIVE_SWEEP_STATUSES as readonly string[]).includes(row.status);
  if (!active || !deps.queue.orphansWhenStopped || deps.queue.isRunningHere(row.id)) return row;
  const error = 'The server stopped during this sweep; start it again.';
  if (await endSweep(deps.db, row.id, 'failed', error)) return { ...row, status: 'failed', error };
  return (await findSweepHead(deps.db, row.id)) ?? row;
}

/** `POST /api/systems/:id/sweeps`: stores the sweep and queues its cells; answers at once. */
export async function startSweep(
  deps: SweepsDeps,
  user: User,
  systemId: string,
  request: StartSweepRequest,
): Promise<Sweep> {
  const { system } = await requireSystemAccess(deps.db, user, systemId, 'write');
  const scenario = systemScenario(system.scenario);
  const parameters = resolveSweepParameters(scenario, request);
  if ((await countActiveSweepsOfUser(deps.db, user.id)) >= MAX_ACTIVE_SWEEPS_PER_USER) {
    throw new HttpError(
      429,
      'TOO_MANY_SWEEPS',
      'You already have a sweep going; wait for it to end or cancel it.',
    );
  }
  const snapshot: unknown = JSON.parse(JSON.stringify(scenario));
  const row = await insertSweep(deps.db, {
    systemId,
    createdBy: user.id,
    parameters,
    scenario: snapshot,
    cellsTotal: cellCount(parameters),
  });
  await deps.queue.start(row);
  return toSweep(row, false);
}

/** `GET /api/sweeps/:id`. */
export async function getSweep(
  deps: SweepsDeps,
  user: User,
  sweepId: string,
  withCells: boolean,
): Promise<Sweep> {
  const head = await settleOrphan(deps, await requireSweep(deps.db, user, sweepId, 'read'));
  if (!withCells) return toSweep(head, false);
  const row = await findSweep(deps.db, head.id);
  if (!row) throw notFound('That sweep');
  return toSweep(row, true);
}

/** `GET /api/systems/:id/sweeps`. */
export async function listSweeps(
  deps: SweepsDeps,
  user: User,
  systemId: string,
): Promise<SweepList> {
  await requireSystemAccess(deps.db, user, systemId, 'read');
  const rows = await Promise.all(
    (await listSweepsOfSystem(deps.db, systemId)).map((row) => settleOrphan(deps, row)),
  );
  return { items: rows.map((row) => toSweep(row, false)) };
}

/** `POST /api/sweeps/:id/cancel`: ends a going sweep as cancelled (its recorded cells kept). */
export async function cancelSweep(deps: SweepsDeps, user: User, sweepId: string): Promise<Sweep> {
  const row = await requireSweep(deps.db, user, sweepId, 'write');
  if (await endSweep(deps.db, row.id, 'cancelled', null)) await deps.queue.cancel(row.id);
  const after = await findSweepHead(deps.db, row.id);
  if (!after) throw notFound('That sweep');
  return toSweep(after, false);
}

/** `DELETE /api/sweeps/:id`: stops it if it is going, then deletes it. */
export async function deleteSweep(deps: SweepsDeps, user: User, sweepId: string): Promise<void> {
  const row = await requireSweep(deps.db, user, sweepId, 'write');
  await endSweep(deps.db, row.id, 'cancelled', null);
  await deps.queue.cancel(row.id);
  await deleteSweepRow(deps.db, row.id);
}
