/**
 * Test support for the classroom: a small lesson (the example one-bed system, one hour) with one
 * question of each kind, and classes, students, lessons and invitations made straight in the
 * database.
 */
import type { QuestionInput } from '../../shared/contracts/classroom';
import { EXAMPLE_SCENARIO_FILE } from '../../shared/scenario/index';
import type { AppContext } from '../../server/app-context';
import { addStudent, insertClass } from '../../server/classroom/class-repository';
import { replaceInvitation } from '../../server/classroom/invitation-repository';
import { newInvitationToken } from '../../server/classroom/invitation-token';
import { insertLesson, updateLesson } from '../../server/classroom/lesson-repository';
import { QuestionListSchema } from '../../shared/contracts/classroom';

/** The example one-bed system, run for one hour. */
export const LESSON_SCENARIO = {
  ...EXAMPLE_SCENARIO_FILE,
  run: { duration: '1 h', outputInterval: '5 s' },
};

/** One question of each kind about the example system. */
export const LESSON_QUESTIONS: QuestionInput[] = [
  {
    kind: 'bed-period',
    id: 'period',
    prompt: 'How long is one flood-and-drain cycle of bed A?',
    bedId: 'bed-a',
  },
  {
    kind: 'bed-regime',
    id: 'regime',
    prompt: 'Will the siphon of bed A start and stop?',
    bedId: 'bed-a',
    explanation: 'Compare the inflow with the priming flow.',
  },
  { kind: 'vessel-low-level', id: 'low', prompt: 'How low does the tank go?', vesselId: 'tank' },
];

/** A body for `POST /api/lessons`. */
export function lessonRequest(overrides: Record<string, unknown> = {}): Record<string, unknown> {
  return {
    title: 'What sets the start',
    introduction: 'Predict, then run.',
    scenario: LESSON_SCENARIO,
    questions: LESSON_QUESTIONS,
    ...overrides,
  };
}

/** A class taught by `instructorId` with these students. */
export async function makeClass(
  ctx: AppContext,
  instructorId: string,
  studentIds: string[] = [],
  name = 'Greenhouse class',
): Promise<string> {
  const row = await insertClass(ctx.db, instructorId, name);
  for (const id of studentIds) await addStudent(ctx.db, row.id, id);
  return row.id;
}

/** A lesson owned by `ownerId` in `classId` (or the library), published unless told otherwise. */
export async function makeLesson(
  ctx: AppContext,
  ownerId: string,
  classId: string | null,
  options: { published?: boolean; revealed?: boolean; title?: string } = {},
): Promise<string> {
  const row = await insertLesson(ctx.db, {
    ownerId,
    classId,
    title: options.title ?? 'What sets the start',
    introduction: 'Predict, then run.',
    scenario: LESSON_SCENARIO,
    questions: QuestionListSchema.parse(LESSON_QUESTIONS),
  });
  await updateLesson(ctx.db, row.id, {
    published: options.published ?? classId !== null,
    revealed: options.revealed ?? false,
  });
  return row.id;
}

/** An open invitation to `classId` for `email`; returns the token of its link. */
export async function makeInvitation(
  ctx: AppContext,
  classId: string,
  email: string,
  expiresAt = new Date(Date.now() + 86_400_000),
): Promise<string> {
  const { token, tokenHash } = newInvitationToken();
  await replaceInvitation(ctx.db, { classId, email: email.toLowerCase(), tokenHash, expiresAt });
  return token;
}
