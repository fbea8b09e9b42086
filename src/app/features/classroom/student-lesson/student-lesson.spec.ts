import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import {
  QuestionListSchema,
  type Lesson,
  type MyAnswer,
} from '../../../../../shared/contracts/classroom';
import { EXAMPLE_SCENARIO_FILE } from '../../../../../shared/scenario';
import {
  SIMULATION_WORKER_FACTORY,
  type SimulationWorker,
} from '../../../core/simulation/simulation-runner';
import { StudentLesson } from './student-lesson';

const LESSON: Lesson = {
  id: '00000000-0000-4000-8000-000000000001',
  title: 'What sets the start',
  introduction: 'Predict, then run.',
  classId: '00000000-0000-4000-8000-000000000002',
  className: 'Greenhouse class',
  scenario: { ...EXAMPLE_SCENARIO_FILE },
  questions: QuestionListSchema.parse([
    { kind: 'bed-regime', id: 'regime', prompt: 'Will it start?', bedId: 'bed-a' },
    { kind: 'vessel-low-level', id: 'low', prompt: 'How low does the tank go?', vesselId: 'tank' },
  ]),
  published: true,
  revealed: false,
  myRole: 'student',
  myAnswer: null,
  answerKey: null,
  createdAt: '2030-01-01T00:00:00.000Z',
  updatedAt: '2030-01-01T00:00:00.000Z',
};

/** A worker that never answers, so the lesson's animation stays in preparation. */
const silentWorker = (): SimulationWorker => ({
  onmessage: null,
  onerror: null,
  postMessage: () => undefined,
  terminate: () => undefined,
});

async function render(lesson: Lesson) {
  TestBed.configureTestingModule({
    imports: [StudentLesson],
    providers: [
      provideHttpClient(),
      provideHttpClientTesting(),
      { provide: SIMULATION_WORKER_FACTORY, useValue: () => silentWorker() },
    ],
  });
  const fixture = TestBed.createComponent(StudentLesson);
  fixture.componentRef.setInput('lesson', lesson);
  const answered: MyAnswer[] = [];
  fixture.componentInstance.answered.subscribe((a) => answered.push(a));
  await fixture.whenStable();
  return {
    fixture,
    root: fixture.nativeElement as HTMLElement,
    http: TestBed.inject(HttpTestingController),
    answered,
  };
}

function button(root: HTMLElement, text: string): HTMLButtonElement {
  const found = [...root.querySelectorAll('button')].find((b) => b.textContent?.includes(text));
  if (!found) throw new Error(`No button "${text}".`);
  return found;
}

describe('StudentLesson', () => {
  it('keeps Run disabled until predictions are saved, and saves them in SI', async () => {
    const { fixture, root, http, answered } = await render(LESSON);
    expect(button(root, 'Run the system').disabled).toBe(true);
    expect(root.querySelector('tw-elevation-drawing svg')).not.toBeNull();

    const stall = [...root.querySelectorAll('mat-radio-button')].find((r) =>
      r.textContent?.includes('Stalls'),
    );
    stall?.querySelector<HTMLInputElement>('input')?.click();
    const level = root.querySelector<HTMLInputElement>('input[inputmode="decimal"]');
    if (!level) throw new Error('No number field.');
    level.value = '44';
    level.dispatchEvent(new Event('input'));
    button(root, 'Save predictions').click();
    await fixture.whenStable();

    const request = http.expectOne(`/api/lessons/${LESSON.id}/answer`);
    expect(request.request.method).toBe('PUT');
    expect(request.request.body).toEqual({
      predictions: [
        { questionId: 'regime', choice: 'spill-stall' },
        { questionId: 'low', value: 0.44 },
      ],
    });
    const saved: MyAnswer = {
      predictions: request.request.body.predictions,
      submittedAt: '2030-01-01T00:00:01.000Z',
      ranAt: null,
      simulation: null,
      outcomes: null,
    };
    request.flush(saved);
    await vi.waitFor(() => expect(answered).toEqual([saved]));
  });

  it('names the first unanswered question instead of saving', async () => {
    const { fixture, root, http } = await render(LESSON);
    button(root, 'Save predictions').click();
    await fixture.whenStable();
    expect(root.querySelector('[role="alert"]')?.textContent).toContain(
      'Answer question 1 before saving.',
    );
    http.expectNone(`/api/lessons/${LESSON.id}/answer`);
  });

  it('shows each prediction against the simulated value once run', async () => {
    const ran: MyAnswer = {
      predictions: [
        { questionId: 'regime', choice: 'spill-stall' },
        { questionId: 'low', value: 0.44 },
      ],
      submittedAt: '2030-01-01T00:00:01.000Z',
      ranAt: '2030-01-01T00:00:02.000Z',
      simulation: {
        status: 'completed',
        error: null,
        durationS: 3600,
        verdict: 'fails',
        verdicts: [],
        beds: [],
        vessels: [],
        levels: { t_s: [0, 5], channels: [{ where: 'tank', values: [0.5, 0.49] }] },
      },
      outcomes: [
        {
          questionId: 'regime',
          predicted: 'spill-stall',
          simulated: 'cycling',
          correct: false,
          difference: null,
        },
        { questionId: 'low', predicted: 0.44, simulated: 0.45, correct: true, difference: -0.01 },
      ],
    };
    const { root } = await render({ ...LESSON, myAnswer: ran });
    const rows = [...root.querySelectorAll('table.outcomes tbody tr')].map((tr) =>
      [...tr.querySelectorAll('td')].slice(1, 3).map((td) => td.textContent?.trim()),
    );
    expect(rows).toEqual([
      [
        'Stalls: trickles over the standpipe, never starts',
        'Cycles: floods, siphons, drains, again',
      ],
      ['44.0 cm', '45.0 cm'],
    ]);
    expect(root.querySelector('.score')?.textContent?.replace(/\s+/g, ' ').trim()).toBe(
      '1 of 2 predictions right.',
    );
    expect(root.querySelector('button.run-button')).toBeNull();
  });

  it('shows a run that did not finish and lets the student run again', async () => {
    const failed: MyAnswer = {
      predictions: [
        { questionId: 'regime', choice: 'cycling' },
        { questionId: 'low', value: 0.4 },
      ],
      submittedAt: '2030-01-01T00:00:01.000Z',
      ranAt: null,
      simulation: {
        status: 'failed',
        error: 'Stopped at the 60 s time limit for one run.',
        durationS: 3600,
        verdict: null,
        verdicts: [],
        beds: [],
        vessels: [],
        levels: { t_s: [], channels: [] },
      },
      outcomes: null,
    };
    const { root } = await render({ ...LESSON, myAnswer: failed });
    expect(root.querySelector('[role="alert"]')?.textContent).toContain(
      'did not finish: Stopped at the 60 s time limit',
    );
    expect(button(root, 'Run the system').disabled).toBe(false);
    expect(root.querySelector('table.outcomes')).toBeNull();
  });
});
