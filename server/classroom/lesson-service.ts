/** Lessons: the instructor's library, lessons in classes, editing, publishing and copying. */
import type { z } from 'zod';
import type {
  CreateLessonRequestSchema,
  DuplicateLessonRequestSchema,
  Lesson,
  LessonList,
  Question,
  UpdateLessonRequestSchema,
} from '../../shared/contracts/classroom';
import { parseScenario, type Scenario } from '../../shared/scenario/index';
import type { SessionUser } from '../auth/session-user';
import { requireSystemAccess } from '../auth/system-access';
import { HttpError, badRequest } from '../http/http-error';
import { requireClass } from './class-access';
import { toInstructorItems } from './class-service';
import type { ClassroomDeps } from './classroom-deps';
import { checkQuestionTargets } from './check-question-targets';
import { requireLesson, type LessonAccess } from './lesson-access';
import * as lessons from './lesson-repository';
import { simulatedValue } from './simulated-value';
import { storedQuestions, storedScenario, toMyAnswer } from './stored-lesson';

type CreateLesson = z.output<typeof CreateLessonRequestSchema>;
type UpdateLesson = z.output<typeof UpdateLessonRequestSchema>;
type DuplicateLesson = z.output<typeof DuplicateLessonRequestSchema>;

/** The caller's library: their lessons in no class. */
export async function listLibrary(deps: ClassroomDeps, user: SessionUser): Promise<LessonList> {
  const rows = await lessons.listLibrary(deps.db, user.id);
  return { items: toInstructorItems(rows, new Map()) };
}

/** Creates a lesson in the library or in a class the caller teaches; its system is copied in. */
export async function createLesson(
  deps: ClassroomDeps,
  user: SessionUser,
  request: CreateLesson,
): Promise<Lesson> {
  if (request.classId) await requireClass(deps.db, user.id, request.classId, 'instructor');
  const document = request.systemId
    ? (await requireSystemAccess(deps.db, user, request.systemId, 'read')).system.scenario
    : request.scenario;
  const scenario = checkScenario(document, request.systemId ? 'systemId' : 'scenario');
  checkTargets(request.questions, scenario);
  const row = await lessons.insertLesson(deps.db, {
    ownerId: user.id,
    classId: request.classId,
    title: request.title,
    introduction: request.introduction,
    scenario: document,
    questions: request.questions,
  });
  return getLesson(deps, user, row.id);
}

/**
 * A lesson as the caller may see it. A student gets the explanations and the answer key only once
 * the lesson is revealed, and their own answer.
 */
export async function getLesson(
  deps: ClassroomDeps,
  user: SessionUser,
  lessonId: string,
): Promise<Lesson> {
  const access = await requireLesson(deps.db, user.id, lessonId, 'read');
  const { row } = access;
  const questions = storedQuestions(row);
  const isStudent = access.myRole === 'student';
  const answer = isStudent
    ? (await lessons.findAnswersOf(deps.db, user.id, [row.id])).get(row.id)
    : undefined;
  const showKey = isStudent && row.revealed;
  const simulation = showKey ? await deps.simulations.get(row.id, row.scenario) : null;
  return {
    id: row.id,
    title: row.title,
    introduction: row.introduction,
    classId: row.classId,
    className: access.className,
    scenario: storedScenario(row),
    questions:
      isStudent && !row.revealed ? questions.map((q) => ({ ...q, explanation: '' })) : questions,
    published: row.published,
    revealed: row.revealed,
    myRole: access.myRole,
    myAnswer: answer ? toMyAnswer(answer) : null,
    answerKey: simulation
      ? questions.map((q) => ({
          questionId: q.id,
          simulated: simulatedValue(q, simulation),
          explanation: q.explanation,
        }))
      : null,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

/**
 * Changes a lesson (its owner only). Questions are fixed once anyone answered; publishing and
 * revealing are for lessons in a class.
 */
export async function updateLesson(
  deps: ClassroomDeps,
  user: SessionUser,
  lessonId: string,
  request: UpdateLesson,
): Promise<Lesson> {
  const { row } = await requireLesson(deps.db, user.id, lessonId, 'owner');
  if (request.questions) {
    if (await lessons.hasAnswers(deps.db, row.id)) {
      throw new HttpError(
        409,
        'LESSON_HAS_ANSWERS',
        'Students have answered these questions, so they cannot change; duplicate the lesson to ask different ones.',
      );
    }
    checkTargets(request.questions, checkScenario(row.scenario, 'scenario'));
  }
  if ((request.published || request.revealed) && !row.classId) {
    throw new HttpError(
      409,
      'LESSON_NOT_IN_CLASS',
      'This lesson is in your library; copy it into a class to publish or reveal it there.',
    );
  }
  await lessons.updateLesson(deps.db, row.id, request);
  return getLesson(deps, user, row.id);
}

/** Deletes a lesson and its answers (its owner only). */
export async function deleteLesson(
  deps: ClassroomDeps,
  user: SessionUser,
  lessonId: string,
): Promise<void> {
  const { row } = await requireLesson(deps.db, user.id, lessonId, 'owner');
  await lessons.deleteLesson(deps.db, row.id);
  deps.simulations.forget(row.id);
}

/** Copies a lesson into the library or a class the caller teaches: unpublished, unrevealed, unanswered. */
export async function duplicateLesson(
  deps: ClassroomDeps,
  user: SessionUser,
  lessonId: string,
  request: DuplicateLesson,
): Promise<Lesson> {
  const source: LessonAccess = await requireLesson(deps.db, user.id, lessonId, 'owner');
  if (request.classId) await requireClass(deps.db, user.id, request.classId, 'instructor');
  const copy = await lessons.insertLesson(deps.db, {
    ownerId: user.id,
    classId: request.classId,
    title: request.title ?? source.row.title,
    introduction: source.row.introduction,
    scenario: source.row.scenario,
    questions: source.row.questions,
  });
  return getLesson(deps, user, copy.id);
}

function checkScenario(document: unknown, path: string): Scenario {
  const parsed = parseScenario(document);
  if (parsed.success) return parsed.scenario;
  const fields = parsed.issues.map((issue) => ({
    path: issue.path ? `${path}.${issue.path}` : path,
    message: issue.message,
  }));
  throw badRequest(
    `The lesson's system has ${fields.length} problem(s); fix them in the system editor first.`,
    fields,
  );
}

function checkTargets(questions: readonly Question[], scenario: Scenario): void {
  const errors = checkQuestionTargets(questions, scenario);
  if (errors.length > 0)
    throw badRequest(`${errors.length} question(s) name a part the system does not have.`, errors);
}
