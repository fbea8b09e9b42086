/**
 * Who may do what with a lesson: its owner (the instructor) does everything; a student of its
 * class reads it once published and answers it; anybody else cannot tell it exists (404).
 */
import type { Database } from '../db/database';
import { HttpError, notFound } from '../http/http-error';
import { isUuid, notClassInstructor } from './class-access';
import { findLesson, isStudentOf, type LessonWithClass } from './lesson-repository';

/** A lesson and the caller's part in it. */
export interface LessonAccess extends LessonWithClass {
  myRole: 'instructor' | 'student';
}

/**
 * Loads a lesson for `userId` needing `need`: `read` (owner or student), `owner`, or `student`
 * (answering and running are for students). Throws 404 `NOT_FOUND` when the lesson does not exist
 * or is hidden from the user (an unpublished lesson is hidden from students), 403
 * `NOT_CLASS_INSTRUCTOR` when a student asks for an owner's action, and 403 `STUDENTS_ONLY` when
 * the owner tries to answer.
 */
export async function requireLesson(
  db: Database,
  userId: string,
  lessonId: string,
  need: 'read' | 'owner' | 'student',
): Promise<LessonAccess> {
  const found = isUuid(lessonId) ? await findLesson(db, lessonId) : undefined;
  if (!found) throw notFound('That lesson');
  const myRole = await roleIn(db, found, userId);
  if (!myRole) throw notFound('That lesson');
  if (need === 'owner' && myRole !== 'instructor') throw notClassInstructor();
  if (need === 'student' && myRole !== 'student') {
    throw new HttpError(
      403,
      'STUDENTS_ONLY',
      'Only students answer lessons; the lesson report shows the simulated answers.',
    );
  }
  return { ...found, myRole };
}

async function roleIn(
  db: Database,
  lesson: LessonWithClass,
  userId: string,
): Promise<'instructor' | 'student' | null> {
  if (lesson.row.ownerId === userId) return 'instructor';
  const { classId, published } = lesson.row;
  if (classId && published && (await isStudentOf(db, classId, userId))) return 'student';
  return null;
}
