import { describe, expect, it } from 'vitest';
import { cycleFigures } from './cycle-figures';
import { detectLevelCycles } from './detect-level-cycles';

/** A deterministic normal generator (Box–Muller over a 32-bit LCG), so the test is repeatable. */
function gaussian(seed: number): () => number {
  let state = seed >>> 0;
  const uniform = (): number => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return (state + 0.5) / 2 ** 32;
  };
  return () => Math.sqrt(-2 * Math.log(uniform())) * Math.cos(2 * Math.PI * uniform());
}

/**
 * A piecewise-linear bed: fills 25 → 250 mm in 300 s, spills slowly to 262 mm in 20 s, primes,
 * drains to 25 mm in 60 s, breaks; period 380 s. The knees are exact, so the detector is judged
 * against known prime and break times.
 */
function sawtooth(timeS: number, offsetS: number): number {
  const phase = (((timeS - offsetS) % 380) + 380) % 380;
  if (phase < 300) return 0.025 + (0.225 * phase) / 300;
  if (phase < 320) return 0.25 + (0.012 * (phase - 300)) / 20;
  return 0.262 - (0.237 * (phase - 320)) / 60;
}

function sample(
  stepS: number,
  durationS: number,
  noiseM: number,
  offsetS = 37,
): { t: number[]; y: number[] } {
  const noise = gaussian(7);
  const t: number[] = [];
  const y: number[] = [];
  for (let time = 0; time <= durationS; time += stepS) {
    t.push(time);
    y.push(sawtooth(time, offsetS) + noiseM * noise());
  }
  return { t, y };
}

describe('detectLevelCycles', () => {
  it('places primes and breaks of a clean series between samples, at the true knees', () => {
    const { t, y } = sample(2, 2600, 0);
    const cycles = detectLevelCycles(t, y);
    expect(cycles.length).toBeGreaterThanOrEqual(5);
    for (const c of cycles) {
      const primeError = ((((c.primeS - 37 - 320) % 380) + 570) % 380) - 190;
      const breakError = ((((c.breakS - 37 - 380) % 380) + 570) % 380) - 190;
      expect(Math.abs(primeError)).toBeLessThan(0.05);
      expect(Math.abs(breakError)).toBeLessThan(0.05);
      expect(c.highM).toBeCloseTo(0.262, 4);
      expect(c.lowM).toBeCloseTo(0.025, 4);
    }
  });

  it('recovers the mean flood and drain times and marks through 1 mm of noise', () => {
    const { t, y } = sample(2, 4000, 0.001);
    const figures = cycleFigures(detectLevelCycles(t, y));
    expect(figures.cycles).toBeGreaterThanOrEqual(9);
    expect(figures.periodS).toBeCloseTo(380, 0);
    expect(Math.abs((figures.floodS ?? 0) - 320)).toBeLessThan(1.5);
    expect(Math.abs((figures.drainS ?? 0) - 60)).toBeLessThan(1.5);
    expect(Math.abs((figures.highLevelM ?? 0) - 0.262)).toBeLessThan(0.0008);
    expect(Math.abs((figures.lowLevelM ?? 0) - 0.025)).toBeLessThan(0.0008);
  });

  it('copes with coarse sampling and ignores a cycle cut off at either end', () => {
    const { t, y } = sample(10, 1900, 0.0005, 200);
    const cycles = detectLevelCycles(t, y);
    const figures = cycleFigures(cycles);
    expect(cycles.every((c) => c.primeS > t[0]! && c.breakS < t.at(-1)!)).toBe(true);
    expect(Math.abs((figures.drainS ?? 0) - 60)).toBeLessThan(4);
    expect(figures.periodS).toBeCloseTo(380, -1);
  });

  it('finds no cycle in a flat or too short series', () => {
    expect(detectLevelCycles([0, 1, 2], [0.1, 0.2, 0.1])).toEqual([]);
    const flat = sample(2, 1000, 0.0005);
    expect(
      detectLevelCycles(
        flat.t,
        flat.t.map((_, i) => 0.2 + (flat.y[i]! - sawtooth(flat.t[i]!, 37))),
      ),
    ).toEqual([]);
  });
});
