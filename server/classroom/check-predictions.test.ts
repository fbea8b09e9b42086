import { describe, expect, it } from 'vitest';
import { QuestionListSchema } from '../../shared/contracts/classroom';
import { checkPredictions } from './check-predictions';

const questions = QuestionListSchema.parse([
  { kind: 'bed-period', id: 'period', prompt: 'Period?', bedId: 'bed' },
  {
    kind: 'bed-regime',
    id: 'regime',
    prompt: 'Start?',
    bedId: 'bed',
    choices: ['cycling', 'spill-stall'],
  },
]);

describe('checkPredictions', () => {
  it('accepts one fitting prediction per question', () => {
    expect(
      checkPredictions(questions, [
        { questionId: 'period', value: 300 },
        { questionId: 'regime', choice: 'cycling' },
      ]),
    ).toEqual([]);
  });

  it('names each problem with its path', () => {
    const errors = checkPredictions(questions, [
      { questionId: 'period', choice: 'cycling' },
      { questionId: 'regime', choice: 'siphon-lock' },
      { questionId: 'regime', choice: 'cycling' },
      { questionId: 'nope', value: 1 },
    ]);
    expect(errors.map((e) => e.path)).toEqual([
      'predictions[0]',
      'predictions[1]',
      'predictions[2]',
      'predictions[3]',
    ]);
    expect(errors[0]?.message).toBe('Enter a number.');
    expect(errors[1]?.message).toBe('Pick one of: cycling, spill-stall.');
    expect(errors[2]?.message).toContain('only once');
    expect(errors[3]?.message).toContain('no question "nope"');
  });

  it('asks for every unanswered question', () => {
    const errors = checkPredictions(questions, [{ questionId: 'regime', value: 2 }]);
    expect(errors).toEqual([
      { path: 'predictions[0]', message: 'Pick one of the offered choices.' },
      { path: 'predictions', message: 'Answer question "period" before saving.' },
    ]);
  });
});
