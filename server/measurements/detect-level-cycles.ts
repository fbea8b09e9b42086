/**
 * Finds the drain cycles in a measured bed level: where the siphon primed (the level stops
 * rising and falls fast) and where it broke (the level stops falling and rises again), with the
 * high and low marks, in a noisy, evenly or unevenly sampled series.
 *
 * Method: a 5-point running median (robust to spikes) is split into high and low excursions by
 * hysteresis thresholds at 30 % and 70 % of the 10–90 % level range. Each peak and trough is then
 * placed where two least-squares lines through the raw samples on either side cross (the slow
 * side and the fast side), iterated so that the windows sit on the right side of the crossing:
 * this averages the noise and places a knee between samples.
 */
import type { DrainCycle } from './cycle-figures';
import { fitLine } from './fit-line';

/** Samples taken on each side of a knee (fewer when the side is shorter). */
const KNEE_SAMPLES = 6;
/** Level ranges smaller than this (m) are noise, not cycles. */
const MIN_RANGE_M = 0.003;

function runningMedian(values: readonly number[], half = 2): number[] {
  return values.map((_, i) => {
    const window = values.slice(Math.max(0, i - half), i + half + 1).sort((a, b) => a - b);
    return window[Math.floor(window.length / 2)] ?? 0;
  });
}

function quantile(sorted: readonly number[], q: number): number {
  return sorted[Math.min(sorted.length - 1, Math.max(0, Math.round(q * (sorted.length - 1))))] ?? 0;
}

/** Index ranges [from, to) of the series above `hi` entered from below `lo` and left below `lo`. */
function highExcursions(
  s: readonly number[],
  lo: number,
  hi: number,
): { from: number; to: number }[] {
  const out: { from: number; to: number }[] = [];
  let state: 'low' | 'high' | 'unknown' = 'unknown';
  let from = -1;
  for (let i = 0; i < s.length; i++) {
    const v = s[i] ?? 0;
    if (state !== 'high' && v > hi) {
      from = state === 'low' ? i : -1;
      state = 'high';
    } else if (state !== 'low' && v < lo) {
      if (state === 'high' && from >= 0) out.push({ from, to: i });
      state = 'low';
    }
  }
  return out;
}

function argExtreme(s: readonly number[], from: number, to: number, sign: 1 | -1): number {
  let best = from;
  for (let i = from; i < to; i++) if (sign * ((s[i] ?? 0) - (s[best] ?? 0)) > 0) best = i;
  return best;
}

/** Which samples may serve on the fast side of a knee. */
type SideFilter = (value: number) => boolean;

/**
 * The crossing of the lines through the `KNEE_SAMPLES` samples just before and just after a knee
 * near index `center` (within [lower, upper)); the level is read on the `keep` side's line.
 */
function refineKnee(
  t: readonly number[],
  y: readonly number[],
  center: number,
  lower: number,
  upper: number,
  leftOk: SideFilter,
  rightOk: SideFilter,
  keep: 'left' | 'right',
): { timeS: number; levelM: number } {
  let tk = t[center] ?? 0;
  let level = y[center] ?? 0;
  for (let iteration = 0; iteration < 4; iteration++) {
    const left: number[] = [];
    for (let i = upper - 1; i >= lower && left.length < KNEE_SAMPLES; i--)
      if ((t[i] ?? 0) < tk && leftOk(y[i] ?? 0)) left.unshift(i);
    const right: number[] = [];
    for (let i = lower; i < upper && right.length < KNEE_SAMPLES; i++)
      if ((t[i] ?? 0) > tk && rightOk(y[i] ?? 0)) right.push(i);
    const l = fitLine(
      left.map((i) => t[i] ?? 0),
      left.map((i) => y[i] ?? 0),
    );
    const r = fitLine(
      right.map((i) => t[i] ?? 0),
      right.map((i) => y[i] ?? 0),
    );
    if (!l || !r || l.slope === r.slope) break;
    const crossing = (r.intercept - l.intercept) / (l.slope - r.slope);
    const lo = t[left.at(-1) ?? 0] ?? tk;
    const hi = t[right[0] ?? 0] ?? tk;
    const next = Math.min(hi, Math.max(lo, crossing));
    const line = keep === 'left' ? l : r;
    level = line.intercept + line.slope * next;
    if (Math.abs(next - tk) < 1e-9) break;
    tk = next;
  }
  return { timeS: tk, levelM: level };
}

/** The drain cycles of a bed level series (t strictly increasing, s; level m). */
export function detectLevelCycles(t: readonly number[], level: readonly number[]): DrainCycle[] {
  if (t.length < 8) return [];
  const s = runningMedian(level);
  const sorted = [...s].sort((a, b) => a - b);
  const q10 = quantile(sorted, 0.1);
  const range = quantile(sorted, 0.9) - q10;
  if (range < MIN_RANGE_M) return [];
  const highs = highExcursions(s, q10 + 0.3 * range, q10 + 0.7 * range);
  const cycles: DrainCycle[] = [];
  for (let k = 0; k < highs.length; k++) {
    const high = highs[k];
    const next = highs[k + 1];
    if (!high || !next) continue; // the trough after the last peak is not closed
    const previousEnd = highs[k - 1]?.to ?? 0;
    const peak = argExtreme(s, high.from, high.to, 1);
    const trough = argExtreme(s, high.to, next.from, -1);
    const peakS = s[peak] ?? 0;
    const troughS = s[trough] ?? 0;
    const middle = troughS + 0.5 * (peakS - troughS);
    const prime = refineKnee(
      t,
      level,
      peak,
      previousEnd,
      trough,
      () => true,
      (v) => v > middle,
      'left',
    );
    const broke = refineKnee(
      t,
      level,
      trough,
      peak,
      next.from + 1,
      (v) => v < middle,
      () => true,
      'right',
    );
    cycles.push({
      primeS: prime.timeS,
      breakS: broke.timeS,
      highM: prime.levelM,
      lowM: broke.levelM,
    });
  }
  return cycles;
}
