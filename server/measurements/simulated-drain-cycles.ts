/** The drain cycles of a bed in a simulation, from the engine's located `primed` and `siphon-break` events. */
import type { DrainCycle } from './cycle-figures';

/** The event fields used here (engine and stored runs alike). */
export interface CycleEvent {
  t_s: number;
  kind: string;
  where: string;
  values?: Record<string, number> | undefined;
}

/**
 * Pairs each `primed` event of `bed` with the next `siphon-break`: exact times (located by the
 * integrator) and the bed levels the events carry (`values.levelM`), else `levelAt(t)` from the
 * sampled series, else NaN.
 */
export function simulatedDrainCycles(
  events: readonly CycleEvent[],
  bed: string,
  levelAt?: (timeS: number) => number,
): DrainCycle[] {
  const level = (event: CycleEvent): number =>
    event.values?.['levelM'] ?? levelAt?.(event.t_s) ?? Number.NaN;
  const cycles: DrainCycle[] = [];
  let primed: CycleEvent | undefined;
  for (const event of events) {
    if (event.where !== bed) continue;
    if (event.kind === 'primed') primed = event;
    else if (event.kind === 'siphon-break' && primed) {
      cycles.push({
        primeS: primed.t_s,
        breakS: event.t_s,
        highM: level(primed),
        lowM: level(event),
      });
      primed = undefined;
    }
  }
  return cycles;
}
