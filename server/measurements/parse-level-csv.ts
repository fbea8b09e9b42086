/**
 * Reads a level log: each data row gives a time, a level (or a distance or pressure converted to
 * a level) and optionally the vessel it was measured in. Rows that cannot be used are kept with
 * the reason; a file where most times are unreadable or go backwards is refused as a whole.
 */
import {
  MEASUREMENT_MAX_REJECTED_KEPT,
  type CsvImportOptions,
  type MeasuredSeries,
  type ParsedRow,
  type RejectedRow,
  type TimeFormat,
} from '../../shared/contracts/measurements';
import { detectTimeFormat } from './detect-time-format';
import { makeLevelReader } from './level-reader';
import { parseTimeValue, type ConcreteTimeFormat } from './parse-time-value';
import type { CsvRecord } from './read-csv-table';
import { resolveCsvColumns } from './resolve-csv-columns';
import { parseTimeZone } from './zoned-time';

/** A vessel rows may name: its id and rim height above its floor (m). */
export interface KnownVessel {
  id: string;
  heightM: number;
}

/** What the parser is given besides the table. */
export interface LevelCsvContext {
  vessels: readonly KnownVessel[];
  /** The vessel rows belong to when the options name neither a bed column nor a bed. */
  defaultVessel?: string;
  densityKgPerM3: (temperatureC: number) => number;
  /** How many accepted rows to return for a preview. */
  previewRows?: number;
}

/** The parsed levels, or a stable code and a message saying how to fix the file or the options. */
export type ParsedLevelCsv =
  | {
      ok: true;
      timeFormat: Exclude<TimeFormat, 'auto'>;
      series: MeasuredSeries;
      rows: ParsedRow[];
      acceptedCount: number;
      rejected: RejectedRow[];
      rejectedCount: number;
    }
  | { ok: false; code: string; message: string; rejected?: RejectedRow[] };

/** Levels below the floor by more than this (m) are refused: a wrong mounting height or zero offset. */
const BELOW_FLOOR_TOLERANCE_M = 0.02;
/** Levels above the rim by more than this (m) are refused. */
const ABOVE_RIM_TOLERANCE_M = 0.05;

interface Accepted {
  line: number;
  bed: string;
  time: number;
  levelM: number;
}

type Failure = Extract<ParsedLevelCsv, { ok: false }>;

function fail(code: string, message: string, rejected?: RejectedRow[]): Failure {
  return { ok: false, code, message, ...(rejected ? { rejected } : {}) };
}

/** Rounds to `digits` decimals (dividing by a power of ten gives the nearest double, without noise). */
function round(value: number, digits: number): number {
  const k = 10 ** digits;
  return Math.round(value * k) / k;
}

/** Everything needed to read one row, fixed for the whole file. */
interface RowReader {
  format: ConcreteTimeFormat;
  zone: NonNullable<ReturnType<typeof parseTimeZone>>;
  decimal: '.' | ',';
  timeColumn: number;
  bedColumn: number | undefined;
  fixedBed: string | undefined;
  vessels: Map<string, KnownVessel>;
  readLevel: ReturnType<typeof makeLevelReader>;
}

type RowOutcome =
  { ok: true; row: Accepted } | { ok: false; kind: 'time' | 'order' | 'value'; reason: string };

