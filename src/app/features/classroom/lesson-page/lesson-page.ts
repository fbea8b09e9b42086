import { ChangeDetectionStrategy, Component, effect, inject, input, signal } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { Title } from '@angular/platform-browser';
import { RouterLink } from '@angular/router';
import type { Lesson, MyAnswer } from '../../../../../shared/contracts/classroom';
import { ClassroomApi } from '../classroom-api';
import { LessonReport } from '../lesson-report/lesson-report';
import { problemMessage } from '../problem-message';
import { StudentLesson } from '../student-lesson/student-lesson';

/** `/classes/lessons/:lessonId`: the student's lesson, or the instructor's report of it. */
@Component({
  selector: 'tw-lesson-page',
  imports: [LessonReport, MatIconModule, MatProgressBarModule, RouterLink, StudentLesson],
  template: `
    @if (lesson(); as current) {
      <a
        class="back"
        [routerLink]="current.classId ? ['/classes', current.classId] : ['/classes/library']"
      >
        <mat-icon>arrow_back</mat-icon> {{ current.className ?? 'Lesson library' }}
      </a>
      <h1>{{ current.title }}</h1>
      @if (current.myRole === 'student') {
        <tw-student-lesson [lesson]="current" (answered)="keepAnswer($event)" />
      } @else {
        <tw-lesson-report [lesson]="current" (changed)="lesson.set($event)" />
      }
    } @else if (problem(); as message) {
      <p class="problem" role="alert"><mat-icon>error</mat-icon> {{ message }}</p>
    } @else {
      <mat-progress-bar mode="indeterminate" />
    }
  `,
  styles: `
    :host {
      display: block;
      max-width: 1100px;
      margin: 0 auto;
      padding: 16px 24px 48px;
    }
    .back {
      display: inline-flex;
      align-items: center;
      gap: 4px;
      text-decoration: none;
    }
    .problem {
      display: flex;
      gap: 8px;
      align-items: center;
      color: var(--mat-sys-error);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LessonPage {
  private readonly api = inject(ClassroomApi);
  private readonly title = inject(Title);

  /** From the route. */
  readonly lessonId = input.required<string>();

  protected readonly lesson = signal<Lesson | null>(null);
  protected readonly problem = signal<string | null>(null);

  constructor() {
    effect(() => void this.load(this.lessonId()));
  }

  protected keepAnswer(answer: MyAnswer): void {
    const current = this.lesson();
    if (current) this.lesson.set({ ...current, myAnswer: answer });
  }

  private async load(lessonId: string): Promise<void> {
    try {
      const lesson = await this.api.lesson(lessonId);
      this.lesson.set(lesson);
      this.title.setTitle(`${lesson.title} · Tidewright`);
    } catch (error: unknown) {
      this.problem.set(problemMessage(error));
    }
  }
}
