/** Picks the time format of a column from its first values (the `auto` setting). */
import type { ConcreteTimeFormat } from './parse-time-value';

/** The detected format, or why none could be chosen (and what the user should pick). */
export type DetectedTimeFormat = { format: ConcreteTimeFormat } | { format: null; reason: string };

const ISO_START = /^\d{4}-\d{1,2}-\d{1,2}([T ]|$)/;
const ORDERED = /^(\d{1,4})[/.-](\d{1,2})[/.-](\d{1,4})/;
const NUMBER = /^[+-]?(?:\d+[.,]?\d*|[.,]\d+)(?:e[+-]?\d+)?$/i;
const CLOCK_DURATION = /^(\d+:)?\d{1,2}:\d{2}([.,]\d+)?$/;

/** Unix seconds from 2001-09-09 (1e9 s) on; smaller plain numbers are seconds since start. */
const EPOCH_S_MIN = 1e9;
/** Unix milliseconds from 2001-09-09 (1e12 ms) on. */
const EPOCH_MS_MIN = 1e12;

function detectOrdered(samples: readonly string[]): DetectedTimeFormat {
  let firstOver12 = false;
  let secondOver12 = false;
  for (const text of samples) {
    const m = ORDERED.exec(text);
    if (!m) return { format: null, reason: `time "${text}" mixes date styles; choose the format` };
    if ((m[1] ?? '').length === 4) return { format: 'ymd' };
    if (Number(m[1]) > 12) firstOver12 = true;
    if (Number(m[2]) > 12) secondOver12 = true;
  }
  if (firstOver12 && !secondOver12) return { format: 'dmy' };
  if (secondOver12 && !firstOver12) return { format: 'mdy' };
  return {
    format: null,
    reason:
      'the dates could be day/month/year or month/day/year (no day above 12 yet); choose the format',
  };
}

/**
 * Looks at up to the first 500 non-empty values: ISO 8601 dates, `2024/05/31` (ymd), `31/05/2024`
 * (dmy when a first field exceeds 12), `05/31/2024` (mdy when a second field does), Unix seconds
 * or milliseconds (by magnitude), or seconds / `h:mm:ss` since the start.
 */
export function detectTimeFormat(values: readonly string[]): DetectedTimeFormat {
  const samples = values
    .map((v) => v.trim())
    .filter((v) => v !== '')
    .slice(0, 500);
  const first = samples[0];
  if (first === undefined) return { format: null, reason: 'the time column is empty' };
  if (ISO_START.test(first)) return { format: 'iso' };
  if (ORDERED.test(first)) return detectOrdered(samples);
  if (NUMBER.test(first)) {
    const value = Number(first.replace(',', '.'));
    if (value >= EPOCH_MS_MIN) return { format: 'epoch-ms' };
    if (value >= EPOCH_S_MIN) return { format: 'epoch-s' };
    return { format: 'elapsed-s' };
  }
  if (CLOCK_DURATION.test(first)) return { format: 'elapsed-s' };
  return { format: null, reason: `time "${first}" is in no format Tidewright knows; choose one` };
}
