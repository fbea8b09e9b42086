import { FormControl, FormRecord } from '@angular/forms';
import type { Prediction, Question } from '../../../../../shared/contracts/classroom';
import type { UnitSystem } from '../../../../../shared/scenario';
import { answerUnit, fromSi, toSi } from '../answer-units';

/** One control per question: the typed number (in the question's unit) or the chosen regime. */
export type PredictionForm = FormRecord<FormControl<string>>;

/** A form for `questions`, filled from earlier predictions when there are some. */
export function predictionForm(
  questions: readonly Question[],
  earlier: readonly Prediction[],
  system: UnitSystem,
): PredictionForm {
  const form: PredictionForm = new FormRecord<FormControl<string>>({});
  for (const question of questions) {
    const prediction = earlier.find((p) => p.questionId === question.id);
    const unit = answerUnit(question, system);
    let start = '';
    if (prediction && 'value' in prediction && unit) start = String(fromSi(prediction.value, unit));
    if (prediction && 'choice' in prediction) start = prediction.choice;
    form.addControl(question.id, new FormControl(start, { nonNullable: true }));
  }
  return form;
}

/** The predictions in the form, in SI; or the first problem in words, naming the question. */
export function readPredictions(
  questions: readonly Question[],
  form: PredictionForm,
  system: UnitSystem,
): { predictions: Prediction[] } | { problem: string } {
  const predictions: Prediction[] = [];
  for (const [index, question] of questions.entries()) {
    const raw = form.controls[question.id]?.value.trim() ?? '';
    if (raw === '') return { problem: `Answer question ${index + 1} before saving.` };
    if (question.kind === 'bed-regime') {
      predictions.push({
        questionId: question.id,
        choice: question.choices.find((c) => c === raw) ?? 'cycling',
      });
      continue;
    }
    const unit = answerUnit(question, system);
    const value = Number(raw.replace(',', '.'));
    if (!unit || !Number.isFinite(value) || value < 0) {
      return {
        problem: `Question ${index + 1} needs a number of ${unit?.label ?? 'units'}, 0 or more.`,
      };
    }
    predictions.push({ questionId: question.id, value: toSi(value, unit) });
  }
  return { predictions };
}
