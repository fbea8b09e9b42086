/**
 * A pool of run worker threads (node:worker_threads) with a FIFO queue: the event loop never
 * runs the engine. Each job reports progress, can be cancelled (a shared-memory stop flag the
 * engine polls), and is stopped at a wall-time limit; a worker that does not answer within a grace
 * period after a stop is terminated and replaced.
 */
import { availableParallelism } from 'node:os';
import { Worker } from 'node:worker_threads';
import type { RunJobOptions, RunJobOutcome, RunWorkerMessage } from './run-worker-messages';
import { timeLimitMessage } from './time-limit-message';

/** Pool settings. */
export interface RunPoolOptions {
  /** Worker threads at most (spawned on demand). */
  size: number;
  /** Wall time one run may take, ms; the engine is asked to stop then. */
  timeLimitMs: number;
  /** How long a worker may take to honour a stop before it is terminated, ms. */
  graceMs: number;
  /** Most jobs waiting in the queue; more are refused. */
  maxQueued: number;
  /** Most samples per channel a run may record. */
  maxSamples: number;
  /** Longest simulated duration a run may ask for, s. */
  maxDurationS: number;
  /** Most runs one user may have queued or running at once. */
  maxActivePerUser: number;
}

/** Defaults: one worker per spare core (at most 2), 2 min per run, 100 000 samples, 30 days simulated. */
export function defaultRunPoolOptions(cores = availableParallelism()): RunPoolOptions {
  return {
    size: Math.max(1, Math.min(2, cores - 1)),
    timeLimitMs: 120_000,
    graceMs: 3_000,
    maxQueued: 20,
    maxSamples: 100_000,
    maxDurationS: 30 * 24 * 3600,
    maxActivePerUser: 3,
  };
}

/** One job: the normalised scenario, engine options and what to do with the outcome. */
export interface RunJob {
  id: string;
  scenario: unknown;
  options: RunJobOptions;
  /** Called when a worker picks the job up. */
  onStart?: () => void;
  /** Stores the outcome; the job counts as ended once this settles. */
  onEnd: (outcome: RunJobOutcome) => Promise<void>;
}

/** Thrown by `submit` when the queue is full. */
export class RunQueueFullError extends Error {
  readonly code = 'RUN_QUEUE_FULL';
}

interface Pending {
  job: RunJob;
  stopFlag: Int32Array;
  progress: number;
  resolve: (outcome: RunJobOutcome) => void;
  ended: Promise<void>;
  worker?: PoolWorker;
  killTimer?: NodeJS.Timeout;
}

interface PoolWorker {
  thread: Worker;
  ready: boolean;
  current?: Pending;
}

/** The worker entry that runs the engine. */
const RUN_WORKER_ENTRY = new URL('./run-worker.ts', import.meta.url);

/**
 * Starts a worker thread on a TypeScript entry: a tiny eval bootstrap loads tsx's API, which
 * imports the entry (works under `node --import tsx`, tsx and vitest alike; Node 20 does not apply
 * `--import` hooks to a worker's own entry file).
 */
function spawnRunWorker(entryUrl: URL): Worker {
  const api = import.meta.resolve('tsx/esm/api');
  const entry = entryUrl.href;
  const code = `import(${JSON.stringify(api)}).then((m) => m.tsImport(${JSON.stringify(entry)}, ${JSON.stringify(entry)}));`;
  return new Worker(code, { eval: true, execArgv: [] });
}

const failedOutcome = (error: string): RunJobOutcome => ({
  status: 'failed',
  error,
  result: null,
  series: null,
  sampleCount: 0,
  wallMs: 0,
});

/** The run pool; one per process (main.ts creates and closes it). */
export class RunPool {
  private readonly workers: PoolWorker[] = [];
  private readonly queue: Pending[] = [];
  private readonly jobs = new Map<string, Pending>();
  /** Jobs whose engine work is over but whose `onEnd` is still storing the outcome. */
  private readonly ending = new Map<string, Promise<void>>();
  private closed = false;

  /** `workerEntry` is the worker's module (the engine runner; tests pass a scripted one). */
  constructor(
    readonly options: RunPoolOptions,
    private readonly workerEntry: URL = RUN_WORKER_ENTRY,
  ) {}

  /**
   * Queues a job. The promise settles once the job's `onEnd` has stored its outcome (it rejects
   * only if `onEnd` does). Throws RunQueueFullError at once when the queue is full.
   */
  submit(job: RunJob): Promise<void> {
    if (this.closed) throw new Error('The run pool is closed.');
    if (this.queue.length >= this.options.maxQueued) {
      throw new RunQueueFullError(
        `The server already has ${this.queue.length} runs waiting; try again in a minute.`,
      );
    }
    let resolve: (outcome: RunJobOutcome) => void = () => {};
    const outcome = new Promise<RunJobOutcome>((r) => {
      resolve = r;
    });
    const ended = outcome.then((o) => job.onEnd(o)).finally(() => this.ending.delete(job.id));
    const pending: Pending = {
      job,
      stopFlag: new Int32Array(new SharedArrayBuffer(4)),
      progress: 0,
      resolve,
      ended,
    };
    this.jobs.set(job.id, pending);
    this.queue.push(pending);
    this.dispatch();
    return ended;
  }

