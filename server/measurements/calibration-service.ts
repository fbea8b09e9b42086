/**
 * Calibrations: fit k_p, drain-loss multipliers and pump flow scales to a system's measurements
 * (in a worker thread), keep every fit as history, and apply one fit's values to the system so
 * later runs use them (with who applied them and when).
 */
import {
  CalibratedParameterSchema,
  CalibrationFitSchema,
  StartCalibrationRequestSchema,
  StopwatchEntrySchema,
  SystemCalibrationSchema,
  type Calibration,
  type CalibrationList,
  type CurrentCalibration,
  type SystemCalibration,
} from '../../shared/contracts/measurements';
import type { User } from '../../shared/contracts/auth';
import { requireSystemAccess } from '../auth/system-access';
import type { Database } from '../db/database';
import { badRequest, conflict, notFound } from '../http/http-error';
import { parseOr400 } from '../http/validate';
import { applyCalibration } from './apply-calibration';
import { calibrationParameters } from './calibration/calibration-parameters';
import type { CalibrationProblem } from './calibration/calibration-problem';
import type { CalibrationRunner } from './calibration/calibration-runner';
import { calibrationTargets, type LoadedMeasurement } from './calibration/calibration-targets';
import {
  findCalibrationRow,
  insertCalibration,
  listCalibrationRows,
  setSystemCalibration,
  type CalibrationRow,
} from './calibrations-repository';
import { findMeasurementHead } from './measurements-repository';
import { loadMeasuredSeries } from './measurements-service';
import { systemVessels } from './system-vessels';

/** What the calibration service needs. */
export interface CalibrationDeps {
  db: Database;
  runner: CalibrationRunner;
}

/** Limits of one fit: 120 simulations, 30 iterations, 90 s. */
const FIT_LIMITS = { maxEvaluations: 120, maxIterations: 30, deadlineMs: 90_000 };

function toCalibration(found: CalibrationRow): Calibration {
  const { row } = found;
  return {
    id: row.id,
    systemId: row.systemId,
    measurementIds: Array.isArray(row.measurementIds) ? row.measurementIds.map(String) : [],
    parameters: CalibratedParameterSchema.array().parse(row.parameters),
    fit: CalibrationFitSchema.parse(row.fit),
    applied: row.applied,
    createdBy: row.createdBy,
    createdByName: found.createdByName,
    createdAt: row.createdAt.toISOString(),
  };
}

/** Loads the chosen measurements; each must belong to the system (else a 400 naming it). */
async function loadMeasurements(
  db: Database,
  systemId: string,
  ids: readonly string[],
): Promise<LoadedMeasurement[]> {
  const loaded: LoadedMeasurement[] = [];
  for (const [i, id] of ids.entries()) {
    const head = await findMeasurementHead(db, id);
    if (!head || head.systemId !== systemId) {
      throw badRequest('Choose measurements of this system.', [
        { path: `measurementIds[${i}]`, message: 'Not a measurement of this system.' },
      ]);
    }
    if (head.kind === 'stopwatch')
      loaded.push({
        id,
        kind: 'stopwatch',
        entries: StopwatchEntrySchema.array().parse(head.stopwatch),
      });
    else loaded.push({ id, kind: 'csv', series: await loadMeasuredSeries(db, id) });
  }
  return loaded;
}

/** Builds the problem, or a 400 that says what is missing. */
function buildProblem(
  scenarioDocument: unknown,
  calibration: unknown,
  measurements: LoadedMeasurement[],
  choice: Parameters<typeof calibrationParameters>[2],
): CalibrationProblem {
  const scenario = applyCalibration(systemVessels(scenarioDocument).scenario, calibration);
  const targets = calibrationTargets(scenario, measurements);
  if (targets.length === 0) {
    throw badRequest(
      'No complete cycle of a bed was found in these measurements: a log needs two drains with a full flood between them, a stopwatch log one fill and drain time per bed.',
    );
  }
  const parameters = calibrationParameters(
    scenario,
    [...new Set(targets.map((t) => t.bed))],
    choice,
  );
  if (parameters.length === 0)
    throw badRequest('Choose at least one coefficient to fit (k_p needs a bell-siphon bed).');
  const fitted = targets.reduce((n, t) => n + t.figures.filter((f) => f.fitted).length, 0);
  if (fitted < Math.max(2, parameters.length)) {
    throw badRequest(
      `These measurements give ${fitted} figures to fit, fewer than the ${parameters.length} coefficients chosen; add high marks or another bed, or fit fewer coefficients.`,
    );
  }
  const periods = targets.flatMap((t) =>
    t.figures
      .filter((f) => f.metric === 'period' || f.metric === 'flood' || f.metric === 'drain')
      .map((f) => f.measured),
  );
  // About six cycles after a first fill from the initial level.
  const durationS = Math.max(1200, 7 * Math.max(...periods, 0));
  return { scenario, parameters, targets, durationS };
}

