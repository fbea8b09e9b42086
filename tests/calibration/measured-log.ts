/**
 * Makes a "measured" level log from the engine: the example system simulated with known
 * coefficients, sampled like an ultrasonic logger (distance from a sensor above the bed, local
 * times with a preamble), with Gaussian noise from a seeded generator.
 */
import { simulate } from '../../engine/index';
import { EXAMPLE_SCENARIO_FILE, parseScenario, type Scenario } from '../../shared/scenario/index';
import {
  withCoefficients,
  type CoefficientValue,
} from '../../server/measurements/with-coefficients';

/** The example scenario, normalised. */
export function exampleScenario(): Scenario {
  const parsed = parseScenario(EXAMPLE_SCENARIO_FILE);
  if (!parsed.success) throw new Error('The example scenario no longer parses.');
  return parsed.scenario;
}

/** A deterministic standard normal generator (Box–Muller over a 32-bit LCG). */
export function gaussian(seed: number): () => number {
  let state = seed >>> 0;
  const uniform = (): number => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return (state + 0.5) / 2 ** 32;
  };
  return () => Math.sqrt(-2 * Math.log(uniform())) * Math.cos(2 * Math.PI * uniform());
}

/** What the log looks like. */
export interface LogSpec {
  truth: CoefficientValue[];
  /** Standard deviation of the level noise, m. */
  noiseM: number;
  /** Logger interval, s. */
  intervalS: number;
  /** Simulated time skipped before logging starts, and logged, s. */
  skipS: number;
  durationS: number;
  /** Height of the sensor's face above the bed floor, m. */
  mountingHeightM: number;
  seed: number;
}

/** Lisbon wall-clock text of a UTC instant in summer (UTC+1), "YYYY-MM-DD HH:MM:SS". */
function lisbonSummer(epochMs: number): string {
  return new Date(epochMs + 3_600_000).toISOString().slice(0, 19).replace('T', ' ');
}

/** The CSV text and the truth run's bed-a cycle figures (from its summary). */
export function measuredLog(spec: LogSpec): { csv: string; truthScenario: Scenario } {
  const truthScenario = withCoefficients(exampleScenario(), spec.truth);
  const outcome = simulate(truthScenario, {
    durationS: spec.skipS + spec.durationS,
    outputIntervalS: spec.intervalS,
  });
  const channel = outcome.result.series.channels.find((c) => c.id === 'level:bed-a');
  if (!channel) throw new Error('The simulation has no level:bed-a channel.');
  const noise = gaussian(spec.seed);
  const start = Date.UTC(2024, 5, 1, 8, 0, 0);
  const lines = ['# bench logger 7, ultrasonic', 'unit: mm', 'time,distance_mm,battery_v'];
  outcome.result.series.t_s.forEach((t, i) => {
    const onGrid = Math.abs(t / spec.intervalS - Math.round(t / spec.intervalS)) < 1e-9;
    if (!onGrid || t < spec.skipS) return;
    const distanceMm =
      (spec.mountingHeightM - (channel.values[i] ?? 0) - spec.noiseM * noise()) * 1000;
    lines.push(`${lisbonSummer(start + (t - spec.skipS) * 1000)},${distanceMm.toFixed(1)},3.71`);
  });
  return { csv: `${lines.join('\n')}\n`, truthScenario };
}
