import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import type { System } from '../../../../../shared/contracts/systems';
import type {
  SimulationReply,
  SimulationRequest,
} from '../../../core/simulation/simulation-messages';
import {
  SIMULATION_WORKER_FACTORY,
  type SimulationWorker,
} from '../../../core/simulation/simulation-runner';
import { EXAMPLE_TWO_BED_SCENARIO } from '../example-two-bed-scenario';
import { SystemEditor } from './system-editor';

const ID = '44444444-4444-4444-8444-444444444444';

/** Records what the editor asks the simulation worker and answers each with an empty result. */
class RecordingWorker implements SimulationWorker {
  static readonly requests: SimulationRequest[] = [];
  onmessage: ((event: MessageEvent<SimulationReply>) => void) | null = null;
  onerror: ((event: ErrorEvent) => void) | null = null;
  postMessage(request: SimulationRequest): void {
    RecordingWorker.requests.push(request);
    const reply: SimulationReply = {
      kind: 'done',
      requestId: request.requestId,
      status: 'completed',
      reason: null,
      stoppedByBudget: false,
      reachedS: request.durationS,
      wallMs: 1,
      result: {
        summary: { beds: [], vessels: [], pumps: [] },
        events: [],
        verdicts: [],
        massBalanceError: 0,
        stats: {
          steps: 0,
          rejected: 0,
          rhsEvaluations: 0,
          events: 0,
          wall_ms: 1,
          eventsOmitted: 0,
          simulated_s: request.durationS,
        },
        series: { t_s: [], channels: [] },
      },
    };
    setTimeout(() => this.onmessage?.(new MessageEvent('message', { data: reply })));
  }
  terminate(): void {}
}

function system(version: number): System {
  return {
    id: ID,
    name: 'Two beds',
    version,
    scenario: structuredClone(EXAMPLE_TWO_BED_SCENARIO) as unknown as Record<string, unknown>,
    ownerId: ID,
    ownerName: 'Dana Demo',
    access: 'owner',
    lastVerdict: null,
    calibration: null,
    createdAt: '2026-01-01T00:00:00.000Z',
    updatedAt: '2026-01-01T00:00:00.000Z',
  };
}

const pause = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

async function render() {
  RecordingWorker.requests.length = 0;
  TestBed.configureTestingModule({
    providers: [
      provideRouter([]),
      provideHttpClient(),
      provideHttpClientTesting(),
      { provide: SIMULATION_WORKER_FACTORY, useValue: () => new RecordingWorker() },
    ],
  });
  const fixture = TestBed.createComponent(SystemEditor);
  fixture.componentRef.setInput('id', ID);
  const http = TestBed.inject(HttpTestingController);
  await fixture.whenStable();
  http.expectOne(`/api/systems/${ID}`).flush(system(3));
  await pause(0);
  await fixture.whenStable();
  return { fixture, http, root: fixture.nativeElement as HTMLElement };
}

/** Types `text` into bed-a's standpipe height and returns at once, before any debounce ends. */
async function typeStandpipeHeight(
  fixture: { whenStable(): Promise<unknown> },
  root: HTMLElement,
  text: string,
) {
  const bedsTab = [...root.querySelectorAll<HTMLElement>('[role=tab]')].find((tab) =>
    tab.textContent?.includes('Beds'),
  );
  bedsTab?.click();
  await fixture.whenStable();
  const field = [...root.querySelectorAll('tw-quantity-input')].find((q) =>
    q.textContent?.includes('Standpipe height'),
  );
  const input = field?.querySelector('input');
  if (!input) throw new Error('No standpipe height field on the Beds tab.');
  input.value = text;
  input.dispatchEvent(new Event('input'));
}

async function openBedsAndType(
  fixture: { whenStable(): Promise<unknown> },
  root: HTMLElement,
  text: string,
) {
  await typeStandpipeHeight(fixture, root, text);
  await pause(200);
  await fixture.whenStable();
}

function runButton(root: HTMLElement): HTMLButtonElement {
  const found = root.querySelector<HTMLButtonElement>('button.run');
  if (!found) throw new Error('No run button.');
  return found;
}

