/**
 * The compact stored form of a run's series (the `runs.series` bytea column): one gzip'd blob,
 * not one row per sample. Layout before gzip:
 *   "TWS2" · u32 LE header length · header JSON {sampleCount, channels: [{id, kind, where, unit}]}
 *   · zero padding to a multiple of 8 · the columns t_s[n], then values[n] per channel, as
 *   little-endian Float64 whose bytes are split into 8 planes (byte 0 of every value, then byte 1…).
 * Float64 keeps every sample exactly (a CSV export equals the engine's numbers; NaN stays NaN). The
 * byte planes put the slowly changing sign/exponent bytes together, so gzip packs a 24 h greenhouse
 * run about 20 % smaller and faster than the plain columns ("TWS1", still read).
 */
import { gunzipSync, gzipSync } from 'node:zlib';
import { z } from 'zod';
import type { RunSeries, SeriesChannel } from '../../shared/contracts/runs';
import { SeriesChannelSchema } from '../../shared/contracts/runs';

const MAGIC = 'TWS2';
const PLAIN_MAGIC = 'TWS1';
const HeaderSchema = z.object({
  sampleCount: z.number().int().nonnegative(),
  channels: z.array(SeriesChannelSchema.omit({ values: true })),
});

/** A series as the engine produces it (values may hold NaN). */
export interface NumericSeries {
  t_s: ArrayLike<number>;
  channels: ReadonlyArray<Omit<SeriesChannel, 'values'> & { values: ArrayLike<number> }>;
}

/** A decoded series: columns as Float64Array views. */
export interface DecodedSeries {
  t_s: Float64Array;
  channels: Array<Omit<SeriesChannel, 'values'> & { values: Float64Array }>;
}

/** Splits the bytes of `count` 8-byte values into 8 planes (or joins them back with `join`). */
function bytePlanes(source: Uint8Array, count: number, join: boolean): Uint8Array {
  const out = new Uint8Array(count * 8);
  for (let i = 0; i < count; i += 1) {
    for (let b = 0; b < 8; b += 1) {
      if (join) out[i * 8 + b] = source[b * count + i] ?? 0;
      else out[b * count + i] = source[i * 8 + b] ?? 0;
    }
  }
  return out;
}

/** The columns (t_s, then each channel) as one little-endian Float64 array. */
function columnsOf(series: NumericSeries): Float64Array {
  const n = series.t_s.length;
  const columns = new Float64Array(n * (1 + series.channels.length));
  columns.set(Array.from(series.t_s), 0);
  series.channels.forEach((channel, index) => {
    if (channel.values.length !== n) {
      throw new Error(
        `Series channel ${channel.id} has ${channel.values.length} values for ${n} sample times.`,
      );
    }
    columns.set(Array.from(channel.values), n * (index + 1));
  });
  return columns;
}

/** Encodes a series into the gzip'd layout above; throws if a channel's length differs from t_s. */
export function encodeSeries(series: NumericSeries): Buffer {
  const header = Buffer.from(
    JSON.stringify({
      sampleCount: series.t_s.length,
      channels: series.channels.map(({ id, kind, where, unit }) => ({ id, kind, where, unit })),
    }),
    'utf8',
  );
  const columns = columnsOf(series);
  const dataStart = Math.ceil((8 + header.length) / 8) * 8;
  const raw = Buffer.alloc(dataStart + columns.byteLength);
  raw.write(MAGIC, 0, 'latin1');
  raw.writeUInt32LE(header.length, 4);
  header.copy(raw, 8);
  raw.set(bytePlanes(new Uint8Array(columns.buffer), columns.length, false), dataStart);
  return gzipSync(raw, { level: 6 });
}

/** Decodes a blob written by `encodeSeries` (or the earlier plain-column form); throws on another format. */
export function decodeSeries(blob: Uint8Array): DecodedSeries {
  const raw = gunzipSync(blob);
  const magic = raw.toString('latin1', 0, 4);
  if (magic !== MAGIC && magic !== PLAIN_MAGIC)
    throw new Error('Stored series has an unknown format.');
  const headerLength = raw.readUInt32LE(4);
  const header = HeaderSchema.parse(JSON.parse(raw.toString('utf8', 8, 8 + headerLength)));
  const dataStart = Math.ceil((8 + headerLength) / 8) * 8;
  const n = header.sampleCount;
  const count = n * (1 + header.channels.length);
  const stored = raw.subarray(dataStart, dataStart + count * 8);
  // Copy into a fresh, aligned buffer: gunzip's result need not start on an 8-byte boundary.
  const aligned = new Float64Array(count);
  new Uint8Array(aligned.buffer).set(magic === MAGIC ? bytePlanes(stored, count, true) : stored);
  return {
    t_s: aligned.subarray(0, n),
    channels: header.channels.map((channel, index) => ({
      ...channel,
      values: aligned.subarray(n * (index + 1), n * (index + 2)),
    })),
  };
}

/** Turns a decoded series into its JSON form: NaN (no value) becomes null. */
export function seriesToJson(series: DecodedSeries): RunSeries {
  const toList = (values: Float64Array): Array<number | null> =>
    Array.from(values, (v) => (Number.isFinite(v) ? v : null));
  return {
    t_s: Array.from(series.t_s),
    channels: series.channels.map((c) => ({ ...c, values: toList(c.values) })),
  };
}
