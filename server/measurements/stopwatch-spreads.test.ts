import { describe, expect, it } from 'vitest';
import { simulatedDrainCycles } from './simulated-drain-cycles';
import { stopwatchSpreads } from './stopwatch-spreads';

describe('stopwatchSpreads', () => {
  it('averages one bed’s timed cycles and skips marks that were not read', () => {
    const spreads = stopwatchSpreads(
      [
        { bed: 'a', fillTime: 240, drainTime: 60, highMark: 0.27 },
        { bed: 'a', fillTime: 260, drainTime: 64 },
        { bed: 'b', fillTime: 999, drainTime: 999 },
      ],
      'a',
    );
    expect(spreads.cycles).toBe(2);
    expect(spreads.flood).toEqual({ mean: 250, sd: Math.sqrt(200), count: 2 });
    expect(spreads.period?.mean).toBe(312);
    expect(spreads.high).toEqual({ mean: 0.27, sd: 0, count: 1 });
    expect(spreads.low).toBeNull();
  });
});

describe('simulatedDrainCycles', () => {
  it('pairs each priming with the next break of the same bed and reads their levels', () => {
    const cycles = simulatedDrainCycles(
      [
        { t_s: 5, kind: 'siphon-break', where: 'a' },
        { t_s: 10, kind: 'primed', where: 'a', values: { levelM: 0.27 } },
        { t_s: 12, kind: 'primed', where: 'b', values: { levelM: 0.2 } },
        { t_s: 70, kind: 'siphon-break', where: 'a', values: { levelM: 0.025 } },
        { t_s: 300, kind: 'primed', where: 'a' },
      ],
      'a',
      (t) => t / 1000,
    );
    expect(cycles).toEqual([{ primeS: 10, breakS: 70, highM: 0.27, lowM: 0.025 }]);
  });
});
