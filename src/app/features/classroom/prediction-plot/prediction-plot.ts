import {
  ChangeDetectionStrategy,
  Component,
  type ElementRef,
  ViewEncapsulation,
  computed,
  effect,
  input,
  viewChild,
} from '@angular/core';
import type {
  Question,
  SimulatedValue,
  StudentAnswer,
} from '../../../../../shared/contracts/classroom';
import type { UnitSystem } from '../../../../../shared/scenario';
import { REGIME_WORDS, answerUnit, fromSi } from '../answer-units';
import { type PredictionPlotData, drawPredictionPlot } from './draw-prediction-plot';

/**
 * A d3 dot plot of a class's predictions for one question: one dot per student (hover for the
 * name), and once the answer is shown, the simulated value with the band that counts as right and
 * each dot coloured right or wrong. Numbers are shown in the reader's units.
 *
 * @example <tw-prediction-plot [question]="q" [answers]="report.answers" [simulated]="key" [showAnswer]="true" />
 */
@Component({
  selector: 'tw-prediction-plot',
  template: `<svg #plot class="plot" role="img" [attr.aria-label]="description()"></svg>`,
  styleUrl: './prediction-plot.scss',
  // d3 draws the dots, so the styles cannot be encapsulated; they are scoped by the tag instead.
  encapsulation: ViewEncapsulation.None,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PredictionPlot {
  /** The question plotted. */
  readonly question = input.required<Question>();
  /** Every student's answer to the lesson. */
  readonly answers = input.required<readonly StudentAnswer[]>();
  /** The simulated answer (SI). */
  readonly simulated = input.required<SimulatedValue>();
  /** Whether to draw the simulated answer and colour the dots. */
  readonly showAnswer = input(true);
  /** The reader's unit system. */
  readonly system = input<UnitSystem>('metric');

  private readonly svgRef = viewChild.required<ElementRef<SVGSVGElement>>('plot');

  /** The plot's data in display units. */
  protected readonly data = computed<PredictionPlotData>(() => {
    const question = this.question();
    const unit = answerUnit(question, this.system());
    const show = (value: number) => (unit ? fromSi(value, unit) : value);
    const dots = this.answers().flatMap((answer) => {
      const outcome = answer.outcomes.find((o) => o.questionId === question.id);
      if (!outcome || outcome.predicted === null) return [];
      const value =
        typeof outcome.predicted === 'number' ? show(outcome.predicted) : outcome.predicted;
      return [{ name: answer.name, value, correct: outcome.correct }];
    });
    const simulated = this.simulated();
    const band = typeof simulated === 'number' ? bandAround(question, simulated) : null;
    return {
      kind: question.kind === 'bed-regime' ? 'choice' : 'number',
      dots,
      simulated: typeof simulated === 'number' ? show(simulated) : simulated,
      showAnswer: this.showAnswer(),
      band: band ? [show(band[0]), show(band[1])] : null,
      unitLabel: unit?.label ?? '',
      choices:
        question.kind === 'bed-regime'
          ? question.choices.map((value) => ({ value, label: REGIME_WORDS[value] }))
          : [],
    };
  });
  protected readonly description = computed(() => {
    const data = this.data();
    return `${data.dots.length} predictions for: ${this.question().prompt}`;
  });

  constructor() {
    effect(() => drawPredictionPlot(this.svgRef().nativeElement, this.data()));
  }
}

/** The SI range that counts as right around a simulated number. */
function bandAround(question: Question, simulated: number): [number, number] | null {
  if (question.kind === 'bed-period')
    return [simulated * (1 - question.tolerance), simulated * (1 + question.tolerance)];
  if (question.kind === 'vessel-low-level')
    return [simulated - question.toleranceM, simulated + question.toleranceM];
  return null;
}
