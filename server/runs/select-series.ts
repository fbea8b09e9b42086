/** Picks channels and thins samples of a decoded series for charts (`GET /api/runs/:id/series`). */
import { badRequest } from '../http/http-error';
import type { DecodedSeries } from './series-codec';

/** Which part of a series to return. */
export interface SeriesSelection {
  /** Comma-separated channel ids; all channels when absent. */
  channels?: string | undefined;
  /** Keep at most this many samples (>= 2), evenly strided; first and last always kept. */
  maxPoints?: number | undefined;
}

/** Sample indices 0..n-1 thinned to at most `maxPoints`, evenly spaced, first and last kept. */
export function strideIndices(n: number, maxPoints: number | undefined): number[] {
  if (maxPoints === undefined || n <= maxPoints) return Array.from({ length: n }, (_, i) => i);
  const indices: number[] = [];
  const step = (n - 1) / (maxPoints - 1);
  for (let k = 0; k < maxPoints; k += 1) indices.push(Math.round(k * step));
  return indices;
}

/** Returns the selected channels at the selected samples; an unknown channel id is a 400. */
export function selectSeries(series: DecodedSeries, selection: SeriesSelection): DecodedSeries {
  let channels = series.channels;
  if (selection.channels) {
    const wanted = selection.channels
      .split(',')
      .map((id) => id.trim())
      .filter(Boolean);
    const unknown = wanted.filter((id) => !series.channels.some((c) => c.id === id));
    if (unknown.length > 0) {
      const known = series.channels.map((c) => c.id).join(', ');
      throw badRequest(
        `Unknown series channel(s): ${unknown.join(', ')}. This run has: ${known}.`,
        [{ path: 'channels', message: `Unknown channel(s) ${unknown.join(', ')}.` }],
      );
    }
    channels = wanted
      .map((id) => series.channels.find((c) => c.id === id))
      .filter((c) => c !== undefined);
  }
  const indices = strideIndices(series.t_s.length, selection.maxPoints);
  if (indices.length === series.t_s.length) return { t_s: series.t_s, channels };
  const pick = (values: Float64Array): Float64Array =>
    Float64Array.from(indices, (i) => values[i] ?? Number.NaN);
  return {
    t_s: pick(series.t_s),
    channels: channels.map((c) => ({ ...c, values: pick(c.values) })),
  };
}
