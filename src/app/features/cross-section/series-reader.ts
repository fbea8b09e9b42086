import type { CrossSectionSeries } from './cross-section-data';

/**
 * Reads a run's series at any time between samples, fast enough to call many times per animation
 * frame: the channels are copied once into typed arrays (null becomes NaN) and the sample index
 * of the last lookup is kept as a hint, so playing forward costs O(1) per lookup and a jump costs
 * one binary search.
 */
export class SeriesReader {
  /** Time of the first and last sample, s (0 and 0 when there are none). */
  readonly startS: number;
  readonly endS: number;
  private readonly times: Float64Array;
  private readonly channels = new Map<string, Float64Array>();
  private hint = 0;

  constructor(series: CrossSectionSeries) {
    this.times = Float64Array.from(series.t_s);
    for (const channel of series.channels) {
      this.channels.set(
        channel.id,
        Float64Array.from(channel.values, (v) => (v === null ? Number.NaN : v)),
      );
    }
    this.startS = this.times[0] ?? 0;
    this.endS = this.times[this.times.length - 1] ?? 0;
  }

  /** Whether the series has channel `id`. */
  has(id: string): boolean {
    return this.channels.has(id);
  }

  /** The sample times (shared, not copied). */
  sampleTimes(): Float64Array {
    return this.times;
  }

  /**
   * The index of the last sample at or before `timeS` (the later one where a time repeats), or -1
   * before the first sample.
   */
  indexAt(timeS: number): number {
    const times = this.times;
    const n = times.length;
    if (n === 0 || timeS < (times[0] as number)) return -1;
    let i = Math.min(this.hint, n - 1);
    if ((times[i] as number) <= timeS && (i + 1 >= n || (times[i + 1] as number) > timeS)) return i;
    // Playing forward: the answer is usually the next sample.
    if ((times[i] as number) <= timeS && (i + 2 >= n || (times[i + 2] as number) > timeS)) {
      this.hint = i + 1;
      return i + 1;
    }
    let low = 0;
    let high = n - 1;
    while (low < high) {
      const middle = (low + high + 1) >> 1;
      if ((times[middle] as number) <= timeS) low = middle;
      else high = middle - 1;
    }
    i = low;
    this.hint = i;
    return i;
  }

  /**
   * Channel `id` at `timeS`, linear between samples; the first value before the first sample and
   * the last after the last. NaN for an unknown channel or where the series has no value.
   */
  valueAt(id: string, timeS: number): number {
    const values = this.channels.get(id);
    if (!values || values.length === 0) return Number.NaN;
    const i = this.indexAt(timeS);
    if (i < 0) return values[0] as number;
    if (i + 1 >= values.length) return values[i] as number;
    const t0 = this.times[i] as number;
    const t1 = this.times[i + 1] as number;
    const v0 = values[i] as number;
    const v1 = values[i + 1] as number;
    return t1 > t0 ? v0 + ((v1 - v0) * (timeS - t0)) / (t1 - t0) : v1;
  }

  /** Channel `id` held from the last sample at or before `timeS` (for codes such as phases). */
  heldAt(id: string, timeS: number): number {
    const values = this.channels.get(id);
    if (!values || values.length === 0) return Number.NaN;
    return values[Math.max(0, this.indexAt(timeS))] as number;
  }

  /** The largest absolute value of channel `id` (0 when unknown or empty). */
  largest(id: string): number {
    let largest = 0;
    for (const v of this.channels.get(id) ?? []) if (Math.abs(v) > largest) largest = Math.abs(v);
    return largest;
  }
}
