/**
 * Benchmark: a 50 × 50 operating-window sweep of a one-bed system (the classroom tabletop unit),
 * 2 simulated hours per cell, through the same cell runner and sweep pool the server uses (one
 * worker per core). Goal: under 10 s on a 2-core machine. Prints cold (including worker start)
 * and warm figures. Run alone: `npx tsx tests/bench/sweep-bench.ts`.
 */
import { readFileSync } from 'node:fs';
import { availableParallelism, loadavg } from 'node:os';
import { fileURLToPath } from 'node:url';
import type { SweepCell, SweepParameters } from '../../shared/contracts/sweeps';
import { parseScenario, type Scenario } from '../../shared/scenario/index';
import type { RunPool } from '../../server/runs/run-pool';
import { SweepCellRunner } from '../../server/sweeps/sweep-cell-runner';
import { makeSweepPool } from '../../server/sweeps/sweep-pool';

/** The figures of one timed sweep. */
export interface SweepBenchResult {
  cells: number;
  workers: number;
  wallMs: number;
  /** CPU time of the whole process (every worker thread and the main thread), ms. */
  cpuMs: number;
  cellsPerS: number;
  regimes: Record<string, number>;
}

const GOAL_MS = 10_000;

function tabletopScenario(): Scenario {
  const file: unknown = JSON.parse(
    readFileSync(
      fileURLToPath(new URL('../../scenarios/tabletop-classroom.json', import.meta.url)),
      'utf8',
    ),
  );
  const parsed = parseScenario(file);
  if (!parsed.success) throw new Error('scenarios/tabletop-classroom.json does not validate.');
  return parsed.scenario;
}

/** Pump flow ×0.5–3 (about 170–1000 L/h against a cycling range of about 250–440 L/h) by standpipe height 80–180 mm. */
function gridParameters(steps: number): SweepParameters {
  return {
    axes: [
      {
        parameter: 'pump-flow-scale',
        target: 'pump',
        from: 0.5,
        to: 3,
        steps,
        current: 1,
        label: 'pump flow scale',
      },
      {
        parameter: 'standpipe-height',
        target: 'bed',
        from: 0.08,
        to: 0.18,
        steps,
        current: 0.14,
        label: 'standpipe height',
      },
    ],
    bedId: 'bed',
    durationS: 2 * 3600,
  };
}

async function timeSweep(
  pool: RunPool,
  base: Scenario,
  steps: number,
  sweepId: string,
): Promise<SweepBenchResult> {
  const parameters = gridParameters(steps);
  const indices = Array.from({ length: steps * steps }, (_, k) => k);
  const cells: SweepCell[] = [];
  const started = performance.now();
  const cpuBefore = process.cpuUsage();
  await new SweepCellRunner(pool, { sweepId, base, parameters, indices }, (cell) =>
    cells.push(cell),
  ).run();
  const wallMs = performance.now() - started;
  const cpu = process.cpuUsage(cpuBefore);
  const regimes: Record<string, number> = {};
  for (const cell of cells) regimes[cell.regime] = (regimes[cell.regime] ?? 0) + 1;
  return {
    cells: cells.length,
    workers: pool.options.size,
    wallMs,
    cpuMs: (cpu.user + cpu.system) / 1000,
    cellsPerS: (1000 * cells.length) / wallMs,
    regimes,
  };
}

/** Runs the 50 × 50 sweep twice on a fresh pool (cold, then warm) and returns both figures. */
export async function runSweepBench(
  steps = 50,
): Promise<{ cold: SweepBenchResult; warm: SweepBenchResult }> {
  const pool = makeSweepPool(availableParallelism());
  try {
    const base = tabletopScenario();
    const cold = await timeSweep(pool, base, steps, 'bench-cold');
    const warm = await timeSweep(pool, base, steps, 'bench-warm');
    return { cold, warm };
  } finally {
    await pool.close();
  }
}

/**
 * One line per figure, as the bench prints them. On a machine busy with other work the wall time
 * says little, so the CPU time spread over the workers is shown too: the wall time the sweep would
 * take with the cores to itself.
 */
export function formatSweepBench(label: string, r: SweepBenchResult): string {
  const idleMs = r.cpuMs / r.workers;
  const verdict = (ms: number): string => (ms < GOAL_MS ? 'within' : 'over');
  const regimes = Object.entries(r.regimes)
    .map(([k, n]) => `${k} ${n}`)
    .join(', ');
  return [
    `sweep 50×50 ${label}: ${r.cells} cells of 2 h on ${r.workers} workers:`,
    `wall ${(r.wallMs / 1000).toFixed(2)} s (${verdict(r.wallMs)} the 10 s goal; load average ${loadavg()[0]?.toFixed(1)}),`,
    `CPU ${(r.cpuMs / 1000).toFixed(2)} s = ${(idleMs / 1000).toFixed(2)} s per worker (${verdict(idleMs)} the goal on idle cores)`,
    `— ${regimes}`,
  ].join(' ');
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  const { cold, warm } = await runSweepBench();
  process.stdout.write(`${formatSweepBench('cold', cold)}\n${formatSweepBench('warm', warm)}\n`);
}
