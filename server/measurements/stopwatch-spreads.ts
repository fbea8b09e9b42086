/** Cycle figures of one bed from a stopwatch log. */
import type { StopwatchEntry } from '../../shared/contracts/measurements';
import { spreadOf, type CycleSpreads } from './cycle-figures';

/**
 * Each entry is one observed cycle: fill time (break → prime), drain time (prime → break), and
 * the high and low marks when read; the period of an entry is fill + drain.
 */
export function stopwatchSpreads(entries: readonly StopwatchEntry[], bed: string): CycleSpreads {
  const mine = entries.filter((e) => e.bed === bed);
  const marks = (pick: (e: StopwatchEntry) => number | undefined): number[] =>
    mine.map(pick).filter((v): v is number => v !== undefined);
  return {
    cycles: mine.length,
    period: spreadOf(mine.map((e) => e.fillTime + e.drainTime)),
    flood: spreadOf(mine.map((e) => e.fillTime)),
    drain: spreadOf(mine.map((e) => e.drainTime)),
    high: spreadOf(marks((e) => e.highMark)),
    low: spreadOf(marks((e) => e.lowMark)),
  };
}
