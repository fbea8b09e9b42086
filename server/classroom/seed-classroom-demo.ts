/**
 * Demo seed step: the demo instructor's library holds the three starter lessons, and their demo
 * class has the demo member as a student and a published copy of each lesson. Idempotent: a
 * lesson or class of the same title or name that already exists is left as it is.
 */
import { and, eq, isNull } from 'drizzle-orm';
import { QuestionListSchema } from '../../shared/contracts/classroom';
import { parseScenario } from '../../shared/scenario/index';
import type { Database } from '../db/database';
import type { SeedStep } from '../db/seed';
import { classes, lessons } from '../db/schema';
import { checkQuestionTargets } from './check-question-targets';
import { addStudent, insertClass } from './class-repository';
import { insertLesson, updateLesson } from './lesson-repository';
import { STARTER_LESSONS, starterScenario, type StarterLesson } from './starter-lessons';

/** The demo instructor, who owns the starter lessons and the demo class. */
export const DEMO_INSTRUCTOR_EMAIL = 'teacher@tidewright.test';
/** The demo member, a student of the demo class. */
export const DEMO_STUDENT_EMAIL = 'demo@tidewright.test';
/** The demo class's name. */
export const DEMO_CLASS_NAME = 'Greenhouse physics (demo class)';

/** The starter lesson as lesson columns; throws if its file or questions no longer fit (a bug). */
function lessonValues(starter: StarterLesson, ownerId: string, classId: string | null) {
  const scenario = starterScenario(starter);
  const parsed = parseScenario(scenario);
  if (!parsed.success)
    throw new Error(`Starter lesson "${starter.title}": ${JSON.stringify(parsed.issues)}`);
  const questions = QuestionListSchema.parse(starter.questions);
  const errors = checkQuestionTargets(questions, parsed.scenario);
  if (errors.length > 0)
    throw new Error(`Starter lesson "${starter.title}": ${JSON.stringify(errors)}`);
  return {
    ownerId,
    classId,
    title: starter.title,
    introduction: starter.introduction,
    scenario,
    questions,
  };
}

async function ensureLesson(
  db: Database,
  starter: StarterLesson,
  ownerId: string,
  classId: string | null,
): Promise<void> {
  const inPlace = classId === null ? isNull(lessons.classId) : eq(lessons.classId, classId);
  const [existing] = await db
    .select({ id: lessons.id })
    .from(lessons)
    .where(and(eq(lessons.ownerId, ownerId), eq(lessons.title, starter.title), inPlace));
  if (existing) return;
  const row = await insertLesson(db, lessonValues(starter, ownerId, classId));
  if (classId !== null) await updateLesson(db, row.id, { published: true });
}

async function ensureClass(db: Database, instructorId: string): Promise<string> {
  const [existing] = await db
    .select({ id: classes.id })
    .from(classes)
    .where(and(eq(classes.instructorId, instructorId), eq(classes.name, DEMO_CLASS_NAME)));
  return existing?.id ?? (await insertClass(db, instructorId, DEMO_CLASS_NAME)).id;
}

/** Seeds the starter lessons and the demo class (needs the demo accounts). */
export const seedClassroomDemo: SeedStep = async (db, userIds) => {
  const instructorId = userIds[DEMO_INSTRUCTOR_EMAIL];
  if (!instructorId) return;
  for (const starter of STARTER_LESSONS) await ensureLesson(db, starter, instructorId, null);
  const classId = await ensureClass(db, instructorId);
  const studentId = userIds[DEMO_STUDENT_EMAIL];
  if (studentId) await addStudent(db, classId, studentId);
  for (const starter of STARTER_LESSONS) await ensureLesson(db, starter, instructorId, classId);
};
