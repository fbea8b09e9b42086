/** Classes: create, list, read, rename, delete; the roster and removing students. */
import type {
  ClassDetail,
  ClassList,
  ClassRequest,
  LessonListItem,
  Roster,
} from '../../shared/contracts/classroom';
import type { SessionUser } from '../auth/session-user';
import type { Database } from '../db/database';
import { notFound } from '../http/http-error';
import { requireClass } from './class-access';
import * as classes from './class-repository';
import { listOpenInvitations } from './invitation-repository';
import { invitationStatus } from './invitation-status';
import {
  countAnswers,
  findAnswersOf,
  listClassLessons,
  type AnswerRow,
  type LessonRow,
} from './lesson-repository';

/** The caller's classes: those they teach, then those they attend. */
export async function listClasses(db: Database, user: SessionUser): Promise<ClassList> {
  const rows = await classes.listClassesForUser(db, user.id);
  return {
    items: rows.map((c) => ({
      id: c.row.id,
      name: c.row.name,
      instructorName: c.instructorName,
      myRole: c.myRole,
      studentCount: c.studentCount,
      lessonCount: c.lessonCount,
      createdAt: c.row.createdAt.toISOString(),
    })),
  };
}

/** Creates a class the caller teaches. */
export async function createClass(
  db: Database,
  user: SessionUser,
  request: ClassRequest,
): Promise<ClassDetail> {
  const row = await classes.insertClass(db, user.id, request.name);
  return getClass(db, user, row.id);
}

/** A class with its lessons: all of them for its instructor, the published ones for a student. */
export async function getClass(
  db: Database,
  user: SessionUser,
  classId: string,
): Promise<ClassDetail> {
  const found = await requireClass(db, user.id, classId, 'member');
  const isInstructor = found.myRole === 'instructor';
  const lessonRows = await listClassLessons(db, classId, !isInstructor);
  const ids = lessonRows.map((l) => l.id);
  const lessons = isInstructor
    ? toInstructorItems(lessonRows, await countAnswers(db, ids))
    : toStudentItems(lessonRows, await findAnswersOf(db, user.id, ids));
  return {
    id: found.row.id,
    name: found.row.name,
    instructorName: found.instructorName,
    myRole: found.myRole,
    studentCount: await classes.countStudents(db, classId),
    lessons,
    createdAt: found.row.createdAt.toISOString(),
  };
}

/** Renames a class (its instructor only). */
export async function renameClass(
  db: Database,
  user: SessionUser,
  classId: string,
  request: ClassRequest,
): Promise<ClassDetail> {
  await requireClass(db, user.id, classId, 'instructor');
  await classes.renameClass(db, classId, request.name);
  return getClass(db, user, classId);
}

/** Deletes a class with its lessons, members and invitations (its instructor only). */
export async function deleteClass(db: Database, user: SessionUser, classId: string): Promise<void> {
  await requireClass(db, user.id, classId, 'instructor');
  await classes.deleteClass(db, classId);
}

/** The students and the invitations not yet accepted (the class's instructor only). */
export async function getRoster(
  db: Database,
  user: SessionUser,
  classId: string,
  now: Date,
): Promise<Roster> {
  await requireClass(db, user.id, classId, 'instructor');
  const [students, invitations] = await Promise.all([
    classes.listStudents(db, classId),
    listOpenInvitations(db, classId),
  ]);
  return {
    students: students.map((s) => ({ ...s, joinedAt: s.joinedAt.toISOString() })),
    invitations: invitations.map((i) => ({
      id: i.id,
      email: i.email,
      status: invitationStatus(i, now),
      createdAt: i.createdAt.toISOString(),
      expiresAt: i.expiresAt.toISOString(),
    })),
  };
}

/** Removes a student from a class; their answers stay stored but leave the reports. */
export async function removeStudent(
  db: Database,
  user: SessionUser,
  classId: string,
  studentId: string,
): Promise<void> {
  await requireClass(db, user.id, classId, 'instructor');
  const removed = await classes.removeStudent(db, classId, studentId);
  if (!removed) throw notFound('That student');
}

/** Lesson rows as their instructor lists them. */
export function toInstructorItems(
  rows: LessonRow[],
  answerCounts: Map<string, number>,
): LessonListItem[] {
  return rows.map((row) => ({
    ...baseItem(row),
    answerCount: answerCounts.get(row.id) ?? 0,
    myProgress: null,
  }));
}

function toStudentItems(rows: LessonRow[], answers: Map<string, AnswerRow>): LessonListItem[] {
  return rows.map((row) => {
    const answer = answers.get(row.id);
    const myProgress = !answer ? 'not-started' : answer.ranAt ? 'ran' : 'predicted';
    return { ...baseItem(row), answerCount: null, myProgress };
  });
}

function baseItem(row: LessonRow): Omit<LessonListItem, 'answerCount' | 'myProgress'> {
  return {
    id: row.id,
    title: row.title,
    classId: row.classId,
    questionCount: Array.isArray(row.questions) ? row.questions.length : 0,
    published: row.published,
    revealed: row.revealed,
    updatedAt: row.updatedAt.toISOString(),
  };
}
