import { QuestionListSchema } from '../../../../../shared/contracts/classroom';
import { predictionForm, readPredictions } from './prediction-form';

const questions = QuestionListSchema.parse([
  { kind: 'bed-period', id: 'period', prompt: 'Period?', bedId: 'bed' },
  { kind: 'bed-regime', id: 'regime', prompt: 'Start?', bedId: 'bed' },
  { kind: 'vessel-low-level', id: 'low', prompt: 'Low?', vesselId: 'tank' },
]);

describe('the prediction form', () => {
  it('reads typed minutes and inches into seconds and metres', () => {
    const form = predictionForm(questions, [], 'us');
    form.setValue({ period: '7,5', regime: 'spill-stall', low: '18' });
    expect(readPredictions(questions, form, 'us')).toEqual({
      predictions: [
        { questionId: 'period', value: 450 },
        { questionId: 'regime', choice: 'spill-stall' },
        { questionId: 'low', value: 18 * 0.0254 },
      ],
    });
  });

  it('fills in earlier predictions in the reader’s units', () => {
    const form = predictionForm(
      questions,
      [
        { questionId: 'low', value: 0.475 },
        { questionId: 'regime', choice: 'cycling' },
      ],
      'metric',
    );
    expect(form.getRawValue()).toEqual({ period: '', regime: 'cycling', low: '47.5' });
  });

  it('names the first unanswered or non-numeric question', () => {
    const form = predictionForm(questions, [], 'metric');
    expect(readPredictions(questions, form, 'metric')).toEqual({
      problem: 'Answer question 1 before saving.',
    });
    form.setValue({ period: 'soon', regime: 'cycling', low: '40' });
    expect(readPredictions(questions, form, 'metric')).toEqual({
      problem: 'Question 1 needs a number of min, 0 or more.',
    });
  });
});
