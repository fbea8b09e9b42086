import {
  ChangeDetectionStrategy,
  Component,
  computed,
  effect,
  inject,
  input,
  signal,
} from '@angular/core';
import { FormControl, FormGroup, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatChipsModule } from '@angular/material/chips';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { MatSlideToggleModule } from '@angular/material/slide-toggle';
import { RouterLink } from '@angular/router';
import type {
  ClassDetail,
  LessonListItem,
  LessonProgress,
} from '../../../../../shared/contracts/classroom';
import { ClassroomApi } from '../classroom-api';
import { problemMessage } from '../problem-message';
import { RosterPanel } from './roster-panel';

/** How a student's progress reads. */
const PROGRESS_WORDS: Readonly<Record<LessonProgress, string>> = {
  'not-started': 'Predict first',
  predicted: 'Predicted, not run',
  ran: 'Ran',
};

/**
 * `/classes/:classId`: the class's lessons. Its instructor also publishes lessons, adds copies
 * from the library, and manages the roster; a student sees the published lessons and their
 * progress.
 */
@Component({
  selector: 'tw-class-page',
  imports: [
    MatButtonModule,
    MatChipsModule,
    MatFormFieldModule,
    MatIconModule,
    MatProgressBarModule,
    MatSelectModule,
    MatSlideToggleModule,
    ReactiveFormsModule,
    RosterPanel,
    RouterLink,
  ],
  templateUrl: './class-page.html',
  styleUrl: './class-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ClassPage {
  private readonly api = inject(ClassroomApi);

  /** From the route. */
  readonly classId = input.required<string>();

  protected readonly detail = signal<ClassDetail | null>(null);
  protected readonly library = signal<readonly LessonListItem[]>([]);
  protected readonly problem = signal<string | null>(null);
  protected readonly isInstructor = computed(() => this.detail()?.myRole === 'instructor');
  protected readonly addForm = new FormGroup({ lessonId: new FormControl<string | null>(null) });
  protected readonly progressWords = PROGRESS_WORDS;

  constructor() {
    effect(() => void this.load(this.classId()));
  }

  protected async setPublished(lesson: LessonListItem, published: boolean): Promise<void> {
    await this.act(() => this.api.updateLesson(lesson.id, { published }));
  }

  protected async addFromLibrary(): Promise<void> {
    const lessonId = this.addForm.controls.lessonId.value;
    if (!lessonId) return;
    await this.act(() => this.api.duplicateLesson(lessonId, { classId: this.classId() }));
    this.addForm.reset();
  }

  protected async reload(): Promise<void> {
    await this.load(this.classId());
  }

  private async act(action: () => Promise<unknown>): Promise<void> {
    this.problem.set(null);
    try {
      await action();
      await this.load(this.classId());
    } catch (error: unknown) {
      this.problem.set(problemMessage(error));
    }
  }

  private async load(classId: string): Promise<void> {
    try {
      const detail = await this.api.classDetail(classId);
      this.detail.set(detail);
      if (detail.myRole === 'instructor') this.library.set((await this.api.library()).items);
    } catch (error: unknown) {
      this.problem.set(problemMessage(error));
    }
  }
}
