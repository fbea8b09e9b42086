/**
 * Reads CSV text into a header and records with their line numbers, with csv-parse: the
 * delimiter and the header line are found when not given, preamble lines above the header and
 * `#` comment lines are skipped.
 */
import { CsvError, parse } from 'csv-parse/sync';
import { MEASUREMENT_MAX_ROWS } from '../../shared/contracts/measurements';

/** What to read: delimiter (`auto` to detect), header line (from 1; absent to detect), header or not. */
export interface CsvTableOptions {
  delimiter: 'auto' | ',' | ';' | '\t' | '|';
  decimal: '.' | ',';
  headerLine?: number;
  hasHeader: boolean;
}

/** One data record and the file line it came from. */
export interface CsvRecord {
  line: number;
  fields: string[];
}

/** The table, or a stable code and a message saying what to do. */
export type CsvTable =
  | {
      ok: true;
      columns: string[];
      headerLine: number | null;
      delimiter: string;
      records: CsvRecord[];
    }
  | { ok: false; code: string; message: string };

const CANDIDATES = [',', ';', '\t', '|'] as const;
const SAMPLE_LINES = 80;

function isContent(line: string): boolean {
  const trimmed = line.trim();
  return trimmed !== '' && !trimmed.startsWith('#');
}

/** Fields on one line, not counting delimiters inside double quotes (enough to sample a file's shape). */
function fieldCount(line: string, delimiter: string): number {
  let count = 1;
  let quoted = false;
  for (const ch of line) {
    if (ch === '"') quoted = !quoted;
    else if (ch === delimiter && !quoted) count++;
  }
  return count;
}

/** The most frequent value (the larger on a tie). */
function mode(values: readonly number[]): number {
  const counts = new Map<number, number>();
  for (const v of values) counts.set(v, (counts.get(v) ?? 0) + 1);
  let best = 0;
  let bestCount = 0;
  for (const [value, count] of counts) {
    if (count > bestCount || (count === bestCount && value > best))
      [best, bestCount] = [value, count];
  }
  return best;
}

/** The delimiter that splits the last sampled lines (data, not preamble) most consistently into ≥ 2 fields. */
function detectDelimiter(lines: readonly string[], decimal: '.' | ','): string {
  const tail = lines.filter(isContent).slice(-Math.min(30, lines.length));
  let best: string = decimal === ',' ? ';' : ',';
  let bestScore = -1;
  for (const delimiter of CANDIDATES) {
    if (delimiter === ',' && decimal === ',') continue;
    const counts = tail.map((l) => fieldCount(l, delimiter));
    const typical = mode(counts);
    if (typical < 2) continue;
    const score = counts.filter((c) => c === typical).length * 100 + typical;
    if (score > bestScore) [best, bestScore] = [delimiter, score];
  }
  return best;
}

/** The first content line with the typical field count whose next content line has it too. */
function detectHeaderLine(lines: readonly string[], delimiter: string): number {
  const content = lines.map((text, i) => ({ text, line: i + 1 })).filter((l) => isContent(l.text));
  const typical = mode(content.slice(-30).map((l) => fieldCount(l.text, delimiter)));
  for (let i = 0; i < content.length; i++) {
    const here = content[i];
    const next = content[i + 1];
    if (
      here &&
      fieldCount(here.text, delimiter) === typical &&
      (!next || fieldCount(next.text, delimiter) === typical)
    ) {
      return here.line;
    }
  }
  return content[0]?.line ?? 1;
}

/** Index of the first character of line `line` (from 1); CRLF, LF and CR all end a line. */
function lineStart(text: string, line: number): number {
  const breaks = /\r\n|\n|\r/g;
  let index = 0;
  for (let n = 1; n < line; n++) {
    const match = breaks.exec(text);
    if (!match) return text.length;
    index = match.index + match[0].length;
  }
  return index;
}

