/**
 * The compact stored form of a run's series (the `runs.series` bytea column): one gzip'd blob,
 * not one row per sample. Layout before gzip (little-endian):
 *   "TWS1" · u32 header length · header JSON {sampleCount, channels: [{id, kind, where, unit}]}
 *   · zero padding to a multiple of 8 · Float64 t_s[n] · Float64 values[n] per channel, in order.
 * Float64 keeps every sample exactly (a CSV export equals the engine's numbers); NaN stays NaN.
 */
import { gunzipSync, gzipSync } from 'node:zlib';
import { z } from 'zod';
import type { RunSeries, SeriesChannel } from '../../shared/contracts/runs';
import { SeriesChannelSchema } from '../../shared/contracts/runs';

const MAGIC = 'TWS1';
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

/** Encodes a series into the gzip'd binary layout above; throws if a channel's length differs from t_s. */
export function encodeSeries(series: NumericSeries): Buffer {
  const n = series.t_s.length;
  const header = Buffer.from(
    JSON.stringify({
      sampleCount: n,
      channels: series.channels.map(({ id, kind, where, unit }) => ({ id, kind, where, unit })),
    }),
    'utf8',
  );
  const headEnd = 8 + header.length;
  const dataStart = Math.ceil(headEnd / 8) * 8;
  const raw = Buffer.alloc(dataStart + 8 * n * (1 + series.channels.length));
  raw.write(MAGIC, 0, 'latin1');
  raw.writeUInt32LE(header.length, 4);
  header.copy(raw, 8);
  const columns = new Float64Array(raw.buffer, raw.byteOffset + dataStart, n * (1 + series.channels.length));
  columns.set(Array.from(series.t_s), 0);
  series.channels.forEach((channel, index) => {
    if (channel.values.length !== n) {
      throw new Error(`Series channel ${channel.id} has ${channel.values.length} values for ${n} sample times.`);
    }
    columns.set(Array.from(channel.values), n * (index + 1));
  });
  return gzipSync(raw, { level: 6 });
}

/** Decodes a blob written by `encodeSeries`; throws on a blob of another format. */
export function decodeSeries(blob: Uint8Array): DecodedSeries {
  const raw = gunzipSync(blob);
  if (raw.toString('latin1', 0, 4) !== MAGIC) throw new Error('Stored series has an unknown format.');
  const headerLength = raw.readUInt32LE(4);
  const header = HeaderSchema.parse(JSON.parse(raw.toString('utf8', 8, 8 + headerLength)));
  const dataStart = Math.ceil((8 + headerLength) / 8) * 8;
  const n = header.sampleCount;
  // Copy into an aligned buffer: the gunzip result's byteOffset is not guaranteed to be a multiple of 8.
  const aligned = new Float64Array(n * (1 + header.channels.length));
  new Uint8Array(aligned.buffer).set(raw.subarray(dataStart, dataStart + aligned.byteLength));
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
