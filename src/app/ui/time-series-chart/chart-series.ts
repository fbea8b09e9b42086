/** One line of a chart: values in SI, one per sample time (null where there is no value). */
export interface ChartLine {
  readonly id: string;
  readonly label: string;
  readonly values: readonly (number | null)[];
}

/** Lines sharing one time axis, in seconds. */
export interface ChartSeriesSet {
  readonly t_s: readonly number[];
  readonly lines: readonly ChartLine[];
}

/** Line colours of our own water-and-stone palette, readable on light and dark surfaces. */
export const CHART_COLOURS: readonly string[] = [
  '#1f6f8b',
  '#c2410c',
  '#4d7c0f',
  '#7c3aed',
  '#be185d',
  '#a16207',
  '#0f766e',
  '#475569',
];

/** The colour of the line at `index` (the palette repeats). */
export function chartColour(index: number): string {
  return CHART_COLOURS[index % CHART_COLOURS.length] ?? '#1f6f8b';
}

/**
 * The index of the sample nearest to `timeS` in ascending `times` (binary search), or -1 when
 * there are no samples.
 */
export function nearestSampleIndex(times: readonly number[], timeS: number): number {
  if (times.length === 0) return -1;
  let low = 0;
  let high = times.length - 1;
  while (high - low > 1) {
    const middle = (low + high) >> 1;
    if ((times[middle] ?? 0) <= timeS) low = middle;
    else high = middle;
  }
  const below = Math.abs(timeS - (times[low] ?? 0));
  const above = Math.abs((times[high] ?? 0) - timeS);
  return above < below ? high : low;
}
