/**
 * Students' answers: predictions first, then a run of the lesson's system that sets each
 * prediction against the simulated value; and the instructor's report over the whole class.
 */
import type {
  AnswerRequest,
  LessonReport,
  LessonSimulation,
  MyAnswer,
  Outcome,
  Prediction,
  Question,
  QuestionStats,
} from '../../shared/contracts/classroom';
import type { SessionUser } from '../auth/session-user';
import { HttpError, badRequest } from '../http/http-error';
import { countStudents } from './class-repository';
import type { ClassroomDeps } from './classroom-deps';
import { checkPredictions } from './check-predictions';
import { gradePrediction } from './grade-prediction';
import { requireLesson } from './lesson-access';
import * as lessons from './lesson-repository';
import { simulatedValue } from './simulated-value';
import {
  storedPredictions,
  storedQuestions,
  toMyAnswer,
  type StoredResults,
} from './stored-lesson';

/** Saves the caller's predictions (a student of the lesson's class), until they run the lesson. */
export async function saveAnswer(
  deps: ClassroomDeps,
  user: SessionUser,
  lessonId: string,
  request: AnswerRequest,
): Promise<MyAnswer> {
  const { row } = await requireLesson(deps.db, user.id, lessonId, 'student');
  const existing = (await lessons.findAnswersOf(deps.db, user.id, [row.id])).get(row.id);
  if (existing?.ranAt) {
    throw new HttpError(
      409,
      'ANSWER_LOCKED',
      'You already ran this lesson, so your predictions are final.',
    );
  }
  const errors = checkPredictions(storedQuestions(row), request.predictions);
  if (errors.length > 0) throw badRequest(`Your answer has ${errors.length} problem(s).`, errors);
  return toMyAnswer(await lessons.upsertPredictions(deps.db, row.id, user.id, request.predictions));
}

/**
 * Runs the lesson's system for the caller (a student who has saved predictions) and stores the
 * simulation with each prediction set against it. Running again returns the stored result. A
 * simulation that failed comes back with `ranAt` null and no outcomes: nothing is stored, the
 * predictions stay open, and the student may run again.
 */
export async function runLesson(
  deps: ClassroomDeps,
  user: SessionUser,
  lessonId: string,
): Promise<MyAnswer> {
  const { row } = await requireLesson(deps.db, user.id, lessonId, 'student');
  const answer = (await lessons.findAnswersOf(deps.db, user.id, [row.id])).get(row.id);
  if (!answer)
    throw new HttpError(
      409,
      'PREDICT_FIRST',
      'Save your predictions first; the run then shows how they compare.',
    );
  if (answer.ranAt) return toMyAnswer(answer);
  const simulation = await deps.simulations.get(row.id, row.scenario);
  // A run that did not finish is an answer, not an error: it is shown, and nothing is locked.
  if (simulation.status === 'failed' || simulation.status === 'cancelled')
    return { ...toMyAnswer(answer), simulation };
  const results: StoredResults = {
    simulation,
    outcomes: grade(storedQuestions(row), storedPredictions(answer), simulation),
  };
  return toMyAnswer(await lessons.saveResults(deps.db, answer.id, results, deps.now()));
}

/** Every current student's predictions against the simulation, with per-question figures (the owner only). */
export async function getReport(
  deps: ClassroomDeps,
  user: SessionUser,
  lessonId: string,
): Promise<LessonReport> {
  const { row } = await requireLesson(deps.db, user.id, lessonId, 'owner');
  const questions = storedQuestions(row);
  const simulation = await deps.simulations.get(row.id, row.scenario);
  const rows = await lessons.listClassAnswers(deps.db, row);
  const answers = rows.map(({ answer, name }) => {
    const predictions = storedPredictions(answer);
    return {
      userId: answer.userId,
      name,
      predictions,
      outcomes: grade(questions, predictions, simulation),
      submittedAt: answer.submittedAt.toISOString(),
      ranAt: answer.ranAt?.toISOString() ?? null,
    };
  });
  return {
    lessonId: row.id,
    rosterSize: row.classId ? await countStudents(deps.db, row.classId) : 0,
    simulation,
    answerKey: questions.map((q) => ({
      questionId: q.id,
      simulated: simulatedValue(q, simulation),
      explanation: q.explanation,
    })),
    answers,
    stats: questions.map((q) =>
      questionStats(
        q,
        answers.map((a) => a.outcomes),
      ),
    ),
  };
}

function grade(
  questions: readonly Question[],
  predictions: readonly Prediction[],
  simulation: LessonSimulation,
): Outcome[] {
  return questions.map((q) =>
    gradePrediction(
      q,
      predictions.find((p) => p.questionId === q.id),
      simulatedValue(q, simulation),
    ),
  );
}

/** Per question: how many answered, how many right and the share right among the graded ones. */
function questionStats(question: Question, outcomesByStudent: readonly Outcome[][]): QuestionStats {
  const outcomes = outcomesByStudent
    .map((list) => list.find((o) => o.questionId === question.id))
    .filter((o) => o !== undefined);
  const answered = outcomes.filter((o) => o.predicted !== null).length;
  const graded = outcomes.filter((o) => o.correct !== null);
  const correct = graded.filter((o) => o.correct === true).length;
  return {
    questionId: question.id,
    answered,
    correct,
    correctShare: graded.length > 0 ? correct / graded.length : null,
  };
}
