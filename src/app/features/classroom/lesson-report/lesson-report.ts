import {
  ChangeDetectionStrategy,
  Component,
  computed,
  effect,
  inject,
  input,
  output,
  signal,
} from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSlideToggleModule } from '@angular/material/slide-toggle';
import { Router, RouterLink } from '@angular/router';
import type { Lesson, LessonReport as Report } from '../../../../../shared/contracts/classroom';
import { confirmAction } from '../../../ui/confirm-dialog/confirm-dialog';
import { UnitPreference } from '../../systems/unit-preference';
import { answerWords } from '../answer-units';
import { ClassroomApi } from '../classroom-api';
import { PredictionPlot } from '../prediction-plot/prediction-plot';
import { problemMessage } from '../problem-message';
import { SimulationSummary } from '../simulation-summary/simulation-summary';
import { questionFindings } from './question-findings';

/**
 * A lesson as its instructor sees it: publish and reveal switches, presentation mode, and for
 * each question the class's predictions against the simulated answer (a dot plot and the share
 * right), then every student's answers and the simulated run itself.
 */
@Component({
  selector: 'tw-lesson-report',
  imports: [
    MatButtonModule,
    MatIconModule,
    MatProgressBarModule,
    MatSlideToggleModule,
    PredictionPlot,
    RouterLink,
    SimulationSummary,
  ],
  templateUrl: './lesson-report.html',
  styleUrl: './lesson-report.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LessonReport {
  private readonly api = inject(ClassroomApi);
  private readonly dialog = inject(MatDialog);
  private readonly router = inject(Router);
  private readonly units = inject(UnitPreference);

  /** The lesson, as its owner sees it. */
  readonly lesson = input.required<Lesson>();
  /** Emitted with the lesson after a change (publish, reveal). */
  readonly changed = output<Lesson>();

  protected readonly system = this.units.system;
  protected readonly report = signal<Report | null>(null);
  protected readonly problem = signal<string | null>(null);
  protected readonly notice = signal<string | null>(null);
  protected readonly inClass = computed(() => this.lesson().classId !== null);
  protected readonly findings = computed(() => {
    const report = this.report();
    return report ? questionFindings(this.lesson().questions, report, this.system()) : [];
  });
  protected readonly ranCount = computed(
    () => this.report()?.answers.filter((a) => a.ranAt !== null).length ?? 0,
  );
  protected readonly rows = computed(() =>
    (this.report()?.answers ?? []).map((answer) => ({
      userId: answer.userId,
      name: answer.name,
      ran: answer.ranAt !== null,
      cells: this.lesson().questions.map((question) => {
        const outcome = answer.outcomes.find((o) => o.questionId === question.id);
        return {
          id: question.id,
          numeric: question.kind !== 'bed-regime',
          words: answerWords(question, outcome?.predicted ?? null, this.system()),
          correct: outcome?.correct ?? null,
        };
      }),
    })),
  );

  constructor() {
    effect(() => void this.load(this.lesson().id));
  }

  protected async refresh(): Promise<void> {
    await this.load(this.lesson().id);
  }

  protected async setFlag(flag: 'published' | 'revealed', value: boolean): Promise<void> {
    await this.act(async () =>
      this.changed.emit(await this.api.updateLesson(this.lesson().id, { [flag]: value })),
    );
  }

  protected async copyToLibrary(): Promise<void> {
    await this.act(async () => {
      const copy = await this.api.duplicateLesson(this.lesson().id, { classId: null });
      this.notice.set(`A copy "${copy.title}" is in your library.`);
    });
  }

  protected async remove(): Promise<void> {
    const confirmed = await confirmAction(this.dialog, {
      title: `Delete "${this.lesson().title}"?`,
      message: 'The lesson and every answer to it are deleted. Copies of it stay.',
      confirmLabel: 'Delete lesson',
      destructive: true,
    });
    if (!confirmed) return;
    const classId = this.lesson().classId;
    await this.act(async () => {
      await this.api.deleteLesson(this.lesson().id);
      await this.router.navigateByUrl(classId ? `/classes/${classId}` : '/classes/library');
    });
  }

  private async act(action: () => Promise<void>): Promise<void> {
    this.problem.set(null);
    this.notice.set(null);
    try {
      await action();
    } catch (error: unknown) {
      this.problem.set(problemMessage(error));
    }
  }

  private async load(lessonId: string): Promise<void> {
    try {
      this.report.set(await this.api.report(lessonId));
    } catch (error: unknown) {
      this.problem.set(problemMessage(error));
    }
  }
}
