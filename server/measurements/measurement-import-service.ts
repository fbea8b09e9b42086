/**
 * Preview and store level logs: a CSV (file upload or pasted text) read with the chosen options,
 * and a stopwatch log. A file that cannot be read is refused with a code and a message saying
 * what to fix; nothing is stored then, and stored measurements are never changed by an upload.
 */
import type { z } from 'zod';
import {
  CreateStopwatchRequestSchema,
  CsvImportOptionsSchema,
  type CsvImportOptionsInput,
  type CsvPreview,
  type Measurement,
  type MeasuredBedOverview,
  type MeasuredSeries,
} from '../../shared/contracts/measurements';
import type { User } from '../../shared/contracts/auth';
import { requireSystemAccess } from '../auth/system-access';
import type { Database } from '../db/database';
import { badRequest, HttpError } from '../http/http-error';
import { parseOr400 } from '../http/validate';
import { decodeTextFile } from './decode-text-file';
import { guessImportOptions } from './guess-import-options';
import { insertMeasurement } from './measurements-repository';
import { getMeasurement } from './measurements-service';
import { parseLevelCsv, type LevelCsvContext } from './parse-level-csv';
import { readCsvTable } from './read-csv-table';
import { systemVessels } from './system-vessels';
import { waterDensityKgPerM3 } from './water-density';

/** An uploaded or pasted file. */
export interface UploadedFile {
  bytes: Buffer;
  filename: string;
}

type ImportOptions = z.output<typeof CsvImportOptionsSchema>;

function decodeOr4xx(file: UploadedFile): string {
  const decoded = decodeTextFile(file.bytes);
  if (decoded.ok) return decoded.text;
  throw new HttpError(decoded.code === 'NOT_A_CSV' ? 415 : 400, decoded.code, decoded.message);
}

function overviewOf(series: MeasuredSeries): MeasuredBedOverview[] {
  return series.beds.map((b) => ({
    bed: b.bed,
    samples: b.t_s.length,
    durationS: (b.t_s.at(-1) ?? 0) - (b.t_s[0] ?? 0),
    minLevel_m: b.level_m.length > 0 ? Math.min(...b.level_m) : null,
    maxLevel_m: b.level_m.length > 0 ? Math.max(...b.level_m) : null,
  }));
}

interface Prepared {
  text: string;
  table: Extract<ReturnType<typeof readCsvTable>, { ok: true }>;
  options: ImportOptions;
  context: LevelCsvContext;
}

/** Decodes, reads the table and settles the options (given, or guessed for a preview). */
async function prepare(
  db: Database,
  user: User,
  systemId: string,
  file: UploadedFile,
  rawOptions: unknown,
  guess: boolean,
): Promise<Prepared> {
  const { system } = await requireSystemAccess(db, user, systemId, 'write');
  const { vessels, beds } = systemVessels(system.scenario);
  const text = decodeOr4xx(file);
  let options =
    rawOptions === undefined
      ? undefined
      : parseOr400(CsvImportOptionsSchema, rawOptions, 'options');
  const table = readCsvTable(text, options ?? { delimiter: 'auto', decimal: '.', hasHeader: true });
  if (!table.ok) throw new HttpError(400, table.code, table.message);
  if (!options) {
    if (!guess)
      throw badRequest('Send the import options with the file.', [
        { path: 'options', message: 'Required.' },
      ]);
    const rows = table.records.slice(0, 50).map((r) => r.fields);
    const guessed: CsvImportOptionsInput = guessImportOptions({
      columns: table.columns,
      rows,
      decimal: '.',
      ...(beds.length === 1 ? { onlyBed: beds[0] } : {}),
    });
    options = CsvImportOptionsSchema.parse(guessed);
  }
  const context: LevelCsvContext = {
    vessels,
    ...(beds.length === 1 && beds[0] ? { defaultVessel: beds[0] } : {}),
    densityKgPerM3: waterDensityKgPerM3,
  };
  return { text, table, options, context };
}

/** `POST /api/systems/:id/measurements/preview`: parses without storing; problems are reported, not thrown. */
export async function previewCsv(
  db: Database,
  user: User,
  systemId: string,
  file: UploadedFile,
  rawOptions: unknown,
): Promise<CsvPreview> {
  const { table, options, context } = await prepare(db, user, systemId, file, rawOptions, true);
  const parsed = parseLevelCsv(table.columns, table.records, options, context);
  const base = {
    columns: table.columns,
    headerLine: table.headerLine,
    delimiter: table.delimiter,
    rawRows: table.records.slice(0, 10).map((r) => r.fields),
    options: options as Record<string, unknown>,
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
    beds: overviewOf(parsed.series),
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
  const { table, options, context } = await prepare(db, user, systemId, file, rawOptions, false);
  const parsed = parseLevelCsv(table.columns, table.records, options, context);
  if (!parsed.ok) throw new HttpError(400, parsed.code, parsed.message);
  const id = await insertMeasurement(db, {
    systemId,
    createdBy: user.id,
    kind: 'csv',
    name: options.name ?? file.filename.replace(/\.[^.]*$/, '').slice(0, 200) ?? 'Level log',
    originalFilename: file.filename.slice(0, 255),
    original: file.bytes,
    options: {
      import: options,
      detected: {
        timeFormat: parsed.timeFormat,
        delimiter: table.delimiter,
        headerLine: table.headerLine,
      },
    },
    series: { ...parsed.series, overview: overviewOf(parsed.series) },
    rejected: { total: parsed.rejectedCount, rows: parsed.rejected },
    stopwatch: null,
  });
  return getMeasurement(db, user, id);
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
  const overview: MeasuredBedOverview[] = [...new Set(request.entries.map((e) => e.bed))].map(
    (bed) => {
      const mine = request.entries.filter((e) => e.bed === bed);
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
    },
  );
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
