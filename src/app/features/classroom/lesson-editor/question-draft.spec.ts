import { QuestionListSchema } from '../../../../../shared/contracts/classroom';
import { defaultTolerance, toDrafts, toQuestions } from './question-draft';

describe('toQuestions', () => {
  it('turns drafts into valid API questions with SI tolerances', () => {
    const questions = toQuestions(
      [
        {
          id: '',
          kind: 'bed-regime',
          prompt: ' Start? ',
          explanation: 'Inflow vs priming.',
          target: 'bed-a',
          tolerance: 0,
        },
        {
          id: '',
          kind: 'bed-period',
          prompt: 'Period?',
          explanation: '',
          target: 'bed-a',
          tolerance: 25,
        },
        {
          id: '',
          kind: 'vessel-low-level',
          prompt: 'Low?',
          explanation: '',
          target: 'sump',
          tolerance: 1,
        },
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

describe('toDrafts', () => {
  const stored = QuestionListSchema.parse([
    { kind: 'bed-period', id: 'period', prompt: 'Period?', bedId: 'bed-a', tolerance: 0.15 },
    {
      kind: 'bed-regime',
      id: 'regime',
      prompt: 'Start?',
      explanation: 'Inflow vs priming.',
      bedId: 'bed-a',
      choices: ['cycling', 'siphon-lock'],
    },
    { kind: 'vessel-low-level', id: 'low', prompt: 'Low?', vesselId: 'tank', toleranceM: 0.03 },
  ]);

  it('shows stored questions in the editor units: percent, and cm or in', () => {
    expect(toDrafts(stored, 'metric').map((d) => [d.id, d.kind, d.target, d.tolerance])).toEqual([
      ['period', 'bed-period', 'bed-a', 15],
      ['regime', 'bed-regime', 'bed-a', 0],
      ['low', 'vessel-low-level', 'tank', 3],
    ]);
    expect(toDrafts(stored, 'us')[2]?.tolerance).toBe(1.181);
  });

  it('round-trips stored questions unchanged, keeping ids and a regime question’s choices', () => {
    const back = QuestionListSchema.parse(
      toQuestions(toDrafts(stored, 'metric'), 'metric', stored),
    );
    expect(back).toHaveLength(3);
    expect(back[0]).toEqual(stored[0]);
    expect(back[1]).toEqual(stored[1]);
    expect(back[2]?.kind === 'vessel-low-level' && back[2].toleranceM).toBeCloseTo(0.03, 12);
  });

  it('gives a new question the first id no kept question uses', () => {
    const drafts = [
      ...toDrafts(stored, 'metric'),
      {
        id: '',
        kind: 'bed-regime' as const,
        prompt: 'Q',
        explanation: '',
        target: 'bed-a',
        tolerance: 0,
      },
    ];
    drafts[1] = { ...drafts[1]!, id: 'q1' };
    const ids = toQuestions(drafts, 'metric', stored).map((q) => q.id);
    expect(ids).toEqual(['period', 'q1', 'low', 'q2']);
  });
});
