import { TestBed } from '@angular/core/testing';
import { simulate } from '../../../../../engine/index';
import { EXAMPLE_SCENARIO_FILE, parseScenario } from '../../../../../shared/scenario';
import type {
  SimulationReply,
  SimulationRequest,
} from '../../../core/simulation/simulation-messages';
import {
  SIMULATION_WORKER_FACTORY,
  type SimulationWorker,
} from '../../../core/simulation/simulation-runner';
import { CROSS_SECTION_FRAMES } from '../../cross-section/cross-section';
import type { FrameScheduler } from '../../cross-section/playback-controller';
import { LessonAnimation } from './lesson-animation';

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

/** Animation frames that never fire, so playback stays still. */
const STILL_FRAMES: FrameScheduler = {
  request: () => 1,
  cancel: () => undefined,
  now: () => 0,
};

async function render() {
  const workers: FakeWorker[] = [];
  TestBed.configureTestingModule({
    providers: [
      { provide: CROSS_SECTION_FRAMES, useValue: STILL_FRAMES },
      {
        provide: SIMULATION_WORKER_FACTORY,
        useValue: () => {
          const worker = new FakeWorker();
          workers.push(worker);
          return worker;
        },
      },
    ],
  });
  const fixture = TestBed.createComponent(LessonAnimation);
  fixture.componentRef.setInput('scenarioFile', { ...EXAMPLE_SCENARIO_FILE });
  fixture.componentRef.setInput('durationS', 600);
  await fixture.whenStable();
  return { fixture, workers, root: fixture.nativeElement as HTMLElement };
}

describe('LessonAnimation', () => {
  it('simulates the lesson finely in a worker, then shows the cross-section', async () => {
    const { fixture, workers, root } = await render();
    expect(workers).toHaveLength(1);
    const request = workers[0]!.requests[0]!;
    expect(request.durationS).toBe(600);
    expect(request.maxSamples).toBe(20000);
    expect(request.scenario.name).toBe(EXAMPLE_SCENARIO_FILE.name);
    expect(root.querySelector('tw-cross-section')).toBeNull();

    workers[0]!.reply({ kind: 'progress', requestId: request.requestId, fraction: 0.4 });
    await fixture.whenStable();
    expect(root.querySelector('mat-progress-bar')?.getAttribute('aria-valuenow')).toBe('40');

    const parsed = parseScenario(EXAMPLE_SCENARIO_FILE);
    if (!parsed.success) throw new Error('The example scenario is invalid.');
    const run = simulate(parsed.scenario, { durationS: 600 });
    workers[0]!.reply({
      kind: 'done',
      requestId: request.requestId,
      status: 'completed',
      reason: null,
      stoppedByBudget: false,
      reachedS: 600,
      wallMs: 5,
      result: run.result,
    });
    await fixture.whenStable();
    expect(root.querySelectorAll('tw-cross-section')).toHaveLength(1);
    expect(root.querySelector('mat-progress-bar')).toBeNull();
  });

  it('terminates its worker when it goes away', async () => {
    const { fixture, workers } = await render();
    fixture.destroy();
    expect(workers[0]!.terminated).toBe(true);
  });
});