  /** Whether a job is waiting or running here, and its progress 0..1; undefined when not here. */
  status(jobId: string): { state: 'queued' | 'running'; progress: number } | undefined {
    const pending = this.jobs.get(jobId);
    if (pending)
      return { state: pending.worker ? 'running' : 'queued', progress: pending.progress };
    return this.ending.has(jobId) ? { state: 'running', progress: 1 } : undefined;
  }

  /**
   * Asks a job to stop (a queued one ends at once) and resolves once its outcome is stored.
   * Resolves false when the job is not here.
   */
  async cancel(jobId: string): Promise<boolean> {
    const pending = this.jobs.get(jobId);
    if (!pending) {
      const ending = this.ending.get(jobId);
      if (ending) await ending.catch(() => undefined);
      return ending !== undefined;
    }
    if (!pending.worker) {
      this.queue.splice(this.queue.indexOf(pending), 1);
      this.settle(pending, {
        ...failedOutcome('Cancelled before it started.'),
        status: 'cancelled',
      });
    } else {
      Atomics.store(pending.stopFlag, 0, 1);
      this.armKill(
        pending,
        this.options.graceMs,
        'Cancelled; the simulation did not stop in time, so its worker was stopped.',
      );
    }
    await pending.ended.catch(() => undefined);
    return true;
  }

  /** Number of jobs queued or running. */
  get size(): number {
    return this.jobs.size;
  }

  /** Ends every job as failed ("server stopped"), waits for their outcomes to be stored, stops the workers. */
  async close(): Promise<void> {
    this.closed = true;
    this.queue.length = 0;
    const ended = [...this.jobs.values()].map((pending) => pending.ended);
    for (const pending of [...this.jobs.values()]) {
      this.settle(pending, failedOutcome('The server stopped during this run; run it again.'));
    }
    await Promise.all(this.workers.map((w) => w.thread.terminate()));
    this.workers.length = 0;
    await Promise.allSettled([...ended, ...this.ending.values()]);
  }

  private dispatch(): void {
    while (this.queue.length > 0) {
      const worker = this.idleWorker();
      if (!worker) return;
      const pending = this.queue.shift();
      if (!pending) return;
      this.start(worker, pending);
    }
  }

  private idleWorker(): PoolWorker | undefined {
    const idle = this.workers.find((w) => w.ready && !w.current);
    if (idle) return idle;
    if (this.workers.length < this.options.size) this.addWorker();
    return undefined;
  }

  private start(worker: PoolWorker, pending: Pending): void {
    worker.current = pending;
    pending.worker = worker;
    worker.thread.ref();
    pending.job.onStart?.();
    worker.thread.postMessage({
      type: 'run',
      jobId: pending.job.id,
      scenario: pending.job.scenario,
      options: pending.job.options,
      timeLimitMs: this.options.timeLimitMs,
      stopFlag: pending.stopFlag.buffer,
    });
    this.armKill(
      pending,
      this.options.timeLimitMs + this.options.graceMs,
      timeLimitMessage(this.options.timeLimitMs),
    );
  }

  private armKill(pending: Pending, afterMs: number, error: string): void {
    if (pending.killTimer) clearTimeout(pending.killTimer);
    pending.killTimer = setTimeout(() => {
      // Retire the stuck worker before settling, so the queue is not dispatched onto it.
      if (pending.worker) this.retire(pending.worker);
      const cancelled = Atomics.load(pending.stopFlag, 0) !== 0;
      this.settle(pending, { ...failedOutcome(error), status: cancelled ? 'cancelled' : 'failed' });
    }, afterMs);
    pending.killTimer.unref();
  }

  private addWorker(): void {
    const worker: PoolWorker = { thread: spawnRunWorker(this.workerEntry), ready: false };
    this.workers.push(worker);
    worker.thread.on('message', (message: RunWorkerMessage) => this.onMessage(worker, message));
    worker.thread.on('error', (error) => this.onCrash(worker, error.message));
    worker.thread.on('exit', (code) => this.onCrash(worker, `exit code ${code}`));
  }

  private onMessage(worker: PoolWorker, message: RunWorkerMessage): void {
    if (message.type === 'ready') {
      worker.ready = true;
      worker.thread.unref();
      this.dispatch();
      return;
    }
    const pending = worker.current;
    if (!pending || pending.job.id !== message.jobId) return;
    if (message.type === 'progress') pending.progress = message.fraction;
    else this.settle(pending, message.outcome);
  }

  private onCrash(worker: PoolWorker, why: string): void {
    const index = this.workers.indexOf(worker);
    if (index < 0) return;
    this.workers.splice(index, 1);
    if (worker.current)
      this.settle(
        worker.current,
        failedOutcome(`The simulation worker stopped unexpectedly (${why}); run it again.`),
      );
    if (!this.closed) this.dispatch();
  }

  private retire(worker: PoolWorker): void {
    const index = this.workers.indexOf(worker);
    if (index >= 0) this.workers.splice(index, 1);
    void worker.thread.terminate();
  }

  private settle(pending: Pending, outcome: RunJobOutcome): void {
    if (!this.jobs.has(pending.job.id)) return;
    this.jobs.delete(pending.job.id);
    this.ending.set(pending.job.id, pending.ended);
    if (pending.killTimer) clearTimeout(pending.killTimer);
    const worker = pending.worker;
    if (worker && worker.current === pending) {
      worker.current = undefined;
      worker.thread.unref();
    }
    pending.resolve(outcome);
    if (!this.closed) this.dispatch();
  }
}
