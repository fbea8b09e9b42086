import { HttpErrorResponse } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { FormArray, FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { Router, RouterLink } from '@angular/router';
import type { FieldError } from '../../../../../shared/contracts/api-error';
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
  toQuestions,
} from './question-draft';

/** The controls of one question. */
type QuestionGroup = FormGroup<{ [K in keyof QuestionDraft]: FormControl<QuestionDraft[K]> }>;

/**
 * `/classes/library/new`: a new library lesson from one of my systems (its scenario is copied, so
 * later edits to the system leave the lesson as it was), with its questions.
 */
@Component({
  selector: 'tw-lesson-editor',
  imports: [
    MatButtonModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatSelectModule,
    ReactiveFormsModule,
    RouterLink,
  ],
  templateUrl: './lesson-editor.html',
  styleUrl: './lesson-editor.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LessonEditor {
  private readonly classroom = inject(ClassroomApi);
  private readonly systemsApi = inject(SystemsApi);
  private readonly router = inject(Router);
  private readonly units = inject(UnitPreference);

  protected readonly kinds = QUESTION_KINDS;
  protected readonly systems = signal<readonly SystemListItem[]>([]);
  protected readonly parts = signal<{ beds: string[]; stores: string[] }>({ beds: [], stores: [] });
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

  constructor() {
    this.addQuestion('bed-regime');
    void this.loadSystems();
    this.form.controls.systemId.valueChanges.subscribe((id) => void this.loadParts(id));
  }

  protected targetsOf(kind: QuestionKind): string[] {
    return kind === 'vessel-low-level' ? this.parts().stores : this.parts().beds;
  }

  protected addQuestion(kind: QuestionKind): void {
    const words = QUESTION_KINDS.find((k) => k.kind === kind);
    const group: QuestionGroup = new FormGroup({
      kind: new FormControl<QuestionKind>(kind, { nonNullable: true }),
      prompt: new FormControl(words?.prompt ?? '', {
        nonNullable: true,
        validators: [Validators.required],
      }),
      explanation: new FormControl('', { nonNullable: true }),
      target: new FormControl('', { nonNullable: true, validators: [Validators.required] }),
      tolerance: new FormControl(defaultTolerance(kind, this.units.system()), {
        nonNullable: true,
      }),
    });
    group.controls.kind.valueChanges.subscribe((next) =>
      group.controls.tolerance.setValue(defaultTolerance(next, this.units.system())),
    );
    this.form.controls.questions.push(group);
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
        'Give the lesson a title, choose a system, and a part of it for every question.',
      );
      return;
    }
    const value = this.form.getRawValue();
    this.saving.set(true);
    try {
      const lesson = await this.classroom.createLesson({
        title: value.title,
        introduction: value.introduction,
        systemId: value.systemId,
        questions: toQuestions(value.questions, this.units.system()),
      });
      await this.router.navigate(['/classes/lessons', lesson.id]);
    } catch (error: unknown) {
      this.problem.set(problemMessage(error));
      if (error instanceof HttpErrorResponse)
        this.fieldErrors.set(readApiError(error.error)?.error.fields ?? []);
    } finally {
      this.saving.set(false);
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
    const vessels = Array.isArray(system.scenario['vessels'])
      ? (system.scenario['vessels'] as unknown[])
      : [];
    const described = vessels.flatMap((v) => (isVessel(v) ? [v] : []));
    this.parts.set({
      beds: described.filter((v) => v.kind === 'bed').map((v) => v.id),
      stores: described.filter((v) => v.kind !== 'bed').map((v) => v.id),
    });
  }
}

function isVessel(value: unknown): value is { id: string; kind: string } {
  if (typeof value !== 'object' || value === null) return false;
  const record = value as Record<string, unknown>;
  return typeof record['id'] === 'string' && typeof record['kind'] === 'string';
}
