/**
 * Who may do what in the classroom, as a table: each action against one class, by its
 * instructor, a student, a removed student, a student of another class, another instructor and
 * an administrator. Anything not in a row's expectations must answer 404 (hidden, not forbidden).
 */
import type { Express } from 'express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ApiErrorSchema } from '../../shared/contracts/api-error';
import { ClassListSchema, LessonSchema } from '../../shared/contracts/classroom';
import { createApp } from '../../server/app';
import { addStudent } from '../../server/classroom/class-repository';
import { upsertPredictions } from '../../server/classroom/lesson-repository';
import { TestClient, createTestUser } from '../../server/testing/test-client';
import { createTestContext, type TestContext } from '../../server/testing/test-context';
import { makeClass, makeLesson } from './classroom-fixtures';

const ACTORS = [
  'instructor',
  'student',
  'removedStudent',
  'otherStudent',
  'otherInstructor',
  'admin',
] as const;
type Actor = (typeof ACTORS)[number];

const PREDICTIONS = [
  { questionId: 'period', value: 480 },
  { questionId: 'regime', choice: 'cycling' },
  { questionId: 'low', value: 0.5 },
];

/** The class, its lessons and people every row acts on. */
interface World {
  classId: string;
  otherClassId: string;
  lessonId: string;
  draftLessonId: string;
  runLessonId: string;
  ids: Record<Actor, string>;
  /** A student added just for one row (removal). */
  spareStudent(): Promise<string>;
}

interface Row {
  action: string;
  method: 'get' | 'post' | 'put' | 'patch' | 'delete';
  path: (w: World) => Promise<string> | string;
  body?: unknown;
  /** Statuses by actor; everyone else gets 404. */
  expect: Partial<Record<Actor, number>>;
}

const ROWS: Row[] = [
  {
    action: 'read the class',
    method: 'get',
    path: (w) => `/api/classes/${w.classId}`,
    expect: { instructor: 200, student: 200 },
  },
  {
    action: 'rename the class',
    method: 'patch',
    path: (w) => `/api/classes/${w.classId}`,
    body: { name: 'Spring term' },
    expect: { instructor: 200, student: 403 },
  },
  {
    action: 'see the roster',
    method: 'get',
    path: (w) => `/api/classes/${w.classId}/roster`,
    expect: { instructor: 200, student: 403 },
  },
  {
    action: 'invite students',
    method: 'post',
    path: (w) => `/api/classes/${w.classId}/invitations`,
    body: { emails: ['newcomer@example.test'] },
    expect: { instructor: 201, student: 403 },
  },
  {
    action: 'remove a student',
    method: 'delete',
    path: async (w) => `/api/classes/${w.classId}/students/${await w.spareStudent()}`,
    expect: { instructor: 204, student: 403 },
  },
  {
    action: 'read a published lesson',
    method: 'get',
    path: (w) => `/api/lessons/${w.lessonId}`,
    expect: { instructor: 200, student: 200 },
  },
  {
    action: 'read a draft lesson',
    method: 'get',
    path: (w) => `/api/lessons/${w.draftLessonId}`,
    expect: { instructor: 200 },
  },
  {
    action: 'edit a lesson',
    method: 'patch',
    path: (w) => `/api/lessons/${w.lessonId}`,
    body: { title: 'Why the siphon starts' },
    expect: { instructor: 200, student: 403 },
  },
  {
    action: 'copy a lesson',
    method: 'post',
    path: (w) => `/api/lessons/${w.lessonId}/duplicate`,
    body: {},
    expect: { instructor: 201, student: 403 },
  },
  {
    action: "see the class's answers",
    method: 'get',
    path: (w) => `/api/lessons/${w.lessonId}/report`,
    expect: { instructor: 200, student: 403 },
  },
  {
    action: 'answer a lesson',
    method: 'put',
    path: (w) => `/api/lessons/${w.lessonId}/answer`,
    body: { predictions: PREDICTIONS },
    expect: { instructor: 403, student: 200 },
  },
  {
    action: 'answer a draft lesson',
    method: 'put',
    path: (w) => `/api/lessons/${w.draftLessonId}/answer`,
    body: { predictions: PREDICTIONS },
    expect: { instructor: 403 },
  },
  {
    action: 'run a lesson',
    method: 'post',
    path: (w) => `/api/lessons/${w.runLessonId}/run`,
    expect: { instructor: 403, student: 200 },
  },
];

