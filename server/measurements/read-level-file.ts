/**
 * Everything between an uploaded file's bytes and its parsed levels, as one pure function over
 * plain data (so it can run in a worker thread): decode, read the table, guess options when none
 * were given, parse the rows, and sum up each vessel.
 */
import {
  CsvImportOptionsSchema,
  type CsvImportOptions,
  type MeasuredBedOverview,
  type MeasuredSeries,
} from '../../shared/contracts/measurements';
import { decodeTextFile } from './decode-text-file';
import { guessImportOptions } from './guess-import-options';
import { parseLevelCsv, type KnownVessel, type ParsedLevelCsv } from './parse-level-csv';
import { readCsvTable } from './read-csv-table';
import { waterDensityKgPerM3 } from '../../engine/index';

/** What to read: the bytes, the (already validated) options or none to guess, and the system's vessels. */
export interface LevelFileRequest {
  bytes: Uint8Array;
  options: CsvImportOptions | undefined;
  vessels: KnownVessel[];
  beds: string[];
}

/** The file's table and parsed levels, or why the file cannot be read at all (HTTP status and code). */
export type LevelFileResult =
  | { ok: false; status: number; code: string; message: string }
  | {
      ok: true;
      columns: string[];
      headerLine: number | null;
      delimiter: string;
      rawRows: string[][];
      options: CsvImportOptions;
      parsed: ParsedLevelCsv;
      overview: MeasuredBedOverview[];
    };

/** Per vessel: samples, span, lowest and highest level. */
export function overviewOf(series: MeasuredSeries): MeasuredBedOverview[] {
  return series.beds.map((b) => ({
    bed: b.bed,
    samples: b.t_s.length,
    durationS: (b.t_s.at(-1) ?? 0) - (b.t_s[0] ?? 0),
    minLevel_m: b.level_m.length > 0 ? b.level_m.reduce((m, v) => Math.min(m, v)) : null,
    maxLevel_m: b.level_m.length > 0 ? b.level_m.reduce((m, v) => Math.max(m, v)) : null,
  }));
}

/** Reads a level file; see the module comment. Never throws for a bad file. */
export function readLevelFile(request: LevelFileRequest): LevelFileResult {
  const decoded = decodeTextFile(request.bytes);
  if (!decoded.ok) {
    return {
      ok: false,
      status: decoded.code === 'NOT_A_CSV' ? 415 : 400,
      code: decoded.code,
      message: decoded.message,
    };
  }
  const table = readCsvTable(
    decoded.text,
    request.options ?? { delimiter: 'auto', decimal: '.', hasHeader: true },
  );
  if (!table.ok) return { ok: false, status: 400, code: table.code, message: table.message };
  const onlyBed = request.beds.length === 1 ? request.beds[0] : undefined;
  const options =
    request.options ??
    CsvImportOptionsSchema.parse(
      guessImportOptions({
        columns: table.columns,
        rows: table.records.slice(0, 50).map((r) => r.fields),
        decimal: '.',
        ...(onlyBed ? { onlyBed } : {}),
      }),
    );
  const parsed = parseLevelCsv(table.columns, table.records, options, {
    vessels: request.vessels,
    ...(onlyBed ? { defaultVessel: onlyBed } : {}),
    densityKgPerM3: waterDensityKgPerM3,
  });
  return {
    ok: true,
    columns: table.columns,
    headerLine: table.headerLine,
    delimiter: table.delimiter,
    rawRows: table.records.slice(0, 10).map((r) => r.fields),
    options,
    parsed,
    overview: parsed.ok ? overviewOf(parsed.series) : [],
  };
}
