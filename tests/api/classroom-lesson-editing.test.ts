/**
 * Editing a lesson through `PATCH /api/lessons/:id`, as the lesson editor does: its title,
 * introduction and questions change for its owner only, questions must name parts of the
 * lesson's own system, and once a student answered only the words around the questions change.
 */
import type { Express } from 'express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ApiErrorSchema } from '../../shared/contracts/api-error';
import {
  LessonListSchema,
  LessonSchema,
  type Lesson,
  type QuestionInput,
} from '../../shared/contracts/classroom';
import { createApp } from '../../server/app';
import { upsertPredictions } from '../../server/classroom/lesson-repository';
import { TestClient, createTestUser, signedInClient } from '../../server/testing/test-client';
import { createTestContext, type TestContext } from '../../server/testing/test-context';
import { digestDatabase } from './db-snapshot';
import { LESSON_QUESTIONS, lessonRequest, makeClass, makeLesson } from './classroom-fixtures';

/** The fixture's questions with the period question reworded and a second regime question. */
const EDITED_QUESTIONS: QuestionInput[] = [
  { ...LESSON_QUESTIONS[0]!, prompt: 'How many minutes from one flood to the next?' },
  ...LESSON_QUESTIONS.slice(1),
  { kind: 'bed-regime', id: 'q4', prompt: 'Does bed A still cycle?', bedId: 'bed-a' },
];

describe('editing a lesson', () => {
  let t: TestContext;
  let app: Express;
  let teacher: TestClient;
  let teacherId: string;

  beforeAll(async () => {
    t = await createTestContext();
    app = createApp(t.ctx);
    const signedIn = await signedInClient(app, t.ctx, { role: 'instructor' });
    teacher = signedIn.client;
    teacherId = signedIn.user.id;
  });
  afterAll(async () => {
    await t.close();
  });

  async function libraryLesson(): Promise<Lesson> {
    const res = await teacher.post('/api/lessons').send(lessonRequest());
    expect(res.status).toBe(201);
    return LessonSchema.parse(res.body);
  }

  async function read(id: string): Promise<Lesson> {
    return LessonSchema.parse((await teacher.get(`/api/lessons/${id}`)).body);
  }

  it("changes a library lesson's title, introduction and questions for its owner", async () => {
    const lesson = await libraryLesson();
    const res = await teacher.patch(`/api/lessons/${lesson.id}`).send({
      title: 'Timing the flood',
      introduction: 'Watch the clock, then run.',
      questions: EDITED_QUESTIONS,
    });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const stored = await read(lesson.id);
    expect(stored).toMatchObject({
      title: 'Timing the flood',
      introduction: 'Watch the clock, then run.',
    });
    expect(stored.questions.map((q) => [q.id, q.prompt])).toEqual([
      ['period', 'How many minutes from one flood to the next?'],
      ['regime', 'Will the siphon of bed A start and stop?'],
      ['low', 'How low does the tank go?'],
      ['q4', 'Does bed A still cycle?'],
    ]);
    expect(stored.scenario).toEqual(lesson.scenario);
    expect(Date.parse(stored.updatedAt)).toBeGreaterThanOrEqual(Date.parse(lesson.updatedAt));
    const library = LessonListSchema.parse((await teacher.get('/api/lessons')).body);
    expect(library.items.find((item) => item.id === lesson.id)).toMatchObject({
      title: 'Timing the flood',
      questionCount: 4,
    });
  });

  it('refuses questions about parts the lesson system lacks, by field path, storing nothing', async () => {
    const lesson = await libraryLesson();
    const before = await digestDatabase(t.ctx.db);
    const res = await teacher.patch(`/api/lessons/${lesson.id}`).send({
      title: 'Never stored',
      questions: [
        { kind: 'bed-regime', id: 'a', prompt: 'Start?', bedId: 'bed-z' },
        { kind: 'vessel-low-level', id: 'b', prompt: 'Low?', vesselId: 'bed-a' },
      ],
    });
    expect(res.status).toBe(400);
    expect(ApiErrorSchema.parse(res.body).error.fields?.map((f) => f.path)).toEqual([
      'questions[0].bedId',
      'questions[1].vesselId',
    ]);
    expect(await digestDatabase(t.ctx.db)).toEqual(before);
    expect((await read(lesson.id)).title).toBe(lesson.title);
  });

  it('refuses a blank title and an unknown field at their paths', async () => {
    const lesson = await libraryLesson();
    const res = await teacher
      .patch(`/api/lessons/${lesson.id}`)
      .send({ title: '  ', scenario: lesson.scenario });
    expect(res.status).toBe(400);
    const fields = ApiErrorSchema.parse(res.body).error.fields ?? [];
    expect(fields.map((f) => f.path).sort()).toEqual(['scenario', 'title']);
    expect(fields.find((f) => f.path === 'title')?.message).toBe('Give the lesson a title.');
    expect(await read(lesson.id)).toEqual(lesson);
  });

  it('lets nobody but the owner edit: another instructor gets 404, a student 403', async () => {
    const { user: student, password } = await createTestUser(t.ctx, { name: 'Student' });
    const classId = await makeClass(t.ctx, teacherId, [student.id]);
    const lessonId = await makeLesson(t.ctx, teacherId, classId);
    const stranger = (await signedInClient(app, t.ctx, { role: 'instructor' })).client;
    const pupil = await TestClient.create(app);
    await pupil.signIn(student.email, password);
    const before = await read(lessonId);

    const byStranger = await stranger.patch(`/api/lessons/${lessonId}`).send({ title: 'Mine now' });
    expect([byStranger.status, ApiErrorSchema.parse(byStranger.body).error.code]).toEqual([
      404,
      'NOT_FOUND',
    ]);
    const byStudent = await pupil.patch(`/api/lessons/${lessonId}`).send({ title: 'Easy mode' });
    expect([byStudent.status, ApiErrorSchema.parse(byStudent.body).error.code]).toEqual([
      403,
      'NOT_CLASS_INSTRUCTOR',
    ]);
    expect(await read(lessonId)).toEqual(before);
  });

  it('keeps answered questions fixed but still lets the owner reword the title and introduction', async () => {
    const { user: student } = await createTestUser(t.ctx, { name: 'Answering student' });
    const classId = await makeClass(t.ctx, teacherId, [student.id]);
    const lessonId = await makeLesson(t.ctx, teacherId, classId);
    await upsertPredictions(t.ctx.db, lessonId, student.id, [
      { questionId: 'regime', choice: 'cycling' },
    ]);
    const questions = await teacher
      .patch(`/api/lessons/${lessonId}`)
      .send({ title: 'Changed', questions: EDITED_QUESTIONS });
    expect([questions.status, ApiErrorSchema.parse(questions.body).error.code]).toEqual([
      409,
      'LESSON_HAS_ANSWERS',
    ]);
    expect((await read(lessonId)).title).toBe('What sets the start');

    const words = await teacher
      .patch(`/api/lessons/${lessonId}`)
      .send({ title: 'Changed', introduction: 'Reworded.' });
    expect(words.status).toBe(200);
    const stored = await read(lessonId);
    expect([stored.title, stored.introduction, stored.questions.length]).toEqual([
      'Changed',
      'Reworded.',
      LESSON_QUESTIONS.length,
    ]);
  });
});
