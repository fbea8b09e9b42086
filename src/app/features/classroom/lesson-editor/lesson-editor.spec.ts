import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { signal } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { Router, provideRouter } from '@angular/router';
import { QuestionListSchema, type Lesson } from '../../../../../shared/contracts/classroom';
import type { System, SystemList } from '../../../../../shared/contracts/systems';
import { EXAMPLE_SCENARIO_FILE } from '../../../../../shared/scenario';
import { UnitPreference } from '../../systems/unit-preference';
import { LessonEditor } from './lesson-editor';

const LESSON: Lesson = {
  id: '00000000-0000-4000-8000-000000000001',
  title: 'What sets the start',
  introduction: 'Predict, then run.',
  classId: null,
  className: null,
  scenario: { ...EXAMPLE_SCENARIO_FILE, name: 'Bench rig' },
  questions: QuestionListSchema.parse([
    { kind: 'bed-period', id: 'period', prompt: 'How long?', bedId: 'bed-a', tolerance: 0.15 },
    {
      kind: 'bed-regime',
      id: 'regime',
      prompt: 'Will it start?',
      bedId: 'bed-a',
      choices: ['cycling', 'siphon-lock'],
    },
    { kind: 'vessel-low-level', id: 'low', prompt: 'How low?', vesselId: 'tank' },
  ]),
  published: false,
  revealed: false,
  myRole: 'instructor',
  myAnswer: null,
  answerKey: null,
  createdAt: '2030-01-01T00:00:00.000Z',
  updatedAt: '2030-01-01T00:00:00.000Z',
};
const URL = `/api/lessons/${LESSON.id}`;

/** Opens the editor on LESSON (as `served`) and waits for the form to fill. */
async function openEditor(served: Lesson = LESSON) {
  TestBed.configureTestingModule({
    imports: [LessonEditor],
    providers: [
      provideHttpClient(),
      provideHttpClientTesting(),
      provideRouter([]),
      { provide: UnitPreference, useValue: { system: signal('metric') } },
    ],
  });
  const navigate = vi.spyOn(TestBed.inject(Router), 'navigate').mockResolvedValue(true);
  const fixture = TestBed.createComponent(LessonEditor);
  fixture.componentRef.setInput('lessonId', served.id);
  await fixture.whenStable();
  const http = TestBed.inject(HttpTestingController);
  http.expectOne({ method: 'GET', url: URL }).flush(served);
  const root = fixture.nativeElement as HTMLElement;
  await vi.waitFor(() => {
    fixture.detectChanges();
    expect(root.querySelector('form, [role="alert"]')).not.toBeNull();
  });
  return { fixture, root, http, navigate };
}

function typeInto(field: HTMLInputElement | HTMLTextAreaElement | null, text: string): void {
  if (!field) throw new Error('No such field.');
  field.value = text;
  field.dispatchEvent(new Event('input'));
}

const questionFields = (root: HTMLElement) => [...root.querySelectorAll('fieldset.question')];

describe('LessonEditor on an existing lesson', () => {
  it('fills the form from the lesson, with tolerances in the editor units', async () => {
    const { root, http } = await openEditor();
    expect(root.querySelector('h1')?.textContent).toContain('Edit lesson');
    expect(root.querySelector<HTMLInputElement>('input[formcontrolname="title"]')?.value).toBe(
      'What sets the start',
    );
    expect(root.querySelector('textarea')?.value).toBe('Predict, then run.');
    expect(root.querySelector('.system')?.textContent).toContain('Bench rig');
    const fieldsets = questionFields(root);
    expect(
      fieldsets.map(
        (f) => f.querySelector<HTMLInputElement>('input[formcontrolname="prompt"]')?.value,
      ),
    ).toEqual(['How long?', 'Will it start?', 'How low?']);
    const tolerances = [
      ...root.querySelectorAll<HTMLInputElement>('input[formcontrolname="tolerance"]'),
    ];
    expect(tolerances.map((input) => input.value)).toEqual(['15', '2']);
    // The lesson keeps its own copy of a system: no list of systems to choose from.
    http.expectNone('/api/systems');
    http.verify();
  });

  it('saves the title and introduction alone while the questions are unchanged', async () => {
    const { fixture, root, http, navigate } = await openEditor();
    typeInto(root.querySelector('input[formcontrolname="title"]'), 'Why the siphon starts');
    typeInto(root.querySelector('textarea'), 'Watch bed A.');
    root.querySelector<HTMLButtonElement>('button[type="submit"]')?.click();
    await fixture.whenStable();
    const request = http.expectOne({ method: 'PATCH', url: URL });
    expect(request.request.body).toEqual({
      title: 'Why the siphon starts',
      introduction: 'Watch bed A.',
    });
    request.flush({ ...LESSON, title: 'Why the siphon starts', introduction: 'Watch bed A.' });
    await vi.waitFor(() => expect(navigate).toHaveBeenCalledWith(['/classes/lessons', LESSON.id]));
  });

  it('sends every question, keeping ids and choices, once one of them changed', async () => {
    const { fixture, root, http } = await openEditor();
    const [, regime] = questionFields(root);
    typeInto(regime?.querySelector('input[formcontrolname="prompt"]') ?? null, 'Does it cycle?');
    root.querySelector<HTMLButtonElement>('button[type="submit"]')?.click();
    await fixture.whenStable();
    const request = http.expectOne({ method: 'PATCH', url: URL });
    const questions = QuestionListSchema.parse(request.request.body.questions);
    expect(questions.map((q) => q.id)).toEqual(['period', 'regime', 'low']);
    expect(questions[1]).toEqual({ ...LESSON.questions[1], prompt: 'Does it cycle?' });
    expect(questions[0]).toEqual(LESSON.questions[0]);
    expect(questions[2]?.kind === 'vessel-low-level' && questions[2].toleranceM).toBeCloseTo(
      0.02,
      12,
    );
  });

  it('shows the refusal and each field the server names, and stays on the form', async () => {
    const { fixture, root, http, navigate } = await openEditor();
    typeInto(root.querySelector('input[formcontrolname="title"]'), 'Renamed');
    root.querySelector<HTMLButtonElement>('button[type="submit"]')?.click();
    await fixture.whenStable();
    http.expectOne({ method: 'PATCH', url: URL }).flush(
      {
        error: {
          code: 'VALIDATION_FAILED',
          message: '1 question(s) name a part the system does not have.',
          fields: [{ path: 'questions[0].bedId', message: 'The system has no bed "bed-z".' }],
        },
      },
      { status: 400, statusText: 'Bad Request' },
    );
    await vi.waitFor(() => {
      fixture.detectChanges();
      expect(root.querySelector('[role="alert"]')?.textContent).toContain('questions[0].bedId');
    });
    expect(root.querySelector('[role="alert"]')?.textContent).toContain('no bed "bed-z"');
    expect(navigate).not.toHaveBeenCalled();
  });

  it('refuses to edit without a title, sending nothing', async () => {
    const { fixture, root, http } = await openEditor();
    typeInto(root.querySelector('input[formcontrolname="title"]'), '');
    root.querySelector<HTMLButtonElement>('button[type="submit"]')?.click();
    await fixture.whenStable();
    expect(root.querySelector('[role="alert"]')?.textContent).toContain('Give the lesson a title');
    http.expectNone({ method: 'PATCH', url: URL });
  });

  it('tells a student of the lesson that only its instructor edits it', async () => {
    const { root } = await openEditor({ ...LESSON, myRole: 'student' });
    expect(root.querySelector('form')).toBeNull();
    expect(root.querySelector('[role="alert"]')?.textContent).toContain(
      'Only the instructor who wrote this lesson can edit it.',
    );
  });
});

