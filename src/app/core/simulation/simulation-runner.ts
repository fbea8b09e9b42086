import { InjectionToken, signal } from '@angular/core';
import type { SimulationDone, SimulationReply, SimulationRequest } from './simulation-messages';

/** The part of `Worker` the runner uses, so specs can hand in a fake. */
export interface SimulationWorker {
  onmessage: ((event: MessageEvent<SimulationReply>) => void) | null;
  onerror: ((event: ErrorEvent) => void) | null;
  postMessage(request: SimulationRequest): void;
  terminate(): void;
}

/** Makes a fresh simulation worker (a new one after each cancel). */
export type SimulationWorkerFactory = () => SimulationWorker;

/** The worker factory; the default starts `simulation.worker.ts` as a module worker. */
export const SIMULATION_WORKER_FACTORY = new InjectionToken<SimulationWorkerFactory>(
  'SIMULATION_WORKER_FACTORY',
  {
    providedIn: 'root',
    factory: () => () =>
      new Worker(new URL('./simulation.worker', import.meta.url), { type: 'module' }),
  },
);

/** What a runner is doing. */
export type RunnerStatus = 'idle' | 'running' | 'done' | 'crashed';

/** A request as the page makes it (the runner numbers them). */
export type SimulationOrder = Omit<SimulationRequest, 'requestId'>;

/**
 * One simulation worker and the latest answer it gave. Runs one request at a time; a request made
 * while one is running replaces any waiting request, so a burst of edits costs one extra run, not
 * one per keystroke. `cancel()` terminates the worker (the engine cannot be interrupted from the
 * outside while it computes) and a new worker is started on the next request.
 */
export class SimulationRunner {
  private worker: SimulationWorker | null = null;
  private nextId = 1;
  private activeId: number | null = null;
  private waiting: SimulationOrder | null = null;
  private readonly statusSignal = signal<RunnerStatus>('idle');
  private readonly progressSignal = signal(0);
  private readonly doneSignal = signal<SimulationDone | null>(null);
  private readonly crashSignal = signal<string | null>(null);

  /** `running` from a request until its answer; then `done` or `crashed`; `idle` after cancel. */
  readonly status = this.statusSignal.asReadonly();
  /** Progress of the running request, 0..1. */
  readonly progress = this.progressSignal.asReadonly();
  /** The last finished request's answer (kept while the next one runs). */
  readonly done = this.doneSignal.asReadonly();
  /** Why the last request crashed, or null. */
  readonly crash = this.crashSignal.asReadonly();

  constructor(private readonly createWorker: SimulationWorkerFactory) {}

  /** Starts `order`, or queues it (replacing any queued one) while another runs. */
  run(order: SimulationOrder): void {
    if (this.activeId !== null) {
      this.waiting = order;
      return;
    }
    this.start(order);
  }

  /** Stops the running request and drops the queued one; the last answer stays readable. */
  cancel(): void {
    this.worker?.terminate();
    this.worker = null;
    this.activeId = null;
    this.waiting = null;
    this.progressSignal.set(0);
    this.statusSignal.set('idle');
  }

  /** Terminates the worker for good (call when the page goes away). */
  dispose(): void {
    this.cancel();
  }

  private start(order: SimulationOrder): void {
    const requestId = this.nextId++;
    this.activeId = requestId;
    this.progressSignal.set(0);
    this.statusSignal.set('running');
    this.ensureWorker().postMessage({ ...order, requestId });
  }

  private ensureWorker(): SimulationWorker {
    if (this.worker) return this.worker;
    const worker = this.createWorker();
    worker.onmessage = (event) => this.receive(event.data);
    worker.onerror = (event) =>
      this.fail(event.message || 'The simulation worker stopped unexpectedly.');
    this.worker = worker;
    return worker;
  }

  private receive(reply: SimulationReply): void {
    if (reply.requestId !== this.activeId) return;
    if (reply.kind === 'progress') {
      this.progressSignal.set(reply.fraction);
      return;
    }
    if (reply.kind === 'done') {
      this.doneSignal.set(reply);
      this.crashSignal.set(null);
      this.statusSignal.set('done');
    } else {
      this.crashSignal.set(reply.message);
      this.statusSignal.set('crashed');
    }
    this.progressSignal.set(1);
    this.finishAndStartWaiting();
  }

  private fail(message: string): void {
    this.crashSignal.set(message);
    this.statusSignal.set('crashed');
    this.worker?.terminate();
    this.worker = null;
    this.finishAndStartWaiting();
  }

  private finishAndStartWaiting(): void {
    this.activeId = null;
    const next = this.waiting;
    this.waiting = null;
    if (next) this.start(next);
  }
}
