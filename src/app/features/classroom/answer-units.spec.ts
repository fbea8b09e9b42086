import { QuestionSchema } from '../../../../shared/contracts/classroom';
import { answerUnit, answerWords, fromSi, toSi, toleranceWords } from './answer-units';

const period = QuestionSchema.parse({
  kind: 'bed-period',
  id: 'p',
  prompt: 'Period?',
  bedId: 'bed',
});
const low = QuestionSchema.parse({
  kind: 'vessel-low-level',
  id: 'l',
  prompt: 'Low?',
  vesselId: 'tank',
  toleranceM: 0.0254,
});
const regime = QuestionSchema.parse({
  kind: 'bed-regime',
  id: 'r',
  prompt: 'Start?',
  bedId: 'bed',
});

describe('answer units', () => {
  it('takes periods in minutes and levels in centimetres or inches', () => {
    expect(answerUnit(period, 'us')?.label).toBe('min');
    expect(answerUnit(low, 'metric')?.label).toBe('cm');
    expect(answerUnit(low, 'us')?.label).toBe('in');
    expect(answerUnit(regime, 'metric')).toBeNull();
  });

  it('converts typed numbers to SI and back', () => {
    const inches = answerUnit(low, 'us');
    if (!inches) throw new Error('no unit');
    expect(toSi(10, inches)).toBeCloseTo(0.254, 12);
    expect(fromSi(0.254, inches)).toBe(10);
    expect(toSi(7.5, answerUnit(period, 'metric') ?? inches)).toBe(450);
  });

  it('words answers and tolerances in the reader’s units', () => {
    expect(answerWords(period, 471.9, 'metric')).toBe('7.9 min');
    expect(answerWords(low, 0.4793, 'metric')).toBe('47.9 cm');
    expect(answerWords(low, 0.4793, 'us')).toBe('18.9 in');
    expect(answerWords(regime, 'spill-stall', 'metric')).toContain('never starts');
    expect(answerWords(period, null, 'metric')).toBe('no full cycle');
    expect(toleranceWords(period, 'metric')).toBe('± 20 %');
    expect(toleranceWords(low, 'us')).toBe('± 1.0 in');
  });
});