describe('classroom permissions', () => {
  let t: TestContext;
  let app: Express;
  let world: World;
  const clients = {} as Record<Actor, TestClient>;

  beforeAll(async () => {
    t = await createTestContext();
    app = createApp(t.ctx);
    const roles: Record<Actor, 'instructor' | 'member' | 'admin'> = {
      instructor: 'instructor',
      student: 'member',
      removedStudent: 'member',
      otherStudent: 'member',
      otherInstructor: 'instructor',
      admin: 'admin',
    };
    const ids = {} as Record<Actor, string>;
    for (const actor of ACTORS) {
      const { user, password } = await createTestUser(t.ctx, { role: roles[actor], name: actor });
      ids[actor] = user.id;
      clients[actor] = await TestClient.create(app);
      await clients[actor].signIn(user.email, password);
    }
    const classId = await makeClass(t.ctx, ids.instructor, [ids.student, ids.removedStudent]);
    const otherClassId = await makeClass(
      t.ctx,
      ids.otherInstructor,
      [ids.otherStudent],
      'Another class',
    );
    const lessonId = await makeLesson(t.ctx, ids.instructor, classId);
    const runLessonId = await makeLesson(t.ctx, ids.instructor, classId);
    for (const actor of ['student', 'removedStudent'] as const)
      await upsertPredictions(t.ctx.db, runLessonId, ids[actor], PREDICTIONS);
    const removal = await clients.instructor.delete(
      `/api/classes/${classId}/students/${ids.removedStudent}`,
    );
    expect(removal.status).toBe(204);
    world = {
      classId,
      otherClassId,
      lessonId,
      runLessonId,
      draftLessonId: await makeLesson(t.ctx, ids.instructor, classId, { published: false }),
      ids,
      spareStudent: async () => {
        const { user } = await createTestUser(t.ctx, { name: 'Spare' });
        await addStudent(t.ctx.db, classId, user.id);
        return user.id;
      },
    };
  });
  afterAll(async () => {
    await t.close();
  });

  const cases = ROWS.flatMap((row) =>
    ACTORS.map((actor) => [row.action, actor, row.expect[actor] ?? 404, row] as const),
  );
  it.each(cases)('%s as %s answers %i', async (_action, actor, status, row) => {
    const path = await row.path(world);
    const request = clients[actor].send(row.method, path);
    const res = await (row.body === undefined ? request : request.send(row.body as object));
    expect(res.status, JSON.stringify(res.body)).toBe(status);
    if (status === 404) expect(ApiErrorSchema.parse(res.body).error.code).toBe('NOT_FOUND');
    if (status === 403)
      expect(['NOT_CLASS_INSTRUCTOR', 'STUDENTS_ONLY']).toContain(
        ApiErrorSchema.parse(res.body).error.code,
      );
  });

  it('lists each user only the classes they teach or attend', async () => {
    const listed = async (actor: Actor) =>
      ClassListSchema.parse((await clients[actor].get('/api/classes')).body).items.map((c) => [
        c.id,
        c.myRole,
      ]);
    expect(await listed('instructor')).toEqual([[world.classId, 'instructor']]);
    expect(await listed('student')).toEqual([[world.classId, 'student']]);
    expect(await listed('otherInstructor')).toEqual([[world.otherClassId, 'instructor']]);
    expect(await listed('otherStudent')).toEqual([[world.otherClassId, 'student']]);
    expect(await listed('removedStudent')).toEqual([]);
    expect(await listed('admin')).toEqual([]);
  });

  it("shows a student only their own answer, never another student's", async () => {
    const res = await clients.removedStudent.get(`/api/lessons/${world.runLessonId}`);
    expect(res.status).toBe(404);
    const mine = LessonSchema.parse(
      (await clients.student.get(`/api/lessons/${world.runLessonId}`)).body,
    );
    expect(mine.myRole).toBe('student');
    expect(mine.myAnswer?.predictions).toEqual(PREDICTIONS);
    expect(JSON.stringify(mine)).not.toContain(world.ids.removedStudent);
  });
});
