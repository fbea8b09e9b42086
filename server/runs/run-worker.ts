/**
 * A run worker thread: runs the engine on one scenario at a time, off the server's event loop.
 * Reports progress (at most every 1 %), stops when the shared stop flag is set or the time limit
 * passes, and sends back the result with the series already encoded and gzip'd (so the main thread
 * only stores bytes).
 */
import { performance } from 'node:perf_hooks';
import { parentPort } from 'node:worker_threads';
import { ScenarioModelError, simulate, type SimulationOutcome } from '../../engine/index';
import type { Scenario } from '../../shared/scenario/index';
import type {
  RunJobMessage,
  RunJobOutcome,
  RunResultParts,
  RunWorkerMessage,
} from './run-worker-messages';
import { encodeSeries } from './series-codec';
import { timeLimitMessage } from './time-limit-message';

const port = parentPort;
if (!port) throw new Error('run-worker.ts must be started as a worker thread.');

function send(message: RunWorkerMessage, transfer: ArrayBuffer[] = []): void {
  port?.postMessage(message, transfer);
}

function resultParts(outcome: SimulationOutcome, wallMs: number): RunResultParts {
  const { summary, events, verdicts, stats, massBalanceError } = outcome.result;
  return {
    summary,
    events,
    verdicts,
    stats: { ...stats, wall_ms: wallMs },
    massBalanceError: Number.isFinite(massBalanceError) ? massBalanceError : null,
  };
}

function describeStop(
  cause: 'cancel' | 'time' | null,
  job: RunJobMessage,
  reason: string | undefined,
) {
  if (cause === 'cancel')
    return {
      status: 'cancelled' as const,
      error: 'Cancelled before the end; the result is partial.',
    };
  if (cause === 'time')
    return { status: 'failed' as const, error: timeLimitMessage(job.timeLimitMs) };
  return {
    status: 'stopped' as const,
    error: reason ?? 'The engine stopped before the end of the run.',
  };
}

function runJob(job: RunJobMessage): { outcome: RunJobOutcome; transfer: ArrayBuffer[] } {
  const stopFlag = new Int32Array(job.stopFlag);
  const start = performance.now();
  let cause: 'cancel' | 'time' | null = null;
  let lastReported = -1;
  const outcome = simulate(job.scenario as Scenario, {
    durationS: job.options.durationS,
    outputIntervalS: job.options.outputIntervalS,
    maxSamples: job.options.maxSamples,
    onProgress: (fraction) => {
      if (fraction - lastReported < 0.01 && fraction < 1) return;
      lastReported = fraction;
      send({ type: 'progress', jobId: job.jobId, fraction: Math.min(1, Math.max(0, fraction)) });
    },
    shouldStop: () => {
      if (Atomics.load(stopFlag, 0) !== 0) cause = 'cancel';
      else if (performance.now() - start > job.timeLimitMs) cause = 'time';
      return cause !== null;
    },
  });
  const wallMs = Math.round(performance.now() - start);
  const sampleCount = outcome.result.series.t_s.length;
  if (sampleCount > job.options.maxSamples) {
    const error = `The run recorded ${sampleCount} samples, over the limit of ${job.options.maxSamples}; lengthen run.outputInterval or shorten the duration.`;
    return {
      outcome: { status: 'failed', error, result: null, series: null, sampleCount: 0, wallMs },
      transfer: [],
    };
  }
  const encoded = sampleCount > 0 ? new Uint8Array(encodeSeries(outcome.result.series)) : null;
  const ended =
    outcome.status === 'completed'
      ? { status: 'completed' as const, error: null }
      : outcome.status === 'failed'
        ? { status: 'failed' as const, error: outcome.reason ?? 'The simulation failed.' }
        : describeStop(cause, job, outcome.reason);
  return {
    outcome: {
      ...ended,
      result: resultParts(outcome, wallMs),
      series: encoded,
      sampleCount,
      wallMs,
    },
    transfer: encoded ? [encoded.buffer as ArrayBuffer] : [],
  };
}

port.on('message', (job: RunJobMessage) => {
  try {
    const { outcome, transfer } = runJob(job);
    send({ type: 'done', jobId: job.jobId, outcome }, transfer);
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    const outcome: RunJobOutcome = {
      status: 'failed',
      error:
        error instanceof ScenarioModelError
          ? `The system cannot be simulated as drawn: ${message}`
          : `The simulation stopped on an internal error (${message}); please report it with the scenario.`,
      result: null,
      series: null,
      sampleCount: 0,
      wallMs: 0,
    };
    send({ type: 'done', jobId: job.jobId, outcome });
  }
});

send({ type: 'ready' });
