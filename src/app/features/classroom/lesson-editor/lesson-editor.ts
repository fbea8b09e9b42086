import { HttpErrorResponse } from '@angular/common/http';
import {
  ChangeDetectionStrategy,
  Component,
  type OnInit,
  computed,
  inject,
  input,
  signal,
} from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { FormArray, FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { Router, RouterLink } from '@angular/router';
import type { FieldError } from '../../../../../shared/contracts/api-error';
import type { Lesson } from '../../../../../shared/contracts/classroom';
import type { SystemListItem } from '../../../../../shared/contracts/systems';
import { readApiError } from '../../../core/http/read-api-error';
import { SystemsApi } from '../../systems/systems-api';
import { UnitPreference } from '../../systems/unit-preference';
import { ClassroomApi } from '../classroom-api';
import { problemMessage } from '../problem-message';
import {
  QUESTION_KINDS,
  type QuestionDraft,
  type QuestionKind,
  defaultTolerance,
  toDrafts,
  toQuestions,
} from './question-draft';
import { scenarioParts, type ScenarioParts } from './scenario-parts';

/** The controls of one question. */
type QuestionGroup = FormGroup<{ [K in keyof QuestionDraft]: FormControl<QuestionDraft[K]> }>;

/**
 * `/classes/library/new`: a new library lesson from one of my systems (its scenario is copied, so
 * later edits to the system leave the lesson as it was), with its questions.
 * `/classes/lessons/:lessonId/edit`: the title, introduction and questions of a lesson I own; its
 * system stays the copy it was made with. Questions are sent only when they changed, since they
 * are fixed once a student answered.
 */
@Component({
  selector: 'tw-lesson-editor',
  imports: [
    MatButtonModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatProgressBarModule,
    MatSelectModule,
    ReactiveFormsModule,
    RouterLink,
  ],
  templateUrl: './lesson-editor.html',
  styleUrl: './lesson-editor.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LessonEditor implements OnInit {
  private readonly classroom = inject(ClassroomApi);
  private readonly systemsApi = inject(SystemsApi);
  private readonly router = inject(Router);
  private readonly units = inject(UnitPreference);

  /** From the route: the lesson to edit; absent for a new lesson. */
  readonly lessonId = input<string>();

  protected readonly kinds = QUESTION_KINDS;
  protected readonly editing = computed(() => Boolean(this.lessonId()));
  /** The lesson as loaded for editing (null while loading, and for a new lesson). */
  protected readonly original = signal<Lesson | null>(null);
  /** The name inside the lesson's copy of its system. */
  protected readonly systemName = computed(() => {
    const name = this.original()?.scenario['name'];
    return typeof name === 'string' && name !== '' ? name : 'Unnamed system';
  });
  protected readonly systems = signal<readonly SystemListItem[]>([]);
  protected readonly parts = signal<ScenarioParts>({ beds: [], stores: [] });
  protected readonly problem = signal<string | null>(null);
  protected readonly fieldErrors = signal<readonly FieldError[]>([]);
  protected readonly saving = signal(false);
  protected readonly form = new FormGroup({
    title: new FormControl('', {
      nonNullable: true,
      validators: [Validators.required, Validators.maxLength(200)],
    }),
    introduction: new FormControl('', { nonNullable: true }),
    systemId: new FormControl('', { nonNullable: true, validators: [Validators.required] }),
    questions: new FormArray<QuestionGroup>([]),
  });
  private readonly questionValues = toSignal(this.form.controls.questions.valueChanges, {
    initialValue: [],
  });
  protected readonly toleranceLabels = computed(() =>
    this.questionValues().map((q) =>
      q.kind === 'bed-period' ? '%' : this.units.system() === 'us' ? 'in' : 'cm',
    ),
  );

  ngOnInit(): void {
    const lessonId = this.lessonId();
    if (lessonId) {
      this.form.controls.systemId.disable();
      void this.loadLesson(lessonId);
      return;
    }
    this.addQuestion('bed-regime');
    void this.loadSystems();
    this.form.controls.systemId.valueChanges.subscribe((id) => void this.loadParts(id));
  }

  protected targetsOf(kind: QuestionKind): string[] {
    return kind === 'vessel-low-level' ? this.parts().stores : this.parts().beds;
  }

  protected addQuestion(kind: QuestionKind): void {
    const words = QUESTION_KINDS.find((k) => k.kind === kind);
    this.pushQuestion({
      id: '',
      kind,
      prompt: words?.prompt ?? '',
      explanation: '',
      target: '',
      tolerance: defaultTolerance(kind, this.units.system()),
    });
  }

  protected removeQuestion(index: number): void {
    this.form.controls.questions.removeAt(index);
  }

  protected async save(): Promise<void> {
    this.problem.set(null);
    this.fieldErrors.set([]);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      this.problem.set(
        this.editing()
          ? 'Give the lesson a title, and choose a part of its system for every question.'
          : 'Give the lesson a title, choose a system, and a part of it for every question.',
      );
      return;
    }
    this.saving.set(true);
    try {
      const lesson = await this.store();
      await this.router.navigate(['/classes/lessons', lesson.id]);
    } catch (error: unknown) {
      this.problem.set(problemMessage(error));
      if (error instanceof HttpErrorResponse)
        this.fieldErrors.set(readApiError(error.error)?.error.fields ?? []);
    } finally {
      this.saving.set(false);
    }
  }

  /** Creates the lesson, or sends what changed in the one being edited. */
  private store(): Promise<Lesson> {
    const value = this.form.getRawValue();
    const original = this.original();
    const system = this.units.system();
    const questions = toQuestions(value.questions, system, original?.questions ?? []);
    if (!original) {
      return this.classroom.createLesson({
        title: value.title,
        introduction: value.introduction,
        systemId: value.systemId,
        questions,
      });
    }
    const before = toQuestions(toDrafts(original.questions, system), system, original.questions);
    const changed = JSON.stringify(questions) !== JSON.stringify(before);
    return this.classroom.updateLesson(original.id, {
      title: value.title,
      introduction: value.introduction,
      ...(changed ? { questions } : {}),
    });
  }

  private pushQuestion(draft: QuestionDraft): void {
    const group: QuestionGroup = new FormGroup({
      id: new FormControl(draft.id, { nonNullable: true }),
      kind: new FormControl<QuestionKind>(draft.kind, { nonNullable: true }),
      prompt: new FormControl(draft.prompt, {
        nonNullable: true,
        validators: [Validators.required],
      }),
      explanation: new FormControl(draft.explanation, { nonNullable: true }),
      target: new FormControl(draft.target, {
        nonNullable: true,
        validators: [Validators.required],
      }),
      tolerance: new FormControl(draft.tolerance, { nonNullable: true }),
    });
    group.controls.kind.valueChanges.subscribe((next) =>
      group.controls.tolerance.setValue(defaultTolerance(next, this.units.system())),
    );
    this.form.controls.questions.push(group);
  }

  private async loadLesson(lessonId: string): Promise<void> {
    try {
      const lesson = await this.classroom.lesson(lessonId);
      if (lesson.myRole !== 'instructor') {
        this.problem.set('Only the instructor who wrote this lesson can edit it.');
        return;
      }
      this.parts.set(scenarioParts(lesson.scenario));
      this.form.patchValue({ title: lesson.title, introduction: lesson.introduction });
      for (const draft of toDrafts(lesson.questions, this.units.system())) this.pushQuestion(draft);
      this.original.set(lesson);
    } catch (error: unknown) {
      this.problem.set(problemMessage(error));
    }
  }

  private async loadSystems(): Promise<void> {
    try {
      this.systems.set((await this.systemsApi.list()).items);
    } catch (error: unknown) {
      this.problem.set(problemMessage(error));
    }
  }

  private async loadParts(systemId: string): Promise<void> {
    if (!systemId) return;
    const system = await this.systemsApi.get(systemId);
    this.parts.set(scenarioParts(system.scenario));
  }
}
