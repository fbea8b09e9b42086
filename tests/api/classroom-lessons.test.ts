/**
 * Lessons through the API with the real engine: the library, copying into a class, publishing,
 * students' predictions and runs, the instructor's report, and revealing the answers.
 */
import type { Express } from 'express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ApiErrorSchema } from '../../shared/contracts/api-error';
import {
  ClassDetailSchema,
  LessonListSchema,
  LessonReportSchema,
  LessonSchema,
  MyAnswerSchema,
  type Lesson,
} from '../../shared/contracts/classroom';
import { SystemSchema } from '../../shared/contracts/systems';
import { createApp } from '../../server/app';
import { addStudent } from '../../server/classroom/class-repository';
import { TestClient, createTestUser, signedInClient } from '../../server/testing/test-client';
import { createTestContext, type TestContext } from '../../server/testing/test-context';
import { LESSON_SCENARIO, lessonRequest, makeClass } from './classroom-fixtures';

/** Sam predicts well, Kim predicts a stall and a tank drained too low. */
const SAM = [
  { questionId: 'period', value: 480 },
  { questionId: 'regime', choice: 'cycling' },
  { questionId: 'low', value: 0.47 },
];
const KIM = [
  { questionId: 'period', value: 120 },
  { questionId: 'regime', choice: 'spill-stall' },
  { questionId: 'low', value: 0.2 },
];

function errorOf(body: unknown) {
  return ApiErrorSchema.parse(body).error;
}

