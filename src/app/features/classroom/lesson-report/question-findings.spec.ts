import { QuestionListSchema, type LessonReport } from '../../../../../shared/contracts/classroom';
import { questionFindings } from './question-findings';

const questions = QuestionListSchema.parse([
  {
    kind: 'bed-regime',
    id: 'regime',
    prompt: 'Start?',
    bedId: 'bed',
    explanation: 'Inflow against priming flow.',
  },
  { kind: 'vessel-low-level', id: 'low', prompt: 'Low?', vesselId: 'tank' },
]);

function report(stats: LessonReport['stats']): LessonReport {
  return {
    lessonId: '00000000-0000-4000-8000-000000000001',
    rosterSize: 4,
    simulation: {
      status: 'completed',
      error: null,
      durationS: 3600,
      verdict: 'ok',
      verdicts: [],
      beds: [],
      vessels: [],
      levels: { t_s: [], channels: [] },
    },
    answerKey: [
      {
        questionId: 'regime',
        simulated: 'spill-stall',
        explanation: 'Inflow against priming flow.',
      },
      { questionId: 'low', simulated: 0.4793, explanation: '' },
    ],
    answers: [],
    stats,
  };
}

describe('questionFindings', () => {
  it('words the share right for regimes and for numbers with their band', () => {
    const findings = questionFindings(
      questions,
      report([
        { questionId: 'regime', answered: 4, correct: 1, correctShare: 0.25 },
        { questionId: 'low', answered: 3, correct: 2, correctShare: 2 / 3 },
      ]),
      'metric',
    );
    expect(findings.map((f) => f.shareWords)).toEqual([
      '1 of 4 predicted the regime right (25 %).',
      '2 of 3 within ± 2.0 cm (67 %).',
    ]);
    expect(findings[1]?.simulatedWords).toBe('47.9 cm');
    expect(findings[0]?.explanation).toBe('Inflow against priming flow.');
  });

  it('says when nobody has answered', () => {
    const findings = questionFindings(
      questions,
      report([{ questionId: 'regime', answered: 0, correct: 0, correctShare: null }]),
      'metric',
    );
    expect(findings.map((f) => f.shareWords)).toEqual(['No answers yet.', 'No answers yet.']);
  });
});
