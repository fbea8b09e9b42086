/** Checks a student's predictions against the lesson's questions. */
import type { FieldError } from '../../shared/contracts/api-error';
import type { Prediction, Question } from '../../shared/contracts/classroom';

/**
 * One field error per problem: a question left unanswered, a prediction for no question or a
 * second one for the same question, a number where a choice is asked (or the reverse), or a
 * choice the question does not offer. Paths read `predictions[i]` or `predictions` (missing).
 */
export function checkPredictions(
  questions: readonly Question[],
  predictions: readonly Prediction[],
): FieldError[] {
  const errors: FieldError[] = [];
  const seen = new Set<string>();
  predictions.forEach((prediction, index) => {
    const path = `predictions[${index}]`;
    const question = questions.find((q) => q.id === prediction.questionId);
    if (!question)
      return void errors.push({
        path,
        message: `This lesson has no question "${prediction.questionId}".`,
      });
    if (seen.has(question.id))
      return void errors.push({ path, message: `Answer question "${question.id}" only once.` });
    seen.add(question.id);
    if (question.kind === 'bed-regime') {
      if (!('choice' in prediction))
        errors.push({ path, message: 'Pick one of the offered choices.' });
      else if (!question.choices.includes(prediction.choice))
        errors.push({ path, message: `Pick one of: ${question.choices.join(', ')}.` });
    } else if (!('value' in prediction)) {
      errors.push({ path, message: 'Enter a number.' });
    }
  });
  for (const question of questions) {
    if (!seen.has(question.id)) {
      errors.push({
        path: 'predictions',
        message: `Answer question "${question.id}" before saving.`,
      });
    }
  }
  return errors;
}