function readRow(
  record: CsvRecord,
  r: RowReader,
  lastByBed: ReadonlyMap<string, Accepted>,
): RowOutcome {
  const timeValue = parseTimeValue(record.fields[r.timeColumn] ?? '', r.format, r.zone, r.decimal);
  if (timeValue.kind === 'error') return { ok: false, kind: 'time', reason: timeValue.reason };
  const time = timeValue.kind === 'instant' ? timeValue.epochMs / 1000 : timeValue.seconds;
  const level = r.readLevel(record.fields);
  if (!level.ok) return { ok: false, kind: 'value', reason: level.reason };
  const bed =
    r.bedColumn !== undefined ? (record.fields[r.bedColumn] ?? '').trim() : (r.fixedBed ?? '');
  const vessel = r.vessels.get(bed);
  if (!vessel)
    return {
      ok: false,
      kind: 'value',
      reason: bed === '' ? 'the bed cell is empty' : `"${bed}" is not a vessel of this system`,
    };
  const implausible = checkLevel(level.levelM, vessel);
  if (implausible) return { ok: false, kind: 'value', reason: implausible };
  const previous = lastByBed.get(bed);
  if (previous && time <= previous.time) {
    const relation = time === previous.time ? 'the same as' : 'before';
    return {
      ok: false,
      kind: 'order',
      reason: `time is ${relation} that of line ${previous.line} (${bed})`,
    };
  }
  return { ok: true, row: { line: record.line, bed, time, levelM: level.levelM } };
}

/** The chosen time format, or the one `auto` detects in the column; a failure when it cannot tell. */
function resolveTimeFormat(
  chosen: TimeFormat,
  records: readonly CsvRecord[],
  column: number,
): ConcreteTimeFormat | Failure {
  if (chosen !== 'auto') return chosen;
  const detected = detectTimeFormat(records.map((r) => r.fields[column] ?? ''));
  return (
    detected.format ??
    fail('TIME_FORMAT_UNKNOWN', `Cannot tell the time format: ${detected.reason}.`)
  );
}

/** Checks the options against the file and the system, and builds the row reader. */
function prepare(
  columns: readonly string[],
  records: readonly CsvRecord[],
  options: CsvImportOptions,
  context: LevelCsvContext,
): RowReader | Failure {
  const resolved = resolveCsvColumns(columns, options);
  if (!resolved.ok) return fail(resolved.code, resolved.message);
  const col = resolved.columns;
  const zone = parseTimeZone(options.time.timeZone);
  if (!zone)
    return fail(
      'INVALID_TIME_ZONE',
      `"${options.time.timeZone}" is not a time zone; use an IANA name such as Europe/Lisbon, UTC, or an offset such as +02:00.`,
    );
  const fixedBed = options.bedColumn ? undefined : (options.bed ?? context.defaultVessel);
  if (col.bed === undefined && fixedBed === undefined)
    return fail(
      'BED_REQUIRED',
      'Choose the bed these levels were measured in, or the column that names it.',
    );
  const vessels = new Map(context.vessels.map((v) => [v.id, v]));
  if (fixedBed !== undefined && !vessels.has(fixedBed)) {
    return fail(
      'UNKNOWN_BED',
      `"${fixedBed}" is not a vessel of this system; choose one of ${[...vessels.keys()].join(', ')}.`,
    );
  }
  const format = resolveTimeFormat(options.time.format, records, col.time);
  if (typeof format !== 'string') return format;
  const levelColumns = {
    level: col.level,
    ...(col.barometric !== undefined ? { barometric: col.barometric } : {}),
  };
  const readLevel = makeLevelReader(
    options.level,
    levelColumns,
    options.decimal,
    context.densityKgPerM3,
  );
  return {
    format,
    zone,
    decimal: options.decimal,
    timeColumn: col.time,
    bedColumn: col.bed,
    fixedBed,
    vessels,
    readLevel,
  };
}

/** Reads every record; see the module comment for what is rejected and what refuses the file. */
export function parseLevelCsv(
  columns: readonly string[],
  records: readonly CsvRecord[],
  options: CsvImportOptions,
  context: LevelCsvContext,
): ParsedLevelCsv {
  const reader = prepare(columns, records, options, context);
  if ('ok' in reader) return reader;
  const rejected: RejectedRow[] = [];
  const failures = { time: 0, order: 0, value: 0 };
  const accepted: Accepted[] = [];
  const lastByBed = new Map<string, Accepted>();
  const separator = options.delimiter === 'auto' ? ',' : options.delimiter;
  for (const record of records) {
    const outcome = readRow(record, reader, lastByBed);
    if (outcome.ok) {
      accepted.push(outcome.row);
      lastByBed.set(outcome.row.bed, outcome.row);
      continue;
    }
    failures[outcome.kind]++;
    if (rejected.length < MEASUREMENT_MAX_REJECTED_KEPT) {
      rejected.push({
        line: record.line,
        reason: outcome.reason,
        raw: record.fields.join(separator).slice(0, 200),
      });
    }
  }
  const verdict = judgeRejections(
    records.length,
    accepted.length,
    failures.time,
    failures.order,
    rejected,
  );
  if (verdict) return verdict;
  const rejectedCount = failures.time + failures.order + failures.value;
  return assemble(accepted, reader.format, rejected, rejectedCount, context.previewRows ?? 50);
}

