import type { SimulationReply, SimulationRequest } from './simulation-messages';
import { type SimulationWorker, SimulationRunner } from './simulation-runner';
import type { Scenario } from '../../../../shared/scenario';

/** A worker double that records requests and lets the spec answer them. */
class FakeWorker implements SimulationWorker {
  onmessage: ((event: MessageEvent<SimulationReply>) => void) | null = null;
  onerror: ((event: ErrorEvent) => void) | null = null;
  readonly requests: SimulationRequest[] = [];
  terminated = false;

  postMessage(request: SimulationRequest): void {
    this.requests.push(request);
  }

  terminate(): void {
    this.terminated = true;
  }

  reply(reply: SimulationReply): void {
    this.onmessage?.(new MessageEvent('message', { data: reply }));
  }
}

const order = (durationS: number) => ({
  scenario: { name: `run ${durationS}` } as Scenario,
  durationS,
  budgetMs: 500,
  maxSamples: 100,
});

function done(requestId: number) {
  return {
    kind: 'done' as const,
    requestId,
    status: 'completed' as const,
    reason: null,
    stoppedByBudget: false,
    reachedS: 60,
    wallMs: 12,
    result: {
      summary: { beds: [], vessels: [], pumps: [] },
      events: [],
      verdicts: [],
      massBalanceError: 0,
      stats: {
        steps: 1,
        rejected: 0,
        rhsEvaluations: 6,
        events: 0,
        wall_ms: 12,
        simulated_s: 60,
        eventsOmitted: 0,
      },
      series: { t_s: [0, 60], channels: [] },
    },
  };
}

function setUp() {
  const workers: FakeWorker[] = [];
  const runner = new SimulationRunner(() => {
    const worker = new FakeWorker();
    workers.push(worker);
    return worker;
  });
  return { runner, workers };
}

describe('SimulationRunner', () => {
  it('sends a request, follows its progress and keeps its answer', () => {
    const { runner, workers } = setUp();
    runner.run(order(600));
    expect(runner.status()).toBe('running');
    const worker = workers[0]!;
    const id = worker.requests[0]!.requestId;
    worker.reply({ kind: 'progress', requestId: id, fraction: 0.4 });
    expect(runner.progress()).toBe(0.4);
    worker.reply(done(id));
    expect(runner.status()).toBe('done');
    expect(runner.done()?.reachedS).toBe(60);
  });

  it('runs only the latest of the requests made while one was running', () => {
    const { runner, workers } = setUp();
    runner.run(order(1));
    runner.run(order(2));
    runner.run(order(3));
    const worker = workers[0]!;
    expect(worker.requests.map((r) => r.durationS)).toEqual([1]);
    worker.reply(done(worker.requests[0]!.requestId));
    expect(worker.requests.map((r) => r.durationS)).toEqual([1, 3]);
    expect(runner.status()).toBe('running');
  });

  it('cancels by terminating the worker, ignores its late answers and starts a fresh one next time', () => {
    const { runner, workers } = setUp();
    runner.run(order(1));
    const first = workers[0]!;
    runner.cancel();
    expect(first.terminated).toBe(true);
    expect(runner.status()).toBe('idle');
    first.reply(done(first.requests[0]!.requestId));
    expect(runner.done()).toBeNull();
    runner.run(order(2));
    expect(workers.length).toBe(2);
    expect(workers[1]!.requests[0]!.requestId).not.toBe(first.requests[0]!.requestId);
  });

  it("reports a crash with the engine's message", () => {
    const { runner, workers } = setUp();
    runner.run(order(1));
    const worker = workers[0]!;
    worker.reply({
      kind: 'crashed',
      requestId: worker.requests[0]!.requestId,
      message: 'Pump "p" sits in no vessel.',
    });
    expect(runner.status()).toBe('crashed');
    expect(runner.crash()).toBe('Pump "p" sits in no vessel.');
  });
});
