/**
 * `npm run bench`: runs fixed scenarios several times and prints medians of wall time, simulated
 * seconds per wall second, steps and right-hand-side evaluations per cycle; compares the adaptive
 * engine with a naive fixed-step Euler solver at equal accuracy on the cycle period; and checks that
 * memory stays flat with run length when the series is downsampled.
 */
import { readFileSync } from 'node:fs';
import { cpus, loadavg } from 'node:os';
import { join } from 'node:path';
import { setFlagsFromString } from 'node:v8';
import { runInNewContext } from 'node:vm';
import { parseScenario, type Scenario } from '../../shared/scenario';
import {
  simulate,
  SystemModel,
  type SimulateOptions,
  type SimulationOutcome,
} from '../../engine/index';
import { integrateNaiveEuler } from './naive-euler';
import { formatSweepBench, runSweepBench } from './sweep-bench';

const RUNS = 7;

function load(name: string): Scenario {
  const parsed = parseScenario(
    JSON.parse(readFileSync(join(import.meta.dirname, '../../scenarios', name), 'utf8')),
  );
  if (!parsed.success) throw new Error(`${name} is invalid`);
  return parsed.scenario;
}

const median = (values: number[]): number => {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)] as number;
};

/** One run with its wall time and its process CPU time (what a shared machine cannot inflate), ms. */
function timed(
  scenario: Scenario,
  options: SimulateOptions,
): { wallMs: number; cpuMs: number; outcome: SimulationOutcome } {
  const cpu = process.cpuUsage();
  const start = performance.now();
  const outcome = simulate(scenario, options);
  const wallMs = performance.now() - start;
  const used = process.cpuUsage(cpu);
  return { wallMs, cpuMs: (used.user + used.system) / 1000, outcome };
}

function throughput(label: string, file: string, durationS: number, goalMs?: number): void {
  const scenario = load(file);
  const options = { durationS, maxSamples: 2000 };
  timed(scenario, options);
  const walls: number[] = [];
  const cpuTimes: number[] = [];
  let last: SimulationOutcome | undefined;
  for (let k = 0; k < RUNS; k += 1) {
    const run = timed(scenario, options);
    walls.push(run.wallMs);
    cpuTimes.push(run.cpuMs);
    last = run.outcome;
  }
  if (!last) return;
  const { stats, summary } = last.result;
  const cycles = summary.beds.reduce((sum, bed) => sum + bed.cycles, 0);
  const wall = median(walls);
  console.log(
    `${label.padEnd(28)} ${(durationS / 3600).toFixed(0).padStart(3)} h  wall median ${wall.toFixed(1).padStart(6)} ms (min ${Math.min(...walls).toFixed(1)}), CPU median ${median(cpuTimes).toFixed(1)} ms  ${Math.round(
      durationS / (wall / 1000),
    )
      .toLocaleString('en')
      .padStart(
        10,
      )} sim s/wall s  ${cycles} cycles  ${(stats.steps / cycles).toFixed(1)} steps/cycle  ${(stats.rhsEvaluations / cycles).toFixed(0)} evaluations/cycle  (${stats.steps} steps, ${stats.rejected} rejected, ${stats.rhsEvaluations} evaluations, ${stats.events} events)`,
  );
  if (goalMs === undefined) return;
  const cpu = median(cpuTimes);
  const verdict = cpu <= goalMs ? 'met' : `not met, ${(cpu / goalMs).toFixed(1)}× over`;
  console.log(
    `${''.padEnd(28)} goal ${goalMs} ms: ${verdict} (CPU median); ${((1000 * cpu) / stats.rhsEvaluations).toFixed(2)} µs per right-hand-side evaluation, all costs included`,
  );
}

/** Mean period over the first seven cycles (the same cycles in every run being compared), s. */
const meanPeriodS = (events: readonly { kind: string; t_s: number }[]): number => {
  const primes = events.filter((e) => e.kind === 'primed').map((e) => e.t_s);
  if (primes.length < 8) throw new Error('fewer than eight primings to compare');
  return ((primes[7] as number) - (primes[0] as number)) / 7;
};

