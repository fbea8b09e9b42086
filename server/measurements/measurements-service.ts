/** Read and delete stored measurements; every call checks the caller's access to the system. */
import {
  MeasuredBedOverviewSchema,
  MeasuredSeriesSchema,
  RejectedRowSchema,
  type Measurement,
  type MeasurementList,
  type MeasuredSeries,
  type RejectedRow,
} from '../../shared/contracts/measurements';
import type { User } from '../../shared/contracts/auth';
import { requireSystemAccess, type SystemAccessNeed, type SystemRow } from '../auth/system-access';
import type { Database } from '../db/database';
import { HttpError, notFound } from '../http/http-error';
import {
  deleteMeasurementRow,
  findMeasurementHead,
  findMeasurementPart,
  listMeasurementHeads,
  type MeasurementHead,
} from './measurements-repository';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

function asRecord(value: unknown): Record<string, unknown> | null {
  return value !== null && typeof value === 'object' && !Array.isArray(value)
    ? (value as Record<string, unknown>)
    : null;
}

/** A stored head as the API shows it. */
export function toMeasurement(row: MeasurementHead): Measurement {
  const overview = MeasuredBedOverviewSchema.array().safeParse(row.overview);
  const stopwatch = Array.isArray(row.stopwatch)
    ? (row.stopwatch as Measurement['stopwatch'])
    : null;
  return {
    id: row.id,
    systemId: row.systemId,
    kind: row.kind === 'stopwatch' ? 'stopwatch' : 'csv',
    name: row.name,
    originalFilename: row.originalFilename,
    sizeBytes: row.sizeBytes,
    options: asRecord(row.options),
    beds: overview.success ? overview.data : [],
    startTime: typeof row.startTime === 'string' ? row.startTime : null,
    rejectedCount: typeof row.rejectedTotal === 'number' ? row.rejectedTotal : 0,
    stopwatch,
    createdBy: row.createdBy,
    createdByName: row.createdByName,
    createdAt: row.createdAt.toISOString(),
  };
}

/** A measurement the user may use as `need` on its system, and that system; 404 otherwise. */
export async function requireMeasurement(
  db: Database,
  user: Pick<User, 'id'>,
  measurementId: string,
  need: SystemAccessNeed,
): Promise<{ head: MeasurementHead; system: SystemRow }> {
  const head = UUID.test(measurementId) ? await findMeasurementHead(db, measurementId) : undefined;
  if (!head) throw notFound('That measurement');
  try {
    const { system } = await requireSystemAccess(db, user, head.systemId, need);
    return { head, system };
  } catch (error) {
    if (error instanceof HttpError && error.status === 404) throw notFound('That measurement');
    throw error;
  }
}

/** `GET /api/systems/:id/measurements`. */
export async function listMeasurements(
  db: Database,
  user: User,
  systemId: string,
): Promise<MeasurementList> {
  await requireSystemAccess(db, user, systemId, 'read');
  return { items: (await listMeasurementHeads(db, systemId)).map(toMeasurement) };
}

/** `GET /api/measurements/:mid`. */
export async function getMeasurement(
  db: Database,
  user: User,
  measurementId: string,
): Promise<Measurement> {
  return toMeasurement((await requireMeasurement(db, user, measurementId, 'read')).head);
}

/** The stored series of a measurement (empty for a stopwatch log). */
export async function loadMeasuredSeries(
  db: Database,
  measurementId: string,
): Promise<MeasuredSeries> {
  const parsed = MeasuredSeriesSchema.safeParse(
    await findMeasurementPart(db, measurementId, 'series'),
  );
  return parsed.success ? parsed.data : { startTime: null, beds: [] };
}

/** Evenly strided sample indices, first and last kept. */
function stride(n: number, maxPoints: number | undefined): number[] {
  if (maxPoints === undefined || n <= maxPoints) return Array.from({ length: n }, (_, i) => i);
  return Array.from({ length: maxPoints }, (_, k) => Math.round((k * (n - 1)) / (maxPoints - 1)));
}

/** `GET /api/measurements/:mid/series`: per vessel, thinned to `maxPoints` samples when given. */
export async function getMeasurementSeries(
  db: Database,
  user: User,
  measurementId: string,
  maxPoints: number | undefined,
): Promise<MeasuredSeries> {
  await requireMeasurement(db, user, measurementId, 'read');
  const series = await loadMeasuredSeries(db, measurementId);
  return {
    startTime: series.startTime,
    beds: series.beds.map((b) => {
      const keep = stride(b.t_s.length, maxPoints);
      return {
        bed: b.bed,
        t_s: keep.map((i) => b.t_s[i] ?? 0),
        level_m: keep.map((i) => b.level_m[i] ?? 0),
      };
    }),
  };
}

/** `GET /api/measurements/:mid/rejected`. */
export async function getRejectedRows(
  db: Database,
  user: User,
  measurementId: string,
): Promise<{ items: RejectedRow[]; total: number }> {
  const { head } = await requireMeasurement(db, user, measurementId, 'read');
  const stored = asRecord(await findMeasurementPart(db, measurementId, 'rejected'));
  const rows = RejectedRowSchema.array().safeParse(stored?.['rows']);
  return {
    items: rows.success ? rows.data : [],
    total: typeof head.rejectedTotal === 'number' ? head.rejectedTotal : 0,
  };
}

/** `GET /api/measurements/:mid/original`: the uploaded bytes, exactly. */
export async function getOriginalFile(
  db: Database,
  user: User,
  measurementId: string,
): Promise<{ filename: string; bytes: Buffer }> {
  const { head } = await requireMeasurement(db, user, measurementId, 'read');
  const bytes = await findMeasurementPart(db, measurementId, 'original');
  if (!bytes)
    throw new HttpError(
      404,
      'NO_ORIGINAL_FILE',
      'This measurement was typed in, so it has no original file.',
    );
  return { filename: head.originalFilename ?? `${head.name}.csv`, bytes };
}

/** `DELETE /api/measurements/:mid` (needs write access to the system). */
export async function deleteMeasurement(
  db: Database,
  user: User,
  measurementId: string,
): Promise<void> {
  await requireMeasurement(db, user, measurementId, 'write');
  await deleteMeasurementRow(db, measurementId);
}
