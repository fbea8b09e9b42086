import {
  ChangeDetectionStrategy,
  Component,
  computed,
  effect,
  inject,
  input,
  signal,
} from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import type { Lesson, LessonReport } from '../../../../../shared/contracts/classroom';
import { UnitPreference } from '../../systems/unit-preference';
import { ClassroomApi } from '../classroom-api';
import { questionFindings } from '../lesson-report/question-findings';
import { PredictionPlot } from '../prediction-plot/prediction-plot';
import { problemMessage } from '../problem-message';

/**
 * `/classes/lessons/:lessonId/present`: one question at a time, large, for a projector. The class's
 * predictions show first without the answer; "Reveal the answer" shows the simulated value and the
 * explanation here and, from then on, to every student of the class.
 */
@Component({
  selector: 'tw-lesson-presentation',
  imports: [MatButtonModule, MatIconModule, MatProgressBarModule, PredictionPlot, RouterLink],
  templateUrl: './lesson-presentation.html',
  styleUrl: './lesson-presentation.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  host: { '(document:keydown.arrowright)': 'step(1)', '(document:keydown.arrowleft)': 'step(-1)' },
})
export class LessonPresentation {
  private readonly api = inject(ClassroomApi);
  private readonly units = inject(UnitPreference);

  /** From the route. */
  readonly lessonId = input.required<string>();

  protected readonly system = this.units.system;
  protected readonly lesson = signal<Lesson | null>(null);
  protected readonly report = signal<LessonReport | null>(null);
  protected readonly problem = signal<string | null>(null);
  protected readonly index = signal(0);
  protected readonly revealed = computed(() => this.lesson()?.revealed ?? false);
  protected readonly findings = computed(() => {
    const lesson = this.lesson();
    const report = this.report();
    return lesson && report ? questionFindings(lesson.questions, report, this.system()) : [];
  });
  protected readonly current = computed(() => this.findings()[this.index()] ?? null);

  constructor() {
    effect(() => void this.load(this.lessonId()));
  }

  /** Moves to the next (+1) or previous (−1) question. */
  step(by: number): void {
    const last = this.findings().length - 1;
    this.index.set(Math.min(Math.max(0, this.index() + by), Math.max(0, last)));
  }

  protected async reveal(): Promise<void> {
    try {
      this.lesson.set(await this.api.updateLesson(this.lessonId(), { revealed: true }));
    } catch (error: unknown) {
      this.problem.set(problemMessage(error));
    }
  }

  protected async refresh(): Promise<void> {
    await this.load(this.lessonId());
  }

  protected toggleFullScreen(): void {
    if (document.fullscreenElement) void document.exitFullscreen();
    else void document.documentElement.requestFullscreen?.();
  }

  private async load(lessonId: string): Promise<void> {
    try {
      const [lesson, report] = await Promise.all([
        this.api.lesson(lessonId),
        this.api.report(lessonId),
      ]);
      this.lesson.set(lesson);
      this.report.set(report);
    } catch (error: unknown) {
      this.problem.set(problemMessage(error));
    }
  }
}
