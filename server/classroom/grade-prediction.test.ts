import { describe, expect, it } from 'vitest';
import { QuestionSchema, type Question } from '../../shared/contracts/classroom';
import { gradePrediction } from './grade-prediction';

const period: Question = QuestionSchema.parse({
  kind: 'bed-period',
  id: 'p',
  prompt: 'Period?',
  bedId: 'bed-a',
  tolerance: 0.2,
});
const regime: Question = QuestionSchema.parse({
  kind: 'bed-regime',
  id: 'r',
  prompt: 'Will it start?',
  bedId: 'bed-a',
});
const low: Question = QuestionSchema.parse({
  kind: 'vessel-low-level',
  id: 'l',
  prompt: 'How low?',
  vesselId: 'tank',
  toleranceM: 0.03,
});

describe('gradePrediction', () => {
  it.each([
    ['inside the band', 700, 600, true],
    ['exactly on the upper edge', 720, 600, true],
    ['just over the band', 721, 600, false],
    ['far below', 100, 600, false],
  ])('grades a period %s', (_label, predicted, simulated, correct) => {
    const outcome = gradePrediction(period, { questionId: 'p', value: predicted }, simulated);
    expect(outcome.correct).toBe(correct);
    expect(outcome.difference).toBeCloseTo(predicted - simulated, 12);
  });

  it('grades a level against an absolute tolerance in metres', () => {
    expect(gradePrediction(low, { questionId: 'l', value: 0.42 }, 0.45).correct).toBe(true);
    expect(gradePrediction(low, { questionId: 'l', value: 0.41 }, 0.45).correct).toBe(false);
  });

  it('grades a regime by equality and gives no difference', () => {
    const right = gradePrediction(
      regime,
      { questionId: 'r', choice: 'spill-stall' },
      'spill-stall',
    );
    const wrong = gradePrediction(regime, { questionId: 'r', choice: 'cycling' }, 'spill-stall');
    expect([right.correct, right.difference]).toEqual([true, null]);
    expect(wrong).toEqual({
      questionId: 'r',
      predicted: 'cycling',
      simulated: 'spill-stall',
      correct: false,
      difference: null,
    });
  });

  it('leaves an answer ungraded when either side is missing', () => {
    expect(gradePrediction(period, undefined, 600).correct).toBeNull();
    expect(gradePrediction(period, { questionId: 'p', value: 600 }, null)).toEqual({
      questionId: 'p',
      predicted: 600,
      simulated: null,
      correct: null,
      difference: null,
    });
  });

  it('counts a number set against a regime as wrong', () => {
    expect(gradePrediction(regime, { questionId: 'r', value: 3 }, 'cycling').correct).toBe(false);
  });
});
