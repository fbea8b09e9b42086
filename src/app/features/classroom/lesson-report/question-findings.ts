import type {
  LessonReport,
  Question,
  QuestionStats,
} from '../../../../../shared/contracts/classroom';
import type { UnitSystem } from '../../../../../shared/scenario';
import { answerWords, toleranceWords } from '../answer-units';

/** One question of a report, ready to show. */
export interface QuestionFinding {
  readonly question: Question;
  readonly number: number;
  readonly simulated: LessonReport['answerKey'][number]['simulated'];
  readonly simulatedWords: string;
  readonly explanation: string;
  readonly stats: QuestionStats | null;
  /** "2 of 4 right (50 %)" style summary; "No answers yet." before any. */
  readonly shareWords: string;
}

/** The report's questions with their simulated answers and how many got them right, in words. */
export function questionFindings(
  questions: readonly Question[],
  report: LessonReport,
  system: UnitSystem,
): QuestionFinding[] {
  return questions.map((question, index) => {
    const key = report.answerKey.find((k) => k.questionId === question.id);
    const stats = report.stats.find((s) => s.questionId === question.id) ?? null;
    const simulated = key?.simulated ?? null;
    return {
      question,
      number: index + 1,
      simulated,
      simulatedWords: answerWords(question, simulated, system),
      explanation: key?.explanation ?? '',
      stats,
      shareWords: shareWords(question, stats, system),
    };
  });
}

function shareWords(question: Question, stats: QuestionStats | null, system: UnitSystem): string {
  if (!stats || stats.answered === 0) return 'No answers yet.';
  if (stats.correctShare === null)
    return `${stats.answered} answered; the run gave no value to compare.`;
  const percent = Math.round(stats.correctShare * 100);
  const what =
    question.kind === 'bed-regime'
      ? 'predicted the regime right'
      : `within ${toleranceWords(question, system)}`;
  return `${stats.correct} of ${stats.answered} ${what} (${percent} %).`;
}