function eulerComparison(): void {
  const scenario = load('tabletop-classroom.json');
  const durationS = 3600;
  const reference = meanPeriodS(
    simulate({ ...scenario, run: { ...scenario.run, tolerance: 1e-12 } }, { durationS }).result
      .events,
  );
  console.log(
    `\nAdaptive Cash–Karp against naive fixed-step Euler (${scenario.name}, 1 h): error of the mean cycle period against a 1e-12 run (${reference.toFixed(6)} s)`,
  );
  const euler: { stepS: number; error: number; wallMs: number; steps: number }[] = [];
  for (const stepS of [0.4, 0.2, 0.1, 0.05, 0.025, 0.0125, 0.00625]) {
    const model = new SystemModel(scenario);
    const start = performance.now();
    const steps = integrateNaiveEuler(model, durationS, stepS);
    const wallMs = performance.now() - start;
    const error = Math.abs(meanPeriodS(model.events) / reference - 1);
    euler.push({ stepS, error, wallMs, steps });
    console.log(
      `  Euler h = ${String(stepS).padEnd(6)} s: period error ${error.toExponential(2)}, ${steps} steps, ${wallMs.toFixed(0)} ms`,
    );
  }
  const finest = euler[euler.length - 1];
  if (!finest) return;
  const perStepMs = finest.wallMs / finest.steps;
  for (const tolerance of [1e-8, 1e-6, 1e-4]) {
    const runs = Array.from({ length: RUNS }, () =>
      timed({ ...scenario, run: { ...scenario.run, tolerance } }, { durationS, maxSamples: 2000 }),
    );
    const wall = median(runs.map((r) => r.wallMs));
    const error = Math.abs(meanPeriodS(runs[0]?.outcome.result.events ?? []) / reference - 1);
    // The coarsest Euler run at least as accurate, if one was run; else Euler's first order
    // (error ∝ h) from the finest run tells how many steps it would need.
    const matching = euler.find((e) => e.error <= error);
    const eulerMs = matching
      ? matching.wallMs
      : (durationS / (finest.stepS * (error / finest.error))) * perStepMs;
    const how = matching
      ? `measured at h = ${matching.stepS} s`
      : `extrapolated at first order to h ≈ ${(finest.stepS * (error / finest.error)).toExponential(1)} s`;
    console.log(
      `  adaptive, tolerance ${tolerance.toExponential(0)}: period error ${error.toExponential(2)} in ${wall.toFixed(1)} ms; Euler at equal accuracy ${(eulerMs / 1000).toPrecision(3)} s (${how}): ratio ${Math.round(eulerMs / wall).toLocaleString('en')}×`,
    );
  }
}

function memory(): void {
  setFlagsFromString('--expose_gc');
  const gc = runInNewContext('gc') as () => void;
  const scenario = load('greenhouse-three-beds.json');
  console.log(
    '\nMemory with the series downsampled to 1000 samples (greenhouse): heap retained by the result',
  );
  for (const hours of [6, 24, 72]) {
    gc();
    const before = process.memoryUsage().heapUsed;
    const outcome = simulate(scenario, { durationS: hours * 3600, maxSamples: 1000 });
    gc();
    const retained = process.memoryUsage().heapUsed - before;
    const json = JSON.stringify(outcome.result).length;
    console.log(
      `  ${String(hours).padStart(3)} h: ${outcome.result.series.t_s.length} samples, ${outcome.result.events.length} events, result ${(json / 1024).toFixed(0)} KiB as JSON, heap +${(retained / 1024 / 1024).toFixed(2)} MiB`,
    );
  }
}

console.log(
  `Tidewright engine bench: medians of ${RUNS} runs after one warm-up; series downsampled to 2000 samples; load average ${loadavg()[0]?.toFixed(1)} on ${cpus().length} cores.`,
);
throughput('one bed (classroom tabletop)', 'tabletop-classroom.json', 24 * 3600, 10);
throughput('greenhouse, three beds', 'greenhouse-three-beds.json', 24 * 3600, 50);
throughput('drill (power cut, leak)', 'power-cut-and-leak-drill.json', 4 * 3600);
eulerComparison();
memory();

// The operating-window sweep: 50 × 50 cells of 2 h through the server's worker pool.
const sweep = await runSweepBench();
console.log(`\n${formatSweepBench('cold', sweep.cold)}\n${formatSweepBench('warm', sweep.warm)}`);
