/**
 * Runs: start one on the worker pool (answered when it ends for short runs, at once for long or
 * `async` ones), read, list, cancel and delete. No HTTP objects here; errors are HttpErrors.
 */
import type { Logger } from 'pino';
import {
  RUN_SYNC_MAX_DURATION_S,
  type Run,
  type RunList,
  type RunListQuery,
  type RunStarted,
  type RunWithSnapshot,
  type StartRunRequest,
} from '../../shared/contracts/runs';
import { parseQuantity, parseScenario, type Scenario } from '../../shared/scenario/index';
import { applyCalibration } from '../measurements/apply-calibration';
import type { SessionUser } from '../auth/session-user';
import { requireSystemAccess, type SystemAccessNeed } from '../auth/system-access';
import type { Database } from '../db/database';
import { badRequest, HttpError, notFound } from '../http/http-error';
import { storeRunOutcome } from './store-run-outcome';
import { RunQueueFullError, type RunPool } from './run-pool';
import {
  activeRunIdsOfSystem,
  countActiveRunsOfUser,
  deleteRunRow,
  findRun,
  insertRun,
  listRunsOfSystem,
  markRunRunning,
  type RunRow,
} from './runs-repository';
import { toRun, toRunListItem } from './to-run';
import { refreshLastVerdict } from './refresh-last-verdict';

/** What the runs service works with. */
export interface RunsDeps {
  db: Database;
  pool: RunPool;
  logger: Logger;
}

type User = Pick<SessionUser, 'id'>;

/** How a start was answered: the ended run (201) or a handle to poll (202). */
export type StartRunResult = { kind: 'ended'; run: Run } | { kind: 'started'; started: RunStarted };

/** The run's simulated duration, s: the request's, else the scenario's; checked against the limit. */
export function chooseDurationS(
  request: StartRunRequest,
  scenario: Scenario,
  maxDurationS: number,
): number {
  let durationS = scenario.run.duration;
  if (request.duration !== undefined) {
    const parsed = parseQuantity(request.duration, 'time', 'duration');
    if (!parsed.success) throw badRequest(parsed.issue.message, [parsed.issue]);
    durationS = parsed.value;
  }
  if (!(durationS > 0) || durationS > maxDurationS) {
    const days = maxDurationS / 86400;
    throw badRequest(`A run lasts more than 0 s and at most ${days} days of simulated time.`, [
      { path: 'duration', message: `Choose a duration between 0 and ${days} days.` },
    ]);
  }
  return durationS;
}

/** The normalised scenario of a system, or a 400 naming the fields when it no longer validates. */
function normalisedScenario(document: unknown): Scenario {
  const parsed = parseScenario(document);
  if (parsed.success) return parsed.scenario;
  const fields = parsed.issues.map((i) => ({
    path: i.path ? `scenario.${i.path}` : 'scenario',
    message: i.message,
  }));
  throw badRequest('The system has scenario problems to fix before it can run.', fields);
}

/** Checks the per-user limit before a run is queued. (Long runs get a coarser series from the engine.) */
async function checkRunLimits(deps: RunsDeps, user: User): Promise<void> {
  const { maxActivePerUser } = deps.pool.options;
  if ((await countActiveRunsOfUser(deps.db, user.id)) >= maxActivePerUser) {
    throw new HttpError(
      429,
      'TOO_MANY_RUNS',
      `You already have ${maxActivePerUser} runs going; wait for one to end or cancel one.`,
    );
  }
}

