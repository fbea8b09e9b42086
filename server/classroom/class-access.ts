/**
 * Who may do what with a class: its instructor does everything; its students read it and its
 * published lessons; anybody else cannot tell it exists (404). Administrators get no special
 * access to other people's classes.
 */
import type { Database } from '../db/database';
import { HttpError, notFound } from '../http/http-error';
import { findClassForUser, type ClassWithRole } from './class-repository';

const UUID_PATTERN = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** Whether a path parameter can be an id (a malformed one is simply "not found"). */
export function isUuid(value: string): boolean {
  return UUID_PATTERN.test(value);
}

/** 403 for a student asking for what only the class's instructor may do. */
export const notClassInstructor = (): HttpError =>
  new HttpError(403, 'NOT_CLASS_INSTRUCTOR', 'Only the instructor of this class can do that.');

/**
 * Loads a class for `userId` needing `need`: `member` (instructor or student) or `instructor`.
 * Throws 404 `NOT_FOUND` when the class does not exist or the user is not in it, and 403
 * `NOT_CLASS_INSTRUCTOR` when a student asks for an instructor's action.
 */
export async function requireClass(
  db: Database,
  userId: string,
  classId: string,
  need: 'member' | 'instructor',
): Promise<ClassWithRole> {
  const found = isUuid(classId) ? await findClassForUser(db, classId, userId) : undefined;
  if (!found) throw notFound('That class');
  if (need === 'instructor' && found.myRole !== 'instructor') throw notClassInstructor();
  return found;
}
