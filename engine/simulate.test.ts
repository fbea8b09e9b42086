import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseScenario, type Scenario } from '../shared/scenario';
import { simulate } from './index';

function load(name: string): Scenario {
  const parsed = parseScenario(
    JSON.parse(readFileSync(join(__dirname, '../scenarios', name), 'utf8')),
  );
  if (!parsed.success) throw new Error(name);
  return parsed.scenario;
}

describe('simulate', () => {
  it('reports progress as increasing fractions that end at 1', () => {
    const fractions: number[] = [];
    simulate(load('tabletop-classroom.json'), {
      durationS: 1800,
      onProgress: (f) => fractions.push(f),
    });
    expect(fractions.length).toBeGreaterThan(10);
    expect(fractions).toEqual([...fractions].sort((a, b) => a - b));
    expect(fractions[fractions.length - 1]).toBe(1);
  });

  it('stops when asked and returns the partial result up to that time', () => {
    let polls = 0;
    const outcome = simulate(load('tabletop-classroom.json'), {
      durationS: 3600,
      shouldStop: () => ++polls > 200,
    });
    expect(outcome.status).toBe('stopped');
    const reached = outcome.result.stats.simulated_s;
    expect(reached).toBeGreaterThan(0);
    expect(reached).toBeLessThan(3600);
    expect(outcome.result.series.t_s[outcome.result.series.t_s.length - 1]).toBeLessThanOrEqual(
      reached,
    );
  });

  it('fails with a reason and the partial result instead of skipping a NaN', () => {
    const scenario = load('power-cut-and-leak-drill.json');
    const broken: Scenario = {
      ...scenario,
      leaks: scenario.leaks.map((leak) => ({ ...leak, dischargeCoefficient: Number.NaN })),
    };
    const outcome = simulate(broken);
    expect(outcome.status).toBe('failed');
    expect(outcome.reason).toMatch(/not finite|NaN/);
    expect(outcome.result.stats.simulated_s).toBeCloseTo(7200, 6);
    expect(outcome.result.events.some((e) => e.kind === 'pump-off')).toBe(true);
  });

  it('samples the series on the output grid, plus the states just before and after each transition', () => {
    const { series, stats } = simulate(load('tabletop-classroom.json'), {
      durationS: 600,
      outputIntervalS: 2,
    }).result;
    const gridSamples = 600 / 2 + 1;
    expect(stats.events).toBeGreaterThan(3);
    expect(series.t_s.length).toBe(gridSamples + 2 * stats.events);
    expect(series.t_s.filter((t) => t % 2 === 0).length).toBeGreaterThanOrEqual(gridSamples);
    for (const c of series.channels) expect(c.values.length).toBe(series.t_s.length);
  });

  it('keeps the series and the events within maxSamples whatever the run length, with the same cycle statistics', () => {
    const scenario = load('greenhouse-three-beds.json');
    const short = simulate(scenario, { durationS: 6 * 3600, maxSamples: 500 }).result;
    const long = simulate(scenario, { durationS: 24 * 3600, maxSamples: 500 }).result;
    const full = simulate(scenario, { durationS: 24 * 3600 }).result;
    expect(short.series.t_s.length).toBeLessThanOrEqual(500);
    expect(long.series.t_s.length).toBe(short.series.t_s.length);
    expect(long.events.length).toBeLessThanOrEqual(500 + 20);
    expect(full.events.length).toBeGreaterThan(1500);
    expect(long.stats.eventsOmitted).toBe(full.events.length - long.events.length);
    expect(long.summary.beds).toEqual(full.summary.beds);
  });

  it('agrees with exact hydraulics at every evaluation to within 1e-6 in the cycle period', () => {
    const scenario = load('tabletop-classroom.json');
    const tabulated = simulate(scenario, { durationS: 1800 }).result.summary.beds[0];
    const exact = simulate(scenario, { durationS: 1800, hydraulics: 'exact' }).result.summary
      .beds[0];
    expect(exact?.cycles).toBe(tabulated?.cycles);
    expect(Math.abs((exact?.periodMean_s ?? 0) / (tabulated?.periodMean_s ?? 1) - 1)).toBeLessThan(
      1e-6,
    );
  });
});
