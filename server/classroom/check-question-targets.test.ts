import { describe, expect, it } from 'vitest';
import { QuestionListSchema } from '../../shared/contracts/classroom';
import { checkQuestionTargets } from './check-question-targets';

const vessels = [
  { id: 'tank', kind: 'tank' as const },
  { id: 'sump', kind: 'sump' as const },
  { id: 'bed-a', kind: 'bed' as const },
];

describe('checkQuestionTargets', () => {
  it('accepts beds for bed questions and tanks or sumps for level questions', () => {
    const questions = QuestionListSchema.parse([
      { kind: 'bed-period', id: 'a', prompt: 'x', bedId: 'bed-a' },
      { kind: 'vessel-low-level', id: 'b', prompt: 'x', vesselId: 'sump' },
    ]);
    expect(checkQuestionTargets(questions, { vessels })).toEqual([]);
  });

  it('refuses a bed question about a tank and a level question about a bed, listing the choices', () => {
    const questions = QuestionListSchema.parse([
      { kind: 'bed-regime', id: 'a', prompt: 'x', bedId: 'tank' },
      { kind: 'vessel-low-level', id: 'b', prompt: 'x', vesselId: 'bed-a' },
    ]);
    expect(checkQuestionTargets(questions, { vessels })).toEqual([
      {
        path: 'questions[0].bedId',
        message: 'The system has no bed "tank"; choose one of: bed-a.',
      },
      {
        path: 'questions[1].vesselId',
        message: 'The system has no tank or sump "bed-a"; choose one of: tank, sump.',
      },
    ]);
  });
});
