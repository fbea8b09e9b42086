/** Reads one time cell of a level log in a chosen format. */
import type { TimeFormat } from '../../shared/contracts/measurements';
import { wallTimeToEpochMs, type TimeZoneSpec, type WallTime } from './zoned-time';

/** A concrete time format (`auto` resolved). */
export type ConcreteTimeFormat = Exclude<TimeFormat, 'auto'>;

/** An absolute instant (Unix ms), seconds since the logger started, or why the cell is unreadable. */
export type TimeValue =
  | { kind: 'instant'; epochMs: number }
  | { kind: 'elapsed'; seconds: number }
  | { kind: 'error'; reason: string };

const ISO =
  /^(\d{4})-(\d{1,2})-(\d{1,2})(?:[T ](\d{1,2}):(\d{2})(?::(\d{2})(?:[.,](\d{1,9}))?)?)?\s*(Z|[+-]\d{2}(?::?\d{2})?)?$/i;
const CLOCK = /^(\d{1,2}):(\d{2})(?::(\d{2})(?:[.,](\d{1,9}))?)?\s*(am|pm)?$/i;
const NUMBER = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:e[+-]?\d+)?$/i;

function fractionMs(digits: string | undefined): number {
  return digits ? Number(`0.${digits}`) * 1000 : 0;
}

/** Hours, minutes, seconds and ms of an `h:mm[:ss[.fff]] [am|pm]` clock; null when malformed. */
function readClock(
  text: string,
): Pick<WallTime, 'hour' | 'minute' | 'second' | 'millisecond'> | null {
  const m = CLOCK.exec(text.trim());
  if (!m) return null;
  let hour = Number(m[1]);
  const meridiem = m[5]?.toLowerCase();
  if (meridiem) {
    if (hour < 1 || hour > 12) return null;
    hour = (hour % 12) + (meridiem === 'pm' ? 12 : 0);
  }
  const minute = Number(m[2]);
  const second = Number(m[3] ?? '0');
  if (hour > 23 || minute > 59 || second > 60) return null;
  return { hour, minute, second, millisecond: fractionMs(m[4]) };
}

function validDate(year: number, month: number, day: number): boolean {
  if (month < 1 || month > 12 || day < 1) return false;
  return day <= new Date(Date.UTC(year, month, 0)).getUTCDate();
}

function fullYear(text: string): number {
  const year = Number(text);
  return text.length <= 2 ? 2000 + year : year;
}

/** `2024-05-31[T ]14:03[:22[.5]][Z|+02:00]`: an offset in the text wins over the chosen zone. */
function readIso(text: string, zone: TimeZoneSpec): TimeValue {
  const m = ISO.exec(text);
  if (!m)
    return { kind: 'error', reason: `time "${text}" is not ISO 8601 (e.g. 2024-05-31T14:03:22Z)` };
  const [year, month, day] = [Number(m[1]), Number(m[2]), Number(m[3])];
  if (!validDate(year, month, day))
    return { kind: 'error', reason: `time "${text}" is not a calendar date` };
  const wall: WallTime = {
    year,
    month,
    day,
    hour: Number(m[4] ?? '0'),
    minute: Number(m[5] ?? '0'),
    second: Number(m[6] ?? '0'),
    millisecond: fractionMs(m[7]),
  };
  if (wall.hour > 23 || wall.minute > 59 || wall.second > 60)
    return { kind: 'error', reason: `time "${text}" has an impossible clock time` };
  const offsetText = m[8];
  if (offsetText) {
    const offset = /^([+-])(\d{2}):?(\d{2})?$/.exec(offsetText);
    const offsetMinutes = offset
      ? (offset[1] === '-' ? -1 : 1) * (Number(offset[2]) * 60 + Number(offset[3] ?? '0'))
      : 0;
    return {
      kind: 'instant',
      epochMs: wallTimeToEpochMs(wall, { kind: 'offset', offsetMinutes, label: offsetText }),
    };
  }
  return { kind: 'instant', epochMs: wallTimeToEpochMs(wall, zone) };
}

const ORDERS = { ymd: [0, 1, 2], dmy: [2, 1, 0], mdy: [2, 0, 1] } as const;

/** A date with separators `/`, `.` or `-` in the given field order, then an optional clock time. */
function readOrderedDate(
  text: string,
  format: 'ymd' | 'dmy' | 'mdy',
  zone: TimeZoneSpec,
): TimeValue {
  const m = /^(\d{1,4})[/.-](\d{1,2})[/.-](\d{1,4})(?:[ T,]+(.+))?$/.exec(text);
  const example = {
    ymd: '2024/05/31 14:03:22',
    dmy: '31/05/2024 14:03:22',
    mdy: '05/31/2024 2:03:22 PM',
  }[format];
  if (!m) return { kind: 'error', reason: `time "${text}" does not look like ${example}` };
  const fields = [m[1] ?? '', m[2] ?? '', m[3] ?? ''];
  const [yi, mi, di] = ORDERS[format];
  const year = fullYear(fields[yi] ?? '');
  const month = Number(fields[mi]);
  const day = Number(fields[di]);
  if (!validDate(year, month, day)) {
    return {
      kind: 'error',
      reason: `time "${text}" is not a calendar date read as ${format} (day ${day}, month ${month})`,
    };
  }
  const clock =
    m[4] === undefined ? { hour: 0, minute: 0, second: 0, millisecond: 0 } : readClock(m[4]);
  if (!clock)
    return { kind: 'error', reason: `time "${text}" has a clock time that is not h:mm[:ss]` };
  return { kind: 'instant', epochMs: wallTimeToEpochMs({ year, month, day, ...clock }, zone) };
}

/** Seconds as a number, or an `h:mm:ss(.s)` / `mm:ss` duration. */
function readElapsed(text: string): TimeValue {
  if (NUMBER.test(text)) return { kind: 'elapsed', seconds: Number(text) };
  const m = /^(?:(\d+):)?(\d{1,2}):(\d{2}(?:[.,]\d+)?)$/.exec(text);
  if (!m) return { kind: 'error', reason: `time "${text}" is not a number of seconds or h:mm:ss` };
  return {
    kind: 'elapsed',
    seconds:
      Number(m[1] ?? '0') * 3600 + Number(m[2]) * 60 + Number((m[3] ?? '0').replace(',', '.')),
  };
}

/**
 * Reads one time cell. `decimal` is the decimal separator of numeric formats. Instants come back
 * as Unix ms; `elapsed-s` as seconds. Every failure says what was expected.
 */
export function parseTimeValue(
  raw: string,
  format: ConcreteTimeFormat,
  zone: TimeZoneSpec,
  decimal: '.' | ',' = '.',
): TimeValue {
  const text = raw.trim();
  if (text === '') return { kind: 'error', reason: 'time is empty' };
  const numeric = decimal === ',' ? text.replace(',', '.') : text;
  switch (format) {
    case 'iso':
      return readIso(text, zone);
    case 'ymd':
    case 'dmy':
    case 'mdy':
      return readOrderedDate(text, format, zone);
    case 'epoch-s':
    case 'epoch-ms':
      if (!NUMBER.test(numeric))
        return { kind: 'error', reason: `time "${text}" is not a Unix time number` };
      return { kind: 'instant', epochMs: Number(numeric) * (format === 'epoch-s' ? 1000 : 1) };
    case 'elapsed-s':
      return readElapsed(numeric);
  }
}
