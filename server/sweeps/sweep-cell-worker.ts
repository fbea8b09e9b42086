/**
 * A worker thread for sweep cells, speaking the run pool's protocol: runs the engine on one cell's
 * scenario and answers with the result parts only. Unlike a stored run it sends no progress (a
 * cell takes milliseconds; thousands of progress messages would keep the main thread busy) and
 * no series (the map needs the summary and the events).
 */
import { performance } from 'node:perf_hooks';
import { parentPort } from 'node:worker_threads';
import { ScenarioModelError, simulate } from '../../engine/index';
import type { Scenario } from '../../shared/scenario/index';
import type { RunJobMessage, RunJobOutcome, RunWorkerMessage } from '../runs/run-worker-messages';
import { timeLimitMessage } from '../runs/time-limit-message';

const port = parentPort;
if (!port) throw new Error('sweep-cell-worker.ts must be started as a worker thread.');

const send = (message: RunWorkerMessage): void => port.postMessage(message);

function runCell(job: RunJobMessage): RunJobOutcome {
  const stopFlag = new Int32Array(job.stopFlag);
  const start = performance.now();
  let cause: 'cancel' | 'time' | null = null;
  const outcome = simulate(job.scenario as Scenario, {
    durationS: job.options.durationS,
    outputIntervalS: job.options.outputIntervalS,
    maxSamples: job.options.maxSamples,
    shouldStop: () => {
      if (Atomics.load(stopFlag, 0) !== 0) cause = 'cancel';
      else if (performance.now() - start > job.timeLimitMs) cause = 'time';
      return cause !== null;
    },
  });
  const wallMs = Math.round(performance.now() - start);
  const { summary, events, verdicts, stats, massBalanceError } = outcome.result;
  const result = {
    summary,
    events,
    verdicts,
    stats: { ...stats, wall_ms: wallMs },
    massBalanceError: Number.isFinite(massBalanceError) ? massBalanceError : null,
  };
  const ended =
    outcome.status === 'completed'
      ? { status: 'completed' as const, error: null }
      : cause === 'cancel'
        ? { status: 'cancelled' as const, error: 'Cancelled.' }
        : {
            status: 'failed' as const,
            error:
              cause === 'time'
                ? timeLimitMessage(job.timeLimitMs)
                : (outcome.reason ?? 'The engine stopped before the end of the run.'),
          };
  return { ...ended, result, series: null, sampleCount: 0, wallMs };
}

port.on('message', (job: RunJobMessage) => {
  let outcome: RunJobOutcome;
  try {
    outcome = runCell(job);
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    const why =
      error instanceof ScenarioModelError
        ? `The cell cannot be simulated as drawn: ${message}`
        : `The simulation stopped on an internal error (${message}).`;
    outcome = {
      status: 'failed',
      error: why,
      result: null,
      series: null,
      sampleCount: 0,
      wallMs: 0,
    };
  }
  send({ type: 'done', jobId: job.jobId, outcome });
});

send({ type: 'ready' });
