/** Reads and writes `lessons` and `lesson_answers`. */
import { and, asc, count, desc, eq, inArray, isNull } from 'drizzle-orm';
import type { Database } from '../db/database';
import { classes, classMembers, lessonAnswers, lessons, users } from '../db/schema';

/** A row of `lessons`. */
export type LessonRow = typeof lessons.$inferSelect;
/** A row of `lesson_answers`. */
export type AnswerRow = typeof lessonAnswers.$inferSelect;
/** The columns a new lesson needs. */
export type NewLesson = Pick<
  typeof lessons.$inferInsert,
  'ownerId' | 'classId' | 'title' | 'introduction' | 'scenario' | 'questions'
>;

/** A lesson with the name of its class (null in the library) and that class's instructor. */
export interface LessonWithClass {
  row: LessonRow;
  className: string | null;
  instructorId: string | null;
}

/** Inserts a lesson (unpublished, unrevealed). */
export async function insertLesson(db: Database, values: NewLesson): Promise<LessonRow> {
  const [row] = await db.insert(lessons).values(values).returning();
  if (!row) throw new Error('Inserting a lesson returned no row.');
  return row;
}

/** The lesson with its class's name and instructor, if it exists. */
export async function findLesson(
  db: Database,
  lessonId: string,
): Promise<LessonWithClass | undefined> {
  const [found] = await db
    .select({ row: lessons, className: classes.name, instructorId: classes.instructorId })
    .from(lessons)
    .leftJoin(classes, eq(classes.id, lessons.classId))
    .where(eq(lessons.id, lessonId));
  return found;
}

/** Whether `userId` is a student of `classId`. */
export async function isStudentOf(db: Database, classId: string, userId: string): Promise<boolean> {
  const [row] = await db
    .select({ userId: classMembers.userId })
    .from(classMembers)
    .where(and(eq(classMembers.classId, classId), eq(classMembers.userId, userId)));
  return row !== undefined;
}

/** Changes some columns of a lesson and stamps `updated_at`. */
export async function updateLesson(
  db: Database,
  lessonId: string,
  changes: Partial<
    Pick<LessonRow, 'title' | 'introduction' | 'questions' | 'published' | 'revealed'>
  >,
): Promise<LessonRow> {
  const [row] = await db
    .update(lessons)
    .set({ ...changes, updatedAt: new Date() })
    .where(eq(lessons.id, lessonId))
    .returning();
  if (!row) throw new Error(`Lesson ${lessonId} vanished during an update.`);
  return row;
}

/** Deletes a lesson and its answers. */
export async function deleteLesson(db: Database, lessonId: string): Promise<void> {
  await db.delete(lessons).where(eq(lessons.id, lessonId));
}

/** The owner's library: lessons in no class, newest first. */
export async function listLibrary(db: Database, ownerId: string): Promise<LessonRow[]> {
  return db
    .select()
    .from(lessons)
    .where(and(eq(lessons.ownerId, ownerId), isNull(lessons.classId)))
    .orderBy(desc(lessons.updatedAt));
}

/** A class's lessons (only published ones when `publishedOnly`), oldest first like a syllabus. */
export async function listClassLessons(
  db: Database,
  classId: string,
  publishedOnly: boolean,
): Promise<LessonRow[]> {
  const where = publishedOnly
    ? and(eq(lessons.classId, classId), eq(lessons.published, true))
    : eq(lessons.classId, classId);
  return db.select().from(lessons).where(where).orderBy(asc(lessons.createdAt));
}

/** Per lesson: answers from current students of the lesson's class (library lessons count none). */
export async function countAnswers(
  db: Database,
  lessonIds: string[],
): Promise<Map<string, number>> {
  const counts = new Map<string, number>();
  if (lessonIds.length === 0) return counts;
  const rows = await db
    .select({ lessonId: lessonAnswers.lessonId, n: count() })
    .from(lessonAnswers)
    .innerJoin(lessons, eq(lessons.id, lessonAnswers.lessonId))
    .innerJoin(
      classMembers,
      and(eq(classMembers.classId, lessons.classId), eq(classMembers.userId, lessonAnswers.userId)),
    )
    .where(inArray(lessonAnswers.lessonId, lessonIds))
    .groupBy(lessonAnswers.lessonId);
  for (const r of rows) counts.set(r.lessonId, r.n);
  return counts;
}

/** Whether anyone has answered the lesson. */
export async function hasAnswers(db: Database, lessonId: string): Promise<boolean> {
  const [row] = await db
    .select({ n: count() })
    .from(lessonAnswers)
    .where(eq(lessonAnswers.lessonId, lessonId));
  return (row?.n ?? 0) > 0;
}

/** One user's answers to the given lessons, by lesson id. */
export async function findAnswersOf(
  db: Database,
  userId: string,
  lessonIds: string[],
): Promise<Map<string, AnswerRow>> {
  const found = new Map<string, AnswerRow>();
  if (lessonIds.length === 0) return found;
  const rows = await db
    .select()
    .from(lessonAnswers)
    .where(and(eq(lessonAnswers.userId, userId), inArray(lessonAnswers.lessonId, lessonIds)));
  for (const row of rows) found.set(row.lessonId, row);
  return found;
}

/** Saves a user's predictions (replacing earlier ones) and clears any earlier run. */
export async function upsertPredictions(
  db: Database,
  lessonId: string,
  userId: string,
  answers: unknown,
): Promise<AnswerRow> {
  const now = new Date();
  const [row] = await db
    .insert(lessonAnswers)
    .values({ lessonId, userId, answers, submittedAt: now })
    .onConflictDoUpdate({
      target: [lessonAnswers.lessonId, lessonAnswers.userId],
      set: { answers, submittedAt: now, results: null, ranAt: null, runId: null },
    })
    .returning();
  if (!row) throw new Error('Saving predictions returned no row.');
  return row;
}

/** Stores the result of a user's run of a lesson. */
export async function saveResults(
  db: Database,
  answerId: string,
  results: unknown,
  ranAt: Date,
): Promise<AnswerRow> {
  const [row] = await db
    .update(lessonAnswers)
    .set({ results, ranAt })
    .where(eq(lessonAnswers.id, answerId))
    .returning();
  if (!row) throw new Error(`Answer ${answerId} vanished while its run was stored.`);
  return row;
}

/** The answers of current students of the lesson's class, with their names, by name. */
export async function listClassAnswers(
  db: Database,
  lesson: Pick<LessonRow, 'id' | 'classId'>,
): Promise<Array<{ answer: AnswerRow; name: string }>> {
  if (!lesson.classId) return [];
  return db
    .select({ answer: lessonAnswers, name: users.name })
    .from(lessonAnswers)
    .innerJoin(users, eq(users.id, lessonAnswers.userId))
    .innerJoin(
      classMembers,
      and(eq(classMembers.classId, lesson.classId), eq(classMembers.userId, lessonAnswers.userId)),
    )
    .where(eq(lessonAnswers.lessonId, lesson.id))
    .orderBy(asc(users.name));
}