function checkLevel(levelM: number, vessel: KnownVessel): string | null {
  const mm = (m: number): string => `${(m * 1000).toFixed(1)} mm`;
  if (!Number.isFinite(levelM)) return 'the level is not a finite number';
  if (levelM < -BELOW_FLOOR_TOLERANCE_M)
    return `level ${mm(levelM)} is below the floor of ${vessel.id}: check the mounting height, zero offset or unit`;
  if (levelM > vessel.heightM + ABOVE_RIM_TOLERANCE_M)
    return `level ${mm(levelM)} is above the rim of ${vessel.id} (${mm(vessel.heightM)}): check the unit`;
  return null;
}

/** Refuses the whole file when nothing is usable, most times are unreadable, or time goes backwards often. */
function judgeRejections(
  total: number,
  acceptedCount: number,
  timeFailures: number,
  orderFailures: number,
  rejected: RejectedRow[],
): Failure | null {
  const first = rejected[0];
  const example = first ? ` Line ${first.line}: ${first.reason}.` : '';
  if (total === 0) return fail('NO_DATA_ROWS', 'The file has a header but no data rows.');
  if (timeFailures > total / 2) {
    return fail(
      'UNREADABLE_TIMES',
      `${timeFailures} of ${total} times could not be read.${example} Choose the time column and its format.`,
      rejected,
    );
  }
  if (orderFailures > Math.max(3, total * 0.02)) {
    const order = rejected.find((r) => r.reason.startsWith('time is'));
    return fail(
      'NON_MONOTONIC_TIME',
      `Time goes backwards or repeats at ${orderFailures} rows${order ? ` (first at line ${order.line}: ${order.reason})` : ''}. Sort the file by time; if the logger wrote local time across a daylight-saving change, read it as UTC or a fixed offset.`,
      rejected,
    );
  }
  if (acceptedCount === 0)
    return fail('NO_VALID_ROWS', `None of the ${total} rows could be used.${example}`, rejected);
  return null;
}

function assemble(
  accepted: Accepted[],
  format: ConcreteTimeFormat,
  rejected: RejectedRow[],
  rejectedCount: number,
  previewRows: number,
): ParsedLevelCsv {
  const absolute = format !== 'elapsed-s';
  const t0 = accepted.reduce((min, a) => Math.min(min, a.time), Number.POSITIVE_INFINITY);
  const beds = new Map<string, { bed: string; t_s: number[]; level_m: number[] }>();
  for (const a of accepted) {
    let series = beds.get(a.bed);
    if (!series) beds.set(a.bed, (series = { bed: a.bed, t_s: [], level_m: [] }));
    series.t_s.push(round(a.time - t0, 3));
    series.level_m.push(round(a.levelM, 6));
  }
  const rows = accepted.slice(0, previewRows).map((a) => ({
    line: a.line,
    time: absolute ? new Date(a.time * 1000).toISOString() : `${round(a.time, 3)} s`,
    t_s: round(a.time - t0, 3),
    bed: a.bed,
    level_m: round(a.levelM, 6),
  }));
  return {
    ok: true,
    timeFormat: format,
    series: {
      startTime: absolute ? new Date(t0 * 1000).toISOString() : null,
      beds: [...beds.values()],
    },
    rows,
    acceptedCount: accepted.length,
    rejected,
    rejectedCount,
  };
}