/** `POST /api/systems/:id/runs`. */
export async function startRun(
  deps: RunsDeps,
  user: User,
  systemId: string,
  request: StartRunRequest,
): Promise<StartRunResult> {
  const { system } = await requireSystemAccess(deps.db, user, systemId, 'write');
  // Calibrated coefficients fitted from the user's measurements apply to every later run.
  const scenario = applyCalibration(normalisedScenario(system.scenario), system.calibration);
  const durationS = chooseDurationS(request, scenario, deps.pool.options.maxDurationS);
  const outputIntervalS = scenario.run.outputInterval;
  await checkRunLimits(deps, user);
  // The snapshot is exactly what the worker runs: JSON round-tripped, with the duration used.
  const snapshot: unknown = JSON.parse(
    JSON.stringify({ ...scenario, run: { ...scenario.run, duration: durationS } }),
  );
  const row = await insertRun(deps.db, {
    systemId: system.id,
    createdBy: user.id,
    durationS,
    systemVersion: system.version,
    scenario: snapshot,
  });
  const options = { durationS, outputIntervalS, maxSamples: deps.pool.options.maxSamples };
  let ended: Promise<void>;
  try {
    ended = deps.pool.submit({
      id: row.id,
      scenario: snapshot,
      options,
      onStart: () =>
        void markRunRunning(deps.db, row.id).catch((error: unknown) =>
          deps.logger.error({ err: error }, 'marking a run running failed'),
        ),
      onEnd: (outcome) => storeRunOutcome(deps.db, deps.logger, row, outcome, options),
    });
  } catch (error) {
    if (!(error instanceof RunQueueFullError)) throw error;
    await deleteRunRow(deps.db, row.id);
    throw new HttpError(503, error.code, error.message, undefined, { 'Retry-After': '60' });
  }
  if (request.async !== true && durationS <= RUN_SYNC_MAX_DURATION_S) {
    await ended;
    return { kind: 'ended', run: await getRunOrThrow(deps, row.id) };
  }
  return {
    kind: 'started',
    started: { id: row.id, status: 'queued', progress: deps.pool.status(row.id)?.progress ?? 0 },
  };
}

async function getRunOrThrow(deps: RunsDeps, runId: string): Promise<Run> {
  const row = await findRun(deps.db, runId);
  if (!row) throw notFound('That run');
  return toRun(row, deps.pool);
}

/** Loads a run the user may use as `need` on its system; 404 when absent or not visible. */
export async function requireRun(
  db: Database,
  user: User,
  runId: string,
  need: SystemAccessNeed,
): Promise<RunRow> {
  const uuid = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
  const row = uuid.test(runId) ? await findRun(db, runId) : undefined;
  if (!row) throw notFound('That run');
  try {
    await requireSystemAccess(db, user, row.systemId, need);
  } catch (error) {
    if (error instanceof HttpError && error.status === 404) throw notFound('That run');
    throw error;
  }
  return row;
}

/** `GET /api/runs/:id`, with the normalised scenario snapshot when asked. */
export async function getRun(
  deps: RunsDeps,
  user: User,
  runId: string,
  withSnapshot = false,
): Promise<Run | RunWithSnapshot> {
  const row = await requireRun(deps.db, user, runId, 'read');
  const run = toRun(row, deps.pool);
  return withSnapshot ? { ...run, scenario: row.scenario as Record<string, unknown> } : run;
}

/** `GET /api/systems/:id/runs`. */
export async function listRuns(
  deps: RunsDeps,
  user: User,
  systemId: string,
  query: RunListQuery,
): Promise<RunList> {
  await requireSystemAccess(deps.db, user, systemId, 'read');
  const { rows, total } = await listRunsOfSystem(deps.db, systemId, query);
  return {
    items: rows.map((row) => toRunListItem(row, deps.pool)),
    total,
    page: query.page,
    pageSize: query.pageSize,
  };
}

/** `POST /api/runs/:id/cancel`: stops a queued or running run (partial result kept); an ended run is returned as is. */
export async function cancelRun(deps: RunsDeps, user: User, runId: string): Promise<Run> {
  const row = await requireRun(deps.db, user, runId, 'write');
  if (row.status === 'queued' || row.status === 'running') {
    const here = await deps.pool.cancel(row.id);
    if (!here) {
      // Left over from a server that stopped: nothing runs it any more.
      await storeRunOutcome(deps.db, deps.logger, row, {
        status: 'cancelled',
        error: 'Cancelled.',
        result: null,
        series: null,
        sampleCount: 0,
        wallMs: 0,
      });
    }
  }
  return getRunOrThrow(deps, row.id);
}

/** `DELETE /api/runs/:id`: cancels it if it is going, deletes it, and refreshes the system's last verdict. */
export async function deleteRun(deps: RunsDeps, user: User, runId: string): Promise<void> {
  const row = await requireRun(deps.db, user, runId, 'write');
  await deps.pool.cancel(row.id);
  await deleteRunRow(deps.db, row.id);
  await refreshLastVerdict(deps.db, row.systemId);
}

/** Cancels every run of a system that is still going (before the system is deleted). */
export async function cancelRunsOfSystem(deps: RunsDeps, systemId: string): Promise<void> {
  const ids = await activeRunIdsOfSystem(deps.db, systemId);
  await Promise.all(ids.map((id) => deps.pool.cancel(id)));
}