// Rendering the whole editor in jsdom takes seconds on a busy machine; the cap is not a speed test.
describe('SystemEditor', { timeout: 30_000 }, () => {
  it('starts a short live check of the loaded system in the worker', async () => {
    await render();
    const first = RecordingWorker.requests[0];
    expect(first?.durationS).toBe(3600);
    expect(first?.budgetMs).toBeGreaterThan(0);
    expect(first?.scenario.vessels.map((v) => v.id)).toEqual(['tank', 'bed-a', 'bed-b']);
  });

  it('redraws the standpipe and asks for a new live check when its height is typed', async () => {
    const { fixture, root } = await render();
    const drawn = () =>
      Number(root.querySelector('rect.standpipe[data-id="bed-a"]')?.getAttribute('height'));
    const before = drawn();
    await openBedsAndType(fixture, root, '0.2');
    expect(drawn()).toBeCloseTo((before * 0.2) / 0.25, 6);
    const latest = RecordingWorker.requests.at(-1)?.scenario.vessels[1];
    expect(latest?.kind === 'bed' ? latest.drain.standpipe.height : null).toBe(0.2);
  });

  it('names the problem under the field and stops live checks when the standpipe is taller than the bed', async () => {
    const { fixture, root } = await render();
    const asked = RecordingWorker.requests.length;
    await openBedsAndType(fixture, root, '0.5');
    const field = [...root.querySelectorAll('tw-quantity-input')].find((q) =>
      q.textContent?.includes('Standpipe height'),
    );
    expect(field?.querySelector('mat-error')?.textContent).toMatch(/standpipe/i);
    expect(root.querySelector('.issues')?.textContent).toContain(
      'vessels[1].drain.standpipe.height',
    );
    expect(RecordingWorker.requests.length).toBe(asked);
  });

  it('saves with the loaded version and offers to reload when someone saved first', async () => {
    const { fixture, http, root } = await render();
    await openBedsAndType(fixture, root, '0.2');
    const save = [...root.querySelectorAll<HTMLButtonElement>('button')].find((b) =>
      b.textContent?.trim().endsWith('Save'),
    );
    save?.click();
    const put = http.expectOne({ method: 'PUT', url: `/api/systems/${ID}` });
    const body = put.request.body as {
      version: number;
      scenario: { vessels: { drain?: { standpipe: { height: number } } }[] };
    };
    expect(body.version).toBe(3);
    expect(body.scenario.vessels[1]?.drain?.standpipe.height).toBe(0.2);
    put.flush(
      { error: { code: 'STALE_VERSION', message: 'Stale.' } },
      { status: 409, statusText: 'Conflict' },
    );
    await pause(0);
    await fixture.whenStable();
    expect(root.querySelector('.banner')?.textContent).toContain(
      'Someone saved this system after you opened it',
    );
  });

  it('saves the value typed just before "Save and run" is clicked, then runs it', async () => {
    const { fixture, http, root } = await render();
    await typeStandpipeHeight(fixture, root, '0.2');
    // The click comes with the keystroke, before the form's debounced copy of the document.
    fixture.detectChanges();
    expect(runButton(root).textContent).toContain('Save and run');
    runButton(root).click();
    const put = http.expectOne({ method: 'PUT', url: `/api/systems/${ID}` });
    const body = put.request.body as {
      scenario: { vessels: { drain?: { standpipe: { height: number } } }[] };
    };
    expect(body.scenario.vessels[1]?.drain?.standpipe.height).toBe(0.2);
    const saved = system(4);
    saved.scenario = body.scenario as unknown as Record<string, unknown>;
    put.flush(saved);
    await pause(0);
    const started = http.expectOne({ method: 'POST', url: `/api/systems/${ID}/runs` });
    started.flush(
      { error: { code: 'INTERNAL', message: 'No runner in this test.' } },
      { status: 500, statusText: 'Server Error' },
    );
    await pause(0);
    await fixture.whenStable();
    expect(root.querySelector('.save-state')?.textContent?.trim()).toBe('Saved');
  });

  it('refuses to save a value typed just before the click that breaks a rule', async () => {
    const { fixture, http, root } = await render();
    await typeStandpipeHeight(fixture, root, '0.5');
    fixture.detectChanges();
    runButton(root).click();
    await pause(0);
    http.expectNone({ method: 'PUT', url: `/api/systems/${ID}` });
    http.expectNone({ method: 'POST', url: `/api/systems/${ID}/runs` });
    await fixture.whenStable();
    expect(root.querySelector('.issues')?.textContent).toContain(
      'vessels[1].drain.standpipe.height',
    );
  });

  it('saves a float switch added on its tab, its levels in metres', async () => {
    const { fixture, http, root } = await render();
    const tab = [...root.querySelectorAll<HTMLElement>('[role=tab]')].find((candidate) =>
      candidate.textContent?.includes('Switches and faults'),
    );
    tab?.click();
    await fixture.whenStable();
    const add = [...root.querySelectorAll<HTMLButtonElement>('button')].find((b) =>
      b.textContent?.includes('Add a float switch'),
    );
    add?.click();
    await fixture.whenStable();
    const levelField = (label: string) => {
      const input = [...root.querySelectorAll('tw-quantity-input')]
        .find((q) => q.querySelector('mat-label')?.textContent?.trim() === label)
        ?.querySelector('input');
      if (!input) throw new Error(`No "${label}" field.`);
      return input;
    };
    for (const [label, text] of [
      ['Stops below', '30 cm'],
      ['Restarts above', '0.45'],
    ] as const) {
      levelField(label).value = text;
      levelField(label).dispatchEvent(new Event('input'));
    }
    fixture.detectChanges();
    root.querySelector<HTMLButtonElement>('button.save')?.click();
    const put = http.expectOne({ method: 'PUT', url: `/api/systems/${ID}` });
    const body = put.request.body as { scenario: { controls?: unknown[] } };
    expect(body.scenario.controls).toEqual([
      { kind: 'float-switch', pump: 'pump', vessel: 'tank', stopBelow: 0.3, restartAbove: 0.45 },
    ]);
  });
});
