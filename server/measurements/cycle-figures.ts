/** Cycle statistics of one bed from its drain cycles (prime → break), measured or simulated. */
import type { CycleFigures } from '../../shared/contracts/measurements';

/** One drain of a bed: the siphon primes at `primeS` at level `highM`, breaks at `breakS` at level `lowM`. */
export interface DrainCycle {
  primeS: number;
  breakS: number;
  highM: number;
  lowM: number;
}

/** Mean and sample standard deviation (0 for a single value); null for none. */
export interface Spread {
  mean: number;
  sd: number;
  count: number;
}

/** Spread of the finite values (a mark an event did not record is NaN and left out); null for none. */
export function spreadOf(all: readonly number[]): Spread | null {
  const values = all.filter(Number.isFinite);
  if (values.length === 0) return null;
  const mean = values.reduce((a, b) => a + b, 0) / values.length;
  const variance =
    values.length > 1 ? values.reduce((a, v) => a + (v - mean) ** 2, 0) / (values.length - 1) : 0;
  return { mean, sd: Math.sqrt(variance), count: values.length };
}

/** Per-figure spreads: flood = break → next prime, drain = prime → break, period = prime → next prime. */
export interface CycleSpreads {
  cycles: number;
  period: Spread | null;
  flood: Spread | null;
  drain: Spread | null;
  high: Spread | null;
  low: Spread | null;
}

/** Spreads of the figures over consecutive drain cycles (sorted by prime time). */
export function cycleSpreads(cycles: readonly DrainCycle[]): CycleSpreads {
  const periods: number[] = [];
  const floods: number[] = [];
  for (let i = 0; i + 1 < cycles.length; i++) {
    const here = cycles[i];
    const next = cycles[i + 1];
    if (!here || !next) continue;
    periods.push(next.primeS - here.primeS);
    floods.push(next.primeS - here.breakS);
  }
  return {
    cycles: cycles.length,
    period: spreadOf(periods),
    flood: spreadOf(floods),
    drain: spreadOf(cycles.map((c) => c.breakS - c.primeS)),
    high: spreadOf(cycles.map((c) => c.highM)),
    low: spreadOf(cycles.map((c) => c.lowM)),
  };
}

/** The means of `cycleSpreads` as the API shows them. */
export function cycleFigures(cycles: readonly DrainCycle[]): CycleFigures {
  return figuresFromSpreads(cycleSpreads(cycles));
}

/** The means of spreads (from cycles or a stopwatch log) as the API shows them. */
export function figuresFromSpreads(s: CycleSpreads): CycleFigures {
  return {
    cycles: s.cycles,
    periodS: s.period?.mean ?? null,
    floodS: s.flood?.mean ?? null,
    drainS: s.drain?.mean ?? null,
    highLevelM: s.high?.mean ?? null,
    lowLevelM: s.low?.mean ?? null,
  };
}
