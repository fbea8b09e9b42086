/** Reads and writes `classes` and `class_members`. */
import { and, asc, count, desc, eq, inArray, sql } from 'drizzle-orm';
import type { Database } from '../db/database';
import { classMembers, classes, lessons, users } from '../db/schema';

/** A row of `classes`. */
export type ClassRow = typeof classes.$inferSelect;

/** A class with its instructor's name and the caller's part in it. */
export interface ClassWithRole {
  row: ClassRow;
  instructorName: string;
  myRole: 'instructor' | 'student';
}

/** A class row with the figures the list shows. */
export interface ClassListRow extends ClassWithRole {
  studentCount: number;
  lessonCount: number;
}

/** A student on a roster. */
export interface StudentRow {
  userId: string;
  name: string;
  email: string;
  joinedAt: Date;
}

/** Inserts a class taught by `instructorId`. */
export async function insertClass(
  db: Database,
  instructorId: string,
  name: string,
): Promise<ClassRow> {
  const [row] = await db.insert(classes).values({ instructorId, name }).returning();
  if (!row) throw new Error('Inserting a class returned no row.');
  return row;
}

/** Renames a class. */
export async function renameClass(db: Database, classId: string, name: string): Promise<void> {
  await db.update(classes).set({ name }).where(eq(classes.id, classId));
}

/** Deletes a class (members, invitations and its lessons go with it). */
export async function deleteClass(db: Database, classId: string): Promise<void> {
  await db.delete(classes).where(eq(classes.id, classId));
}

/** The class and the caller's part in it, or undefined when the caller neither teaches nor attends it. */
export async function findClassForUser(
  db: Database,
  classId: string,
  userId: string,
): Promise<ClassWithRole | undefined> {
  const [found] = await db
    .select({ row: classes, instructorName: users.name, memberId: classMembers.userId })
    .from(classes)
    .innerJoin(users, eq(users.id, classes.instructorId))
    .leftJoin(
      classMembers,
      and(eq(classMembers.classId, classes.id), eq(classMembers.userId, userId)),
    )
    .where(eq(classes.id, classId));
  if (!found) return undefined;
  if (found.row.instructorId === userId)
    return { row: found.row, instructorName: found.instructorName, myRole: 'instructor' };
  if (found.memberId)
    return { row: found.row, instructorName: found.instructorName, myRole: 'student' };
  return undefined;
}

/** The class with its instructor's name, whoever asks (for invitation links). */
export async function findClassById(
  db: Database,
  classId: string,
): Promise<{ row: ClassRow; instructorName: string } | undefined> {
  const [found] = await db
    .select({ row: classes, instructorName: users.name })
    .from(classes)
    .innerJoin(users, eq(users.id, classes.instructorId))
    .where(eq(classes.id, classId));
  return found;
}

/** Classes the user teaches, then those they attend; each newest first, with student and lesson counts. */
export async function listClassesForUser(db: Database, userId: string): Promise<ClassListRow[]> {
  const attended = db
    .select({ id: classMembers.classId })
    .from(classMembers)
    .where(eq(classMembers.userId, userId));
  const rows = await db
    .select({ row: classes, instructorName: users.name })
    .from(classes)
    .innerJoin(users, eq(users.id, classes.instructorId))
    .where(sql`${classes.instructorId} = ${userId} or ${classes.id} in (${attended})`)
    .orderBy(desc(classes.createdAt));
  const ids = rows.map((r) => r.row.id);
  const students = await countBy(db, ids, 'members');
  const published = await countBy(db, ids, 'lessons');
  const list = rows.map(({ row, instructorName }): ClassListRow => {
    const myRole = row.instructorId === userId ? 'instructor' : 'student';
    const lessonCount =
      myRole === 'instructor' ? published.all.get(row.id) : published.visible.get(row.id);
    return {
      row,
      instructorName,
      myRole,
      studentCount: students.all.get(row.id) ?? 0,
      lessonCount: lessonCount ?? 0,
    };
  });
  return [
    ...list.filter((c) => c.myRole === 'instructor'),
    ...list.filter((c) => c.myRole === 'student'),
  ];
}

/** Per class: members (all), or lessons (all, and published ones as `visible`). */
async function countBy(
  db: Database,
  classIds: string[],
  what: 'members' | 'lessons',
): Promise<{ all: Map<string, number>; visible: Map<string, number> }> {
  const all = new Map<string, number>();
  const visible = new Map<string, number>();
  if (classIds.length === 0) return { all, visible };
  if (what === 'members') {
    const rows = await db
      .select({ classId: classMembers.classId, n: count() })
      .from(classMembers)
      .where(inArray(classMembers.classId, classIds))
      .groupBy(classMembers.classId);
    for (const r of rows) all.set(r.classId, r.n);
    return { all, visible };
  }
  const rows = await db
    .select({ classId: lessons.classId, published: lessons.published, n: count() })
    .from(lessons)
    .where(inArray(lessons.classId, classIds))
    .groupBy(lessons.classId, lessons.published);
  for (const r of rows) {
    if (!r.classId) continue;
    all.set(r.classId, (all.get(r.classId) ?? 0) + r.n);
    if (r.published) visible.set(r.classId, (visible.get(r.classId) ?? 0) + r.n);
  }
  return { all, visible };
}

/** The students of a class, by name. */
export async function listStudents(db: Database, classId: string): Promise<StudentRow[]> {
  return db
    .select({
      userId: users.id,
      name: users.name,
      email: users.email,
      joinedAt: classMembers.joinedAt,
    })
    .from(classMembers)
    .innerJoin(users, eq(users.id, classMembers.userId))
    .where(eq(classMembers.classId, classId))
    .orderBy(asc(users.name), asc(users.email));
}

/** Number of students in a class. */
export async function countStudents(db: Database, classId: string): Promise<number> {
  const [row] = await db
    .select({ n: count() })
    .from(classMembers)
    .where(eq(classMembers.classId, classId));
  return row?.n ?? 0;
}

/** Adds a student to a class; adding one already there changes nothing. */
export async function addStudent(db: Database, classId: string, userId: string): Promise<void> {
  await db.insert(classMembers).values({ classId, userId }).onConflictDoNothing();
}

/** Removes a student from a class; returns whether they were in it. */
export async function removeStudent(
  db: Database,
  classId: string,
  userId: string,
): Promise<boolean> {
  const removed = await db
    .delete(classMembers)
    .where(and(eq(classMembers.classId, classId), eq(classMembers.userId, userId)))
    .returning({ userId: classMembers.userId });
  return removed.length > 0;
}

/** Which of these lower-cased addresses already belong to students of the class. */
export async function memberEmails(
  db: Database,
  classId: string,
  emails: string[],
): Promise<Set<string>> {
  if (emails.length === 0) return new Set();
  const rows = await db
    .select({ email: sql<string>`lower(${users.email})` })
    .from(classMembers)
    .innerJoin(users, eq(users.id, classMembers.userId))
    .where(and(eq(classMembers.classId, classId), inArray(sql`lower(${users.email})`, emails)));
  return new Set(rows.map((r) => r.email));
}
