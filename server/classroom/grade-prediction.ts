/** Sets one prediction against the simulated value of its question. */
import type {
  Outcome,
  Prediction,
  Question,
  SimulatedValue,
} from '../../shared/contracts/classroom';

/** Relative slack on a tolerance band, far below any number a person types. */
const EDGE_MARGIN = 1e-9;

/**
 * The outcome of one question. A period is right within ± `tolerance` × the simulated period, a
 * level within ± `toleranceM`, a regime when it is the same. Without a prediction or a simulated
 * value the outcome is ungraded (`correct` null); a number set against a regime (or the reverse)
 * is wrong.
 */
export function gradePrediction(
  question: Question,
  prediction: Prediction | undefined,
  simulated: SimulatedValue,
): Outcome {
  const predicted =
    prediction === undefined ? null : 'value' in prediction ? prediction.value : prediction.choice;
  const outcome: Outcome = {
    questionId: question.id,
    predicted,
    simulated,
    correct: null,
    difference: null,
  };
  if (predicted === null || simulated === null) return outcome;
  if (typeof predicted !== typeof simulated) return { ...outcome, correct: false };
  if (typeof predicted === 'string' || typeof simulated === 'string')
    return { ...outcome, correct: predicted === simulated };
  const difference = predicted - simulated;
  const allowed =
    question.kind === 'bed-period'
      ? question.tolerance * Math.abs(simulated)
      : question.kind === 'vessel-low-level'
        ? question.toleranceM
        : 0;
  // The edge of the band counts as right; the margin absorbs rounding of unit conversions (cm → m).
  return { ...outcome, difference, correct: Math.abs(difference) <= allowed * (1 + EDGE_MARGIN) };
}
