import { QuestionListSchema } from '../../../../../shared/contracts/classroom';
import { defaultTolerance, toQuestions } from './question-draft';

describe('toQuestions', () => {
  it('turns drafts into valid API questions with SI tolerances', () => {
    const questions = toQuestions(
      [
        {
          kind: 'bed-regime',
          prompt: ' Start? ',
          explanation: 'Inflow vs priming.',
          target: 'bed-a',
          tolerance: 0,
        },
        { kind: 'bed-period', prompt: 'Period?', explanation: '', target: 'bed-a', tolerance: 25 },
        { kind: 'vessel-low-level', prompt: 'Low?', explanation: '', target: 'sump', tolerance: 1 },
      ],
      'us',
    );
    const parsed = QuestionListSchema.parse(questions);
    expect(parsed.map((q) => q.id)).toEqual(['q1', 'q2', 'q3']);
    expect(parsed[0]).toMatchObject({
      kind: 'bed-regime',
      prompt: 'Start?',
      bedId: 'bed-a',
      choices: ['cycling', 'spill-stall', 'siphon-lock'],
    });
    expect(parsed[1]).toMatchObject({ kind: 'bed-period', tolerance: 0.25 });
    expect(parsed[2]).toMatchObject({
      kind: 'vessel-low-level',
      vesselId: 'sump',
      toleranceM: 0.0254,
    });
  });

  it('starts tolerances at 20 % and 2 cm or 1 in', () => {
    expect([
      defaultTolerance('bed-period', 'metric'),
      defaultTolerance('vessel-low-level', 'metric'),
      defaultTolerance('vessel-low-level', 'us'),
    ]).toEqual([20, 2, 1]);
  });
});