/** `POST /api/systems/:id/calibrations`: fits, stores, and applies when asked (and the fit did not fail). */
export async function startCalibration(
  deps: CalibrationDeps,
  user: User,
  systemId: string,
  body: unknown,
): Promise<Calibration> {
  const { system } = await requireSystemAccess(deps.db, user, systemId, 'write');
  const request = parseOr400(StartCalibrationRequestSchema, body ?? {});
  const measurements = await loadMeasurements(deps.db, system.id, request.measurementIds);
  const problem = buildProblem(system.scenario, system.calibration, measurements, request.fit);
  const outcome = await deps.runner.fit(problem, FIT_LIMITS);
  const parameters = problem.parameters.map((p, i) => ({
    key: p.key,
    target: p.target,
    initial: p.initial,
    fitted: outcome.values[i] ?? p.initial,
    standardError: outcome.standardErrors[i] ?? null,
    lower: p.lower,
    upper: p.upper,
  }));
  const id = await insertCalibration(deps.db, {
    systemId: system.id,
    createdBy: user.id,
    measurementIds: request.measurementIds,
    parameters,
    fit: outcome.fit,
  });
  if (request.apply && outcome.fit.status !== 'failed') await applyFit(deps.db, user, id);
  return getCalibration(deps.db, id);
}

async function getCalibration(db: Database, id: string): Promise<Calibration> {
  const found = await findCalibrationRow(db, id);
  if (!found) throw notFound('That calibration');
  return toCalibration(found);
}

/** `GET /api/systems/:id/calibrations`. */
export async function listCalibrations(
  db: Database,
  user: User,
  systemId: string,
): Promise<CalibrationList> {
  await requireSystemAccess(db, user, systemId, 'read');
  return { items: (await listCalibrationRows(db, systemId)).map(toCalibration) };
}

/** Merges a fit's values into the applied set (other beds and pumps keep theirs). */
function mergedCalibration(current: unknown, fit: Calibration, user: User): SystemCalibration {
  const previous = SystemCalibrationSchema.safeParse(current);
  const beds = new Map((previous.success ? previous.data.beds : []).map((b) => [b.bed, { ...b }]));
  const pumps = new Map(
    (previous.success ? previous.data.pumps : []).map((p) => [p.pump, { ...p }]),
  );
  for (const p of fit.parameters) {
    if (p.key === 'flowScale') pumps.set(p.target, { pump: p.target, flowScale: p.fitted });
    else beds.set(p.target, { ...(beds.get(p.target) ?? { bed: p.target }), [p.key]: p.fitted });
  }
  return {
    calibrationId: fit.id,
    beds: [...beds.values()],
    pumps: [...pumps.values()],
    appliedAt: new Date().toISOString(),
    appliedBy: { id: user.id, name: user.name },
  };
}

async function applyFit(
  db: Database,
  user: User,
  calibrationId: string,
): Promise<SystemCalibration> {
  const fit = await getCalibration(db, calibrationId);
  const { system } = await requireSystemAccess(db, user, fit.systemId, 'write');
  if (fit.fit.status === 'failed')
    throw conflict(
      'This fit failed, so its values are not worth keeping; fit again.',
      'CALIBRATION_FAILED',
    );
  const calibration = mergedCalibration(system.calibration, fit, user);
  await setSystemCalibration(db, system.id, calibration, fit.id);
  return calibration;
}

/** `POST /api/calibrations/:cid/apply`: keeps the fit's values on its system. */
export async function applyCalibrationById(
  db: Database,
  user: User,
  calibrationId: string,
): Promise<CurrentCalibration> {
  const uuid = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
  const found = uuid.test(calibrationId) ? await findCalibrationRow(db, calibrationId) : undefined;
  if (!found) throw notFound('That calibration');
  try {
    await requireSystemAccess(db, user, found.row.systemId, 'write');
  } catch (error) {
    if (error instanceof Error && 'status' in error && error.status === 404)
      throw notFound('That calibration');
    throw error;
  }
  return { calibration: await applyFit(db, user, calibrationId) };
}

/** `GET /api/systems/:id/calibration`. */
export async function getCurrentCalibration(
  db: Database,
  user: User,
  systemId: string,
): Promise<CurrentCalibration> {
  const { system } = await requireSystemAccess(db, user, systemId, 'read');
  const parsed = SystemCalibrationSchema.safeParse(system.calibration);
  return { calibration: parsed.success ? parsed.data : null };
}

/** `DELETE /api/systems/:id/calibration`: back to the scenario's own coefficients (history is kept). */
export async function clearCalibration(db: Database, user: User, systemId: string): Promise<void> {
  const { system } = await requireSystemAccess(db, user, systemId, 'write');
  await setSystemCalibration(db, system.id, null, null);
}
