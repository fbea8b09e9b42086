/** Turns a measurement's cycles into the figures a calibration fits, each with its uncertainty. */
import type { CycleSpreads, Spread } from '../cycle-figures';
import type { FigureTarget } from './calibration-problem';

/** Where the figures come from: a logged series (knees located to a fraction of a sample) or a stopwatch. */
export type FigureSource = 'csv' | 'stopwatch';

/**
 * Floors of the standard uncertainty, added in quadrature to the standard error of the mean, so
 * that one cycle or identical cycles do not claim perfect figures. A logger: 0.5 s + 0.5 % on
 * times, 0.5 mm on marks. A stopwatch and a ruler: 1 s + 2 % and 3 mm (human reaction time and
 * reading a wet mark; common practice, no source).
 */
const FLOORS: Readonly<
  Record<FigureSource, { timeS: number; timeFraction: number; levelM: number }>
> = {
  csv: { timeS: 0.5, timeFraction: 0.005, levelM: 0.0005 },
  stopwatch: { timeS: 1, timeFraction: 0.02, levelM: 0.003 },
};

function sigmaOf(spread: Spread, floor: number): number {
  const standardError = spread.count > 1 ? spread.sd / Math.sqrt(spread.count) : 0;
  return Math.sqrt(standardError ** 2 + floor ** 2);
}

/**
 * Flood time, drain time and the high mark are fitted; the period (flood + drain again) and the
 * low mark (set by the bell's intake height, which no coefficient changes) are reported only.
 */
export function measuredTargets(spreads: CycleSpreads, source: FigureSource): FigureTarget[] {
  const floor = FLOORS[source];
  const time = (spread: Spread): number =>
    sigmaOf(spread, floor.timeS + floor.timeFraction * spread.mean);
  const figures: FigureTarget[] = [];
  const add = (
    metric: FigureTarget['metric'],
    spread: Spread | null,
    unit: 's' | 'm',
    fitted: boolean,
  ): void => {
    if (!spread) return;
    figures.push({
      metric,
      unit,
      measured: spread.mean,
      sigma: unit === 's' ? time(spread) : sigmaOf(spread, floor.levelM),
      fitted,
    });
  };
  add('flood', spreads.flood, 's', true);
  add('drain', spreads.drain, 's', true);
  add('high', spreads.high, 'm', true);
  add('period', spreads.period, 's', false);
  add('low', spreads.low, 'm', false);
  return figures;
}
