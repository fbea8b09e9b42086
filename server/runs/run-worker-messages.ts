/** The messages between the run pool (main thread) and a run worker thread. */
import type { Verdict, RunEvent, RunStats, RunSummary } from '../../shared/contracts/runs';

/** Engine options a job runs with; recorded with the run so it can be reproduced. */
export interface RunJobOptions {
  durationS: number;
  outputIntervalS: number;
  maxSamples: number;
}

/** Main → worker: run one scenario. `stopFlag` is an Int32Array(1) over shared memory; 1 = cancel. */
export interface RunJobMessage {
  type: 'run';
  jobId: string;
  /** The normalised scenario (the stored snapshot, exactly). */
  scenario: unknown;
  options: RunJobOptions;
  timeLimitMs: number;
  stopFlag: SharedArrayBuffer;
}

/** The stored result parts of a run (everything but the series). */
export interface RunResultParts {
  summary: RunSummary;
  events: RunEvent[];
  verdicts: Verdict[];
  stats: RunStats;
  massBalanceError: number | null;
}

/** How a job ended, as the worker reports it. */
export interface RunJobOutcome {
  status: 'completed' | 'stopped' | 'failed' | 'cancelled';
  /** Why it did not complete, in words that say what to do; null when completed. */
  error: string | null;
  /** Partial for stopped/cancelled/failed runs when the engine returned one; null otherwise. */
  result: RunResultParts | null;
  /** gzip'd series (series-codec layout); null when there is none. */
  series: Uint8Array | null;
  sampleCount: number;
  wallMs: number;
}

/** Worker → main. */
export type RunWorkerMessage =
  | { type: 'ready' }
  | { type: 'progress'; jobId: string; fraction: number }
  | { type: 'done'; jobId: string; outcome: RunJobOutcome };
