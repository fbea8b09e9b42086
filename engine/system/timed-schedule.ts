import type { Scenario } from '../../shared/scenario';
import type { LeakComponent } from '../components/leak';
import type { PumpLineComponent } from '../components/pump-line';
import { formatSignificant as fmt } from '../results/format-significant';
import type { RunEvent } from '../results/run-result';

/**
 * The run's timed transitions: schedule entries (a pump switched on or off, the power cut or
 * restored) and leaks opening. Times are hit exactly by the integrator.
 */
export interface TimedSchedule {
  /** First due time strictly after `afterS`, or Infinity. */
  nextAfter(afterS: number): number;
  /** Applies everything due at or before `timeS` that has not been applied yet. */
  applyDue(timeS: number, log: (event: RunEvent) => void): void;
}

/** Builds the schedule of `scenario` acting on its pumps, power flag and leaks. */
export function makeTimedSchedule(
  scenario: Scenario,
  pumps: ReadonlyMap<string, PumpLineComponent>,
  power: { on: boolean },
  leaks: readonly LeakComponent[],
): TimedSchedule {
  const entries = scenario.schedule
    .map((entry, order) => ({ entry, order }))
    .sort((a, b) => a.entry.at - b.entry.at || a.order - b.order);
  const times = [
    ...new Set([...entries.map((e) => e.entry.at), ...leaks.map((leak) => leak.leak.start)]),
  ].sort((a, b) => a - b);
  let nextEntry = 0;
  return {
    nextAfter: (afterS) => {
      for (const t of times) if (t > afterS) return t;
      return Infinity;
    },
    applyDue: (timeS, log) => {
      while (nextEntry < entries.length && (entries[nextEntry]?.entry.at ?? Infinity) <= timeS) {
        const entry = entries[nextEntry]?.entry;
        nextEntry += 1;
        if (entry === undefined) continue;
        if ('power' in entry) power.on = entry.power === 'on';
        else {
          const pump = pumps.get(entry.pump);
          if (pump) pump.commandedOn = entry.state === 'on';
        }
      }
      for (const leak of leaks) {
        if (leak.open || leak.leak.start > timeS) continue;
        leak.open = true;
        const { from, diameter, elevation } = leak.leak;
        log({
          t_s: timeS,
          kind: 'leak-start',
          where: from,
          detail: `A ${fmt(diameter * 1000)} mm leak opened in ${from} at elevation ${fmt(elevation)} m (${leak.label}).`,
          values: { diameterM: diameter, elevationM: elevation },
        });
      }
    },
  };
}
