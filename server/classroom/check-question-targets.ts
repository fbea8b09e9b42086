/** Checks that each question of a lesson names a part its system has. */
import type { Question } from '../../shared/contracts/classroom';
import type { FieldError } from '../../shared/contracts/api-error';
import type { Scenario } from '../../shared/scenario';

/**
 * One field error per question whose `bedId` is not a bed of the scenario, or whose `vesselId`
 * is not one of its tanks or sumps; paths read `questions[i].bedId` / `questions[i].vesselId`.
 */
export function checkQuestionTargets(
  questions: readonly Question[],
  scenario: { vessels: ReadonlyArray<Pick<Scenario['vessels'][number], 'id' | 'kind'>> },
): FieldError[] {
  const beds = scenario.vessels.filter((v) => v.kind === 'bed').map((v) => v.id);
  const stores = scenario.vessels.filter((v) => v.kind !== 'bed').map((v) => v.id);
  const errors: FieldError[] = [];
  questions.forEach((question, index) => {
    if (question.kind === 'vessel-low-level') {
      if (!stores.includes(question.vesselId)) {
        errors.push({
          path: `questions[${index}].vesselId`,
          message: `The system has no tank or sump "${question.vesselId}"; choose one of: ${stores.join(', ') || 'none'}.`,
        });
      }
    } else if (!beds.includes(question.bedId)) {
      errors.push({
        path: `questions[${index}].bedId`,
        message: `The system has no bed "${question.bedId}"; choose one of: ${beds.join(', ') || 'none'}.`,
      });
    }
  });
  return errors;
}