describe('lessons', () => {
  let t: TestContext;
  let app: Express;
  let teacher: TestClient;
  let sam: TestClient;
  let kim: TestClient;
  let classId: string;

  beforeAll(async () => {
    t = await createTestContext();
    app = createApp(t.ctx);
    const signedIn = await signedInClient(app, t.ctx, { role: 'instructor' });
    teacher = signedIn.client;
    const students = await Promise.all(
      ['Sam', 'Kim'].map((name) => createTestUser(t.ctx, { name })),
    );
    classId = await makeClass(
      t.ctx,
      signedIn.user.id,
      students.map((s) => s.user.id),
    );
    const clients = await Promise.all(
      students.map(async ({ user, password }) => {
        const client = await TestClient.create(app);
        await client.signIn(user.email, password);
        return client;
      }),
    );
    const [first, second] = clients;
    if (!first || !second) throw new Error('Two students were made.');
    [sam, kim] = [first, second];
  });
  afterAll(async () => {
    await t.close();
  });

  async function publishedLesson(): Promise<Lesson> {
    const created = LessonSchema.parse(
      (await teacher.post('/api/lessons').send(lessonRequest())).body,
    );
    const copy = LessonSchema.parse(
      (await teacher.post(`/api/lessons/${created.id}/duplicate`).send({ classId })).body,
    );
    return LessonSchema.parse(
      (await teacher.patch(`/api/lessons/${copy.id}`).send({ published: true })).body,
    );
  }

  it('keeps a lesson in the library until it is copied into a class, unpublished', async () => {
    const res = await teacher
      .post('/api/lessons')
      .send(lessonRequest({ title: 'Why sumps need reserve' }));
    expect(res.status).toBe(201);
    const lesson = LessonSchema.parse(res.body);
    expect([lesson.classId, lesson.published, lesson.myRole, lesson.questions[0]?.kind]).toEqual([
      null,
      false,
      'instructor',
      'bed-period',
    ]);
    const library = LessonListSchema.parse((await teacher.get('/api/lessons')).body);
    expect(library.items.map((l) => l.id)).toContain(lesson.id);

    const publish = await teacher.patch(`/api/lessons/${lesson.id}`).send({ published: true });
    expect([publish.status, errorOf(publish.body).code]).toEqual([409, 'LESSON_NOT_IN_CLASS']);

    const copy = LessonSchema.parse(
      (await teacher.post(`/api/lessons/${lesson.id}/duplicate`).send({ classId })).body,
    );
    expect([copy.classId, copy.published, copy.title, copy.className]).toEqual([
      classId,
      false,
      'Why sumps need reserve',
      'Greenhouse class',
    ]);
    expect(copy.scenario).toEqual(lesson.scenario);
    expect(
      ClassDetailSchema.parse((await sam.get(`/api/classes/${classId}`)).body).lessons.map(
        (l) => l.id,
      ),
    ).not.toContain(copy.id);
  });

  it('copies the scenario of a system the instructor can read, and refuses one of somebody else', async () => {
    const system = SystemSchema.parse(
      (await teacher.post('/api/systems').send({ name: 'Bench unit', scenario: LESSON_SCENARIO }))
        .body,
    );
    const fromSystem = await teacher
      .post('/api/lessons')
      .send(lessonRequest({ scenario: undefined, systemId: system.id }));
    expect(fromSystem.status, JSON.stringify(fromSystem.body)).toBe(201);
    expect(LessonSchema.parse(fromSystem.body).scenario).toEqual(system.scenario);
    const { client: stranger } = await signedInClient(app, t.ctx, { role: 'instructor' });
    const refused = await stranger
      .post('/api/lessons')
      .send(lessonRequest({ scenario: undefined, systemId: system.id }));
    expect(refused.status).toBe(404);
  });

  it('names questions about parts the system lacks, and problems in the scenario', async () => {
    const badTarget = await teacher.post('/api/lessons').send(
      lessonRequest({
        questions: [{ kind: 'vessel-low-level', id: 'low', prompt: 'How low?', vesselId: 'bed-a' }],
      }),
    );
    expect(badTarget.status).toBe(400);
    expect(errorOf(badTarget.body).fields).toEqual([
      {
        path: 'questions[0].vesselId',
        message: 'The system has no tank or sump "bed-a"; choose one of: tank.',
      },
    ]);
    const badScenario = await teacher
      .post('/api/lessons')
      .send(lessonRequest({ scenario: { ...LESSON_SCENARIO, vessels: 'none' } }));
    expect(badScenario.status).toBe(400);
    expect(errorOf(badScenario.body).fields?.[0]?.path).toBe('scenario.vessels');
    const both = await teacher
      .post('/api/lessons')
      .send(lessonRequest({ systemId: '00000000-0000-4000-8000-000000000000' }));
    expect(errorOf(both.body).fields?.map((f) => f.path)).toEqual(['scenario']);
  });

  it('makes students predict before they run, then sets each prediction against the simulation', async () => {
    const lesson = await publishedLesson();
    const early = await sam.post(`/api/lessons/${lesson.id}/run`);
    expect([early.status, errorOf(early.body).code]).toEqual([409, 'PREDICT_FIRST']);

    const incomplete = await sam
      .put(`/api/lessons/${lesson.id}/answer`)
      .send({ predictions: SAM.slice(0, 1) });
    expect(incomplete.status).toBe(400);
    expect(errorOf(incomplete.body).fields?.map((f) => f.message)).toEqual([
      'Answer question "regime" before saving.',
      'Answer question "low" before saving.',
    ]);

    const saved = MyAnswerSchema.parse(
      (await sam.put(`/api/lessons/${lesson.id}/answer`).send({ predictions: SAM })).body,
    );
    expect([saved.ranAt, saved.simulation]).toEqual([null, null]);
    const ran = await sam.post(`/api/lessons/${lesson.id}/run`);
    expect(ran.status, JSON.stringify(ran.body)).toBe(200);
    const answer = MyAnswerSchema.parse(ran.body);
    expect(answer.simulation?.status).toBe('completed');
    expect(answer.simulation?.levels.channels.map((c) => c.where).sort()).toEqual([
      'bed-a',
      'tank',
    ]);
    const byId = new Map(answer.outcomes?.map((o) => [o.questionId, o]));
    expect(byId.get('regime')).toMatchObject({
      predicted: 'cycling',
      simulated: 'cycling',
      correct: true,
    });
    const period = byId.get('period');
    // The one-bed example at 1 h cycles a few times an hour; 480 s is within 20 % of it.
    expect(period?.simulated).toBeGreaterThan(300);
    expect(period?.simulated).toBeLessThan(900);
    expect(period?.correct).toBe(
      Math.abs(480 - Number(period?.simulated)) <= 0.2 * Number(period?.simulated),
    );
    expect(byId.get('low')?.simulated).toBe(
      answer.simulation?.vessels.find((v) => v.id === 'tank')?.minLevel_m,
    );

    const locked = await sam.put(`/api/lessons/${lesson.id}/answer`).send({ predictions: KIM });
    expect([locked.status, errorOf(locked.body).code]).toEqual([409, 'ANSWER_LOCKED']);
    const again = MyAnswerSchema.parse((await sam.post(`/api/lessons/${lesson.id}/run`)).body);
    expect(again.ranAt).toBe(answer.ranAt);
    const seen = LessonSchema.parse((await sam.get(`/api/lessons/${lesson.id}`)).body);
    expect(seen.myAnswer?.outcomes).toEqual(answer.outcomes);
    expect(
      ClassDetailSchema.parse((await sam.get(`/api/classes/${classId}`)).body).lessons.find(
        (l) => l.id === lesson.id,
      )?.myProgress,
    ).toBe('ran');
  });

  it("shows the instructor every student's predictions against the simulated values, with the share right", async () => {
    const lesson = await publishedLesson();
    await sam.put(`/api/lessons/${lesson.id}/answer`).send({ predictions: SAM });
    await sam.post(`/api/lessons/${lesson.id}/run`);
    await kim.put(`/api/lessons/${lesson.id}/answer`).send({ predictions: KIM });
    const res = await teacher.get(`/api/lessons/${lesson.id}/report`);
    expect(res.status).toBe(200);
    const report = LessonReportSchema.parse(res.body);
    expect(report.rosterSize).toBe(2);
    expect(report.answers.map((a) => [a.name, a.ranAt === null])).toEqual([
      ['Kim', true],
      ['Sam', false],
    ]);
    const key = new Map(report.answerKey.map((k) => [k.questionId, k.simulated]));
    expect(key.get('regime')).toBe('cycling');
    expect(key.get('low')).toBe(report.simulation.vessels.find((v) => v.id === 'tank')?.minLevel_m);
    const regime = report.stats.find((s) => s.questionId === 'regime');
    expect(regime).toEqual({ questionId: 'regime', answered: 2, correct: 1, correctShare: 0.5 });
    const kimLow = report.answers[0]?.outcomes.find((o) => o.questionId === 'low');
    expect(kimLow?.correct).toBe(false);
    expect(kimLow?.difference).toBeCloseTo(0.2 - Number(key.get('low')), 12);

    const edit = await teacher
      .patch(`/api/lessons/${lesson.id}`)
      .send({ questions: [{ kind: 'bed-regime', id: 'x', prompt: 'New?', bedId: 'bed-a' }] });
    expect([edit.status, errorOf(edit.body).code]).toEqual([409, 'LESSON_HAS_ANSWERS']);
  });

  it('hides explanations and the answer key from students until the instructor reveals them', async () => {
    const lesson = await publishedLesson();
    const before = LessonSchema.parse((await kim.get(`/api/lessons/${lesson.id}`)).body);
    expect(before.answerKey).toBeNull();
    expect(before.questions.map((q) => q.explanation)).toEqual(['', '', '']);
    await teacher.patch(`/api/lessons/${lesson.id}`).send({ revealed: true });
    const after = LessonSchema.parse((await kim.get(`/api/lessons/${lesson.id}`)).body);
    expect(after.questions[1]?.explanation).toBe('Compare the inflow with the priming flow.');
    expect(after.answerKey?.find((k) => k.questionId === 'regime')?.simulated).toBe('cycling');
    expect(after.myAnswer).toBeNull();
  });

  it('drops a removed student from the report and the roster count', async () => {
    const lesson = await publishedLesson();
    const { user, password } = await createTestUser(t.ctx, { name: 'Lee' });
    await addStudent(t.ctx.db, classId, user.id);
    const lee = await TestClient.create(app);
    await lee.signIn(user.email, password);
    await lee.put(`/api/lessons/${lesson.id}/answer`).send({ predictions: SAM });
    const withLee = LessonReportSchema.parse(
      (await teacher.get(`/api/lessons/${lesson.id}/report`)).body,
    );
    expect(withLee.answers.map((a) => a.name)).toContain('Lee');
    expect((await teacher.delete(`/api/classes/${classId}/students/${user.id}`)).status).toBe(204);
    const without = LessonReportSchema.parse(
      (await teacher.get(`/api/lessons/${lesson.id}/report`)).body,
    );
    expect(without.answers.map((a) => a.name)).not.toContain('Lee');
    expect(without.rosterSize).toBe(withLee.rosterSize - 1);
  });
});