/** csv-parse with `info: true` yields `{record, info: {lines}}` items; its typings do not say so. */
function withInfo(output: unknown, lineOffset: number): CsvRecord[] {
  if (!Array.isArray(output)) return [];
  return output.map((item: unknown) => {
    const entry = item as { record?: unknown; info?: { lines?: unknown } };
    const fields = Array.isArray(entry.record) ? entry.record.map(String) : [];
    return {
      line: (typeof entry.info?.lines === 'number' ? entry.info.lines : 0) + lineOffset,
      fields,
    };
  });
}

/** Line numbers (from 1, plus `lineOffset`) of the lines csv-parse turns into records: not blank, not `#` comments. */
function contentLineNumbers(body: string, lineOffset: number): number[] {
  const numbers: number[] = [];
  body.split(/\r\n|\n|\r/).forEach((line, i) => {
    if (line !== '' && !line.startsWith('#')) numbers.push(i + 1 + lineOffset);
  });
  return numbers;
}

const PARSE_OPTIONS = {
  bom: true,
  trim: true,
  skip_empty_lines: true,
  comment: '#',
  comment_no_infix: true,
  relax_column_count: true,
  relax_quotes: true,
  to: MEASUREMENT_MAX_ROWS + 2,
} as const;

/**
 * Parses the table with each record's file line. csv-parse's per-record `info` triples the time
 * of a large file, so records are first paired with the content lines counted here; only when
 * the counts differ (a quoted field spanning lines) is the file parsed again with `info`.
 */
function parseRecords(body: string, delimiter: string, lineOffset: number): CsvRecord[] {
  const plain = parse(body, { ...PARSE_OPTIONS, delimiter });
  const lines = contentLineNumbers(body, lineOffset);
  if (
    plain.length === lines.length ||
    (plain.length === MEASUREMENT_MAX_ROWS + 2 && lines.length > plain.length)
  ) {
    return plain.map((fields, i) => ({ line: lines[i] ?? 0, fields }));
  }
  return withInfo(parse(body, { ...PARSE_OPTIONS, delimiter, info: true }), lineOffset);
}

/** Reads the records after the header; csv-parse errors become `CSV_MALFORMED` naming the line. */
export function readCsvTable(text: string, options: CsvTableOptions): CsvTable {
  const sample = text.split(/\r\n|\n|\r/, SAMPLE_LINES);
  if (!sample.some(isContent))
    return { ok: false, code: 'EMPTY_FILE', message: 'The file has no data lines.' };
  const delimiter =
    options.delimiter === 'auto' ? detectDelimiter(sample, options.decimal) : options.delimiter;
  const headerLine = options.headerLine ?? detectHeaderLine(sample, delimiter);
  // Cut the preamble off ourselves: csv-parse's from_line does not count comment lines.
  const start = lineStart(text, headerLine);
  let records: CsvRecord[];
  try {
    records = parseRecords(text.slice(start), delimiter, headerLine - 1);
  } catch (error) {
    if (error instanceof CsvError) {
      return {
        ok: false,
        code: 'CSV_MALFORMED',
        message: `The CSV cannot be read: ${error.message}. Check the delimiter and the quotes on that line.`,
      };
    }
    throw error;
  }
  if (records.length > MEASUREMENT_MAX_ROWS + 1) {
    return {
      ok: false,
      code: 'TOO_MANY_ROWS',
      message: `The file has more than ${MEASUREMENT_MAX_ROWS} rows; split it or log less often.`,
    };
  }
  if (!options.hasHeader) {
    const width = records.reduce((w, r) => Math.max(w, r.fields.length), 0);
    return {
      ok: true,
      columns: Array.from({ length: width }, (_, i) => String(i + 1)),
      headerLine: null,
      delimiter,
      records,
    };
  }
  const [header, ...data] = records;
  if (!header) return { ok: false, code: 'EMPTY_FILE', message: 'The file has no header line.' };
  return { ok: true, columns: header.fields, headerLine: header.line, delimiter, records: data };
}