describe('LessonEditor for a new lesson', () => {
  it('offers my systems, then the parts of the chosen one, and creates the lesson from it', async () => {
    TestBed.configureTestingModule({
      imports: [LessonEditor],
      providers: [
        provideHttpClient(),
        provideHttpClientTesting(),
        provideRouter([]),
        { provide: UnitPreference, useValue: { system: signal('metric') } },
      ],
    });
    const navigate = vi.spyOn(TestBed.inject(Router), 'navigate').mockResolvedValue(true);
    const fixture = TestBed.createComponent(LessonEditor);
    const root = fixture.nativeElement as HTMLElement;
    const http = TestBed.inject(HttpTestingController);
    await fixture.whenStable();
    const systemId = '00000000-0000-4000-8000-000000000009';
    const listed: SystemList = {
      items: [
        {
          id: systemId,
          name: 'Bench rig',
          bedsCount: 1,
          pumpsCount: 1,
          pumpSummary: '1 pump',
          pumpsMaxFlowM3PerS: null,
          lastVerdict: null,
          ownerName: 'Me',
          access: 'owner',
          updatedAt: '2030-01-01T00:00:00.000Z',
        },
      ],
    };
    http.expectOne('/api/systems').flush(listed);
    await pick(fixture, root, 'mat-select[formcontrolname="systemId"]', 'Bench rig');
    http.expectOne(`/api/systems/${systemId}`).flush(systemBody(systemId));
    await pick(fixture, root, 'mat-select[formcontrolname="target"]', 'bed-a');
    typeInto(root.querySelector('input[formcontrolname="title"]'), 'First lesson');
    root.querySelector<HTMLButtonElement>('button[type="submit"]')?.click();
    await fixture.whenStable();
    const request = http.expectOne({ method: 'POST', url: '/api/lessons' });
    expect(request.request.body).toMatchObject({
      title: 'First lesson',
      systemId,
      questions: [{ id: 'q1', kind: 'bed-regime', bedId: 'bed-a' }],
    });
    request.flush({ ...LESSON, title: 'First lesson' });
    await vi.waitFor(() => expect(navigate).toHaveBeenCalledWith(['/classes/lessons', LESSON.id]));
  });
});

/** Opens the mat-select matching `selector` and clicks the option reading `label`. */
async function pick(
  fixture: { whenStable(): Promise<unknown>; detectChanges(): void },
  root: HTMLElement,
  selector: string,
  label: string,
): Promise<void> {
  await vi.waitFor(() => {
    fixture.detectChanges();
    const trigger = root.querySelector<HTMLElement>(`${selector} .mat-mdc-select-trigger`);
    if (!trigger) throw new Error(`No ${selector}.`);
    trigger.click();
    fixture.detectChanges();
    const option = [...document.querySelectorAll<HTMLElement>('mat-option')].find(
      (o) => o.textContent?.trim() === label,
    );
    if (!option) throw new Error(`No option "${label}" yet.`);
    option.click();
  });
  await fixture.whenStable();
}

/** A system as `GET /api/systems/:id` answers, around the example scenario. */
function systemBody(id: string): System {
  return {
    id,
    name: 'Bench rig',
    version: 1,
    scenario: { ...EXAMPLE_SCENARIO_FILE },
    ownerId: '00000000-0000-4000-8000-00000000000a',
    ownerName: 'Me',
    access: 'owner',
    lastVerdict: null,
    calibration: null,
    createdAt: '2030-01-01T00:00:00.000Z',
    updatedAt: '2030-01-01T00:00:00.000Z',
  };
}
