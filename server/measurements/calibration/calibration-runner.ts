/**
 * Runs calibration fits in worker threads, one at a time per process (each fit already keeps a
 * core busy), with a short queue. A worker that overruns the fit's deadline by the grace period
 * is terminated.
 */
import { HttpError } from '../../http/http-error';
import { spawnTsWorker } from '../spawn-ts-worker';
import type { CalibrationProblem, FitLimits } from './calibration-problem';
import type { CalibrationWorkerMessage } from './calibration-worker-messages';
import type { FitOutcome } from './fit-calibration';

/** How long past its deadline a fit may run before its worker is terminated, ms. */
const GRACE_MS = 15_000;

function runInWorker(
  entry: URL,
  problem: CalibrationProblem,
  limits: FitLimits,
): Promise<FitOutcome> {
  return new Promise((resolve, reject) => {
    const worker = spawnTsWorker(entry);
    const timer = setTimeout(() => {
      void worker.terminate();
      reject(
        new HttpError(
          503,
          'CALIBRATION_TIMEOUT',
          'The calibration did not finish in time; fit fewer coefficients or use a shorter log.',
        ),
      );
    }, limits.deadlineMs + GRACE_MS);
    const finish = (): void => {
      clearTimeout(timer);
      void worker.terminate();
    };
    worker.once('message', (message: CalibrationWorkerMessage) => {
      finish();
      if (message.type === 'done') resolve(message.outcome);
      else reject(new Error(`The calibration failed: ${message.message}`));
    });
    worker.once('error', (error) => {
      finish();
      reject(error);
    });
    worker.postMessage({ problem, limits });
  });
}

/** The per-process queue of fits. */
export class CalibrationRunner {
  private running: Promise<unknown> = Promise.resolve();
  private waiting = 0;

  constructor(
    private readonly maxWaiting = 3,
    private readonly entry = new URL('./calibration-worker.ts', import.meta.url),
  ) {}

  /** Fits `problem` when the fits before it are done; 503 when too many are waiting. */
  async fit(problem: CalibrationProblem, limits: FitLimits): Promise<FitOutcome> {
    if (this.waiting >= this.maxWaiting) {
      throw new HttpError(
        503,
        'CALIBRATION_BUSY',
        'Other calibrations are running; try again in a minute.',
        undefined,
        { 'Retry-After': '60' },
      );
    }
    this.waiting++;
    const previous = this.running;
    const mine = previous
      .catch(() => undefined)
      .then(() => runInWorker(this.entry, problem, limits));
    this.running = mine.catch(() => undefined);
    try {
      return await mine;
    } finally {
      this.waiting--;
    }
  }
}

const runners = new WeakMap<object, CalibrationRunner>();

/** The runner of an app context (made on first use). */
export function calibrationRunnerFor(ctx: object): CalibrationRunner {
  let runner = runners.get(ctx);
  if (!runner) runners.set(ctx, (runner = new CalibrationRunner()));
  return runner;
}
