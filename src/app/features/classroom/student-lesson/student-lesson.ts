import {
  ChangeDetectionStrategy,
  Component,
  computed,
  inject,
  input,
  output,
  signal,
} from '@angular/core';
import { ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatRadioModule } from '@angular/material/radio';
import type {
  Lesson,
  MyAnswer,
  Outcome,
  Question,
} from '../../../../../shared/contracts/classroom';
import { parseScenario } from '../../../../../shared/scenario';
import { ElevationDrawing } from '../../systems/elevation-drawing/elevation-drawing';
import { UnitPreference } from '../../systems/unit-preference';
import { REGIME_WORDS, answerUnit, answerWords, toleranceWords } from '../answer-units';
import { ClassroomApi } from '../classroom-api';
import { LessonAnimation } from '../lesson-animation/lesson-animation';
import { problemMessage } from '../problem-message';
import { SimulationSummary } from '../simulation-summary/simulation-summary';
import { predictionForm, readPredictions } from './prediction-form';

/**
 * A lesson as a student does it: read the introduction and look at the system, predict each
 * answer, then run the system and see each prediction set against the simulated result. The
 * predictions are final once the system has run.
 */
@Component({
  selector: 'tw-student-lesson',
  imports: [
    ElevationDrawing,
    LessonAnimation,
    MatButtonModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatProgressBarModule,
    MatRadioModule,
    ReactiveFormsModule,
    SimulationSummary,
  ],
  templateUrl: './student-lesson.html',
  styleUrl: './student-lesson.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StudentLesson {
  private readonly api = inject(ClassroomApi);
  private readonly units = inject(UnitPreference);

  /** The lesson, as the student sees it. */
  readonly lesson = input.required<Lesson>();
  /** Emitted with the student's answer after each save or run. */
  readonly answered = output<MyAnswer>();

  protected readonly system = this.units.system;
  protected readonly regimeWords = REGIME_WORDS;
  protected readonly busy = signal<'saving' | 'running' | null>(null);
  protected readonly problem = signal<string | null>(null);
  protected readonly answer = computed(() => this.lesson().myAnswer);
  protected readonly ran = computed(() => this.answer()?.ranAt != null);
  /** Why the last run did not finish, when it did not (the predictions then stay open). */
  protected readonly runFailure = computed(() => {
    const answer = this.answer();
    return answer && answer.ranAt === null && answer.simulation ? answer.simulation.error : null;
  });
  protected readonly form = computed(() =>
    predictionForm(this.lesson().questions, this.answer()?.predictions ?? [], this.system()),
  );
  protected readonly drawable = computed(() => {
    const parsed = parseScenario(this.lesson().scenario);
    return parsed.success ? parsed.scenario : null;
  });
  protected readonly questions = computed(() =>
    this.lesson().questions.map((question, index) => ({
      question,
      number: index + 1,
      unit: answerUnit(question, this.system()),
      tolerance: toleranceWords(question, this.system()),
      key: this.keyFor(question),
    })),
  );
  protected readonly outcomes = computed(() => {
    const outcomes = this.answer()?.outcomes ?? [];
    return this.lesson().questions.map((question, index) => {
      const outcome: Outcome | undefined = outcomes.find((o) => o.questionId === question.id);
      return {
        number: index + 1,
        prompt: question.prompt,
        numeric: question.kind !== 'bed-regime',
        predicted: answerWords(question, outcome?.predicted ?? null, this.system()),
        simulated: answerWords(question, outcome?.simulated ?? null, this.system()),
        correct: outcome?.correct ?? null,
      };
    });
  });
  protected readonly score = computed(() => {
    const graded = this.outcomes().filter((o) => o.correct !== null);
    return { right: graded.filter((o) => o.correct).length, of: graded.length };
  });

  /** The revealed answer to a question in words, or null before the lesson is revealed. */
  private keyFor(question: Question): { simulated: string; explanation: string } | null {
    const key = this.lesson().answerKey?.find((k) => k.questionId === question.id);
    return key
      ? {
          simulated: answerWords(question, key.simulated, this.system()),
          explanation: key.explanation,
        }
      : null;
  }

  protected async save(): Promise<void> {
    const read = readPredictions(this.lesson().questions, this.form(), this.system());
    if ('problem' in read) {
      this.problem.set(read.problem);
      return;
    }
    await this.call('saving', () => this.api.saveAnswer(this.lesson().id, read.predictions));
  }

  protected async runSystem(): Promise<void> {
    await this.call('running', () => this.api.run(this.lesson().id));
  }

  private async call(what: 'saving' | 'running', action: () => Promise<MyAnswer>): Promise<void> {
    this.problem.set(null);
    this.busy.set(what);
    try {
      this.answered.emit(await action());
    } catch (error: unknown) {
      this.problem.set(problemMessage(error));
    } finally {
      this.busy.set(null);
    }
  }
}
