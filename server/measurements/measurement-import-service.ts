/**
 * Preview and store level logs: a CSV (file upload or pasted text) read with the chosen options,
 * and a stopwatch log. A file that cannot be read is refused with a code and a message saying
 * what to fix; nothing is stored then, and stored measurements are never changed by an upload.
 */
import {
  CreateStopwatchRequestSchema,
  CsvImportOptionsSchema,
  type CsvPreview,
  type Measurement,
  type MeasuredBedOverview,
  type StopwatchEntry,
} from '../../shared/contracts/measurements';
import type { User } from '../../shared/contracts/auth';
import { requireSystemAccess } from '../auth/system-access';
import type { Database } from '../db/database';
import { badRequest, HttpError } from '../http/http-error';
import { parseOr400 } from '../http/validate';
import { insertMeasurement } from './measurements-repository';
import { getMeasurement } from './measurements-service';
import type { LevelFileResult } from './read-level-file';
import { readLevelFileOffThread } from './read-level-file-off-thread';
import { systemVessels } from './system-vessels';

/** An uploaded or pasted file. */
export interface UploadedFile {
  bytes: Buffer;
  filename: string;
}

type ReadFile = Extract<LevelFileResult, { ok: true }>;

/** Checks access and the options, then reads the file (off the event loop when large). */
async function readUpload(
  db: Database,
  user: User,
  systemId: string,
  file: UploadedFile,
  rawOptions: unknown,
  guess: boolean,
): Promise<ReadFile> {
  const { system } = await requireSystemAccess(db, user, systemId, 'write');
  const { vessels, beds } = systemVessels(system.scenario);
  if (rawOptions === undefined && !guess) {
    throw badRequest('Send the import options with the file.', [
      { path: 'options', message: 'Required.' },
    ]);
  }
  const options =
    rawOptions === undefined
      ? undefined
      : parseOr400(CsvImportOptionsSchema, rawOptions, 'options');
  const result = await readLevelFileOffThread({ bytes: file.bytes, options, vessels, beds });
  if (!result.ok) throw new HttpError(result.status, result.code, result.message);
  return result;
}

/** `POST /api/systems/:id/measurements/preview`: parses without storing; problems are reported, not thrown. */
export async function previewCsv(
  db: Database,
  user: User,
  systemId: string,
  file: UploadedFile,
  rawOptions: unknown,
): Promise<CsvPreview> {
  const read = await readUpload(db, user, systemId, file, rawOptions, true);
  const { parsed } = read;
  const base = {
    columns: read.columns,
    headerLine: read.headerLine,
    delimiter: read.delimiter,
    rawRows: read.rawRows,
    options: read.options as Record<string, unknown>,
  };
  if (!parsed.ok) {
    const rejected = parsed.rejected ?? [];
    const problem = { code: parsed.code, message: parsed.message };
    return {
      ...base,
      timeFormat: null,
      rows: [],
      acceptedCount: 0,
      rejected: rejected.slice(0, 100),
      rejectedCount: rejected.length,
      beds: [],
      problem,
    };
  }
  return {
    ...base,
    timeFormat: parsed.timeFormat,
    rows: parsed.rows,
    acceptedCount: parsed.acceptedCount,
    rejected: parsed.rejected.slice(0, 100),
    rejectedCount: parsed.rejectedCount,
    beds: read.overview,
    problem: null,
  };
}

/** `POST /api/systems/:id/measurements`: stores the original file and the parsed series together. */
export async function createCsvMeasurement(
  db: Database,
  user: User,
  systemId: string,
  file: UploadedFile,
  rawOptions: unknown,
): Promise<Measurement> {
  const read = await readUpload(db, user, systemId, file, rawOptions, false);
  const { parsed, options } = read;
  if (!parsed.ok) throw new HttpError(400, parsed.code, parsed.message);
  const id = await insertMeasurement(db, {
    systemId,
    createdBy: user.id,
    kind: 'csv',
    name: options.name ?? (file.filename.replace(/\.[^.]*$/, '').slice(0, 200) || 'Level log'),
    originalFilename: file.filename.slice(0, 255),
    original: file.bytes,
    options: {
      import: options,
      detected: {
        timeFormat: parsed.timeFormat,
        delimiter: read.delimiter,
        headerLine: read.headerLine,
      },
    },
    series: { ...parsed.series, overview: read.overview },
    rejected: { total: parsed.rejectedCount, rows: parsed.rejected },
    stopwatch: null,
  });
  return getMeasurement(db, user, id);
}

/** Per bed of a stopwatch log: cycles timed, total time, lowest and highest mark read. */
function stopwatchOverview(entries: readonly StopwatchEntry[]): MeasuredBedOverview[] {
  return [...new Set(entries.map((e) => e.bed))].map((bed) => {
    const mine = entries.filter((e) => e.bed === bed);
    const marks = mine
      .flatMap((e) => [e.highMark, e.lowMark])
      .filter((m): m is number => m !== undefined);
    return {
      bed,
      samples: mine.length,
      durationS: mine.reduce((sum, e) => sum + e.fillTime + e.drainTime, 0),
      minLevel_m: marks.length > 0 ? Math.min(...marks) : null,
      maxLevel_m: marks.length > 0 ? Math.max(...marks) : null,
    };
  });
}

/** `POST /api/systems/:id/measurements/stopwatch`: observed cycles per bed (s and m). */
export async function createStopwatchMeasurement(
  db: Database,
  user: User,
  systemId: string,
  body: unknown,
): Promise<Measurement> {
  const { system } = await requireSystemAccess(db, user, systemId, 'write');
  const request = parseOr400(CreateStopwatchRequestSchema, body);
  const { beds } = systemVessels(system.scenario);
  const fields = request.entries.flatMap((e, i) =>
    beds.includes(e.bed)
      ? []
      : [
          {
            path: `entries[${i}].bed`,
            message: `"${e.bed}" is not a bed of this system; choose one of ${beds.join(', ')}.`,
          },
        ],
  );
  if (fields.length > 0)
    throw badRequest('Some entries name a bed this system does not have.', fields);
  const overview = stopwatchOverview(request.entries);
  const id = await insertMeasurement(db, {
    systemId,
    createdBy: user.id,
    kind: 'stopwatch',
    name: request.name,
    originalFilename: null,
    original: null,
    options: null,
    series: { startTime: null, beds: [], overview },
    rejected: { total: 0, rows: [] },
    stopwatch: request.entries,
  });
  return getMeasurement(db, user, id);
}
