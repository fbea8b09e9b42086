import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { EXAMPLE_SCENARIO_FILE } from '../../shared/scenario/index';
import { QuestionListSchema } from '../../shared/contracts/classroom';
import { createTestUser } from '../testing/test-client';
import { createTestContext, type TestContext } from '../testing/test-context';
import { runLesson, saveAnswer } from './answer-service';
import { classroomDepsFor, type ClassroomDeps } from './classroom-deps';
import { addStudent, insertClass } from './class-repository';
import { findAnswersOf, insertLesson, updateLesson } from './lesson-repository';
import { LessonSimulations } from './lesson-simulations';

describe('runLesson when the simulation does not finish', () => {
  let t: TestContext;
  beforeEach(async () => {
    t = await createTestContext();
  });
  afterEach(async () => {
    await t.close();
  });

  it('returns the failure without locking the predictions, and a later run stores the result', async () => {
    let fail = true;
    const deps: ClassroomDeps = {
      ...classroomDepsFor(t.ctx),
      simulations: new LessonSimulations(async () =>
        fail
          ? {
              status: 'failed',
              error: 'Stopped at the 60 s time limit for one run.',
              result: null,
              series: null,
              sampleCount: 0,
              wallMs: 60_000,
            }
          : {
              status: 'completed',
              error: null,
              result: null,
              series: null,
              sampleCount: 0,
              wallMs: 5,
            },
      ),
    };
    const { user: teacher } = await createTestUser(t.ctx, { role: 'instructor' });
    const { user: student } = await createTestUser(t.ctx);
    const klass = await insertClass(t.ctx.db, teacher.id, 'Class');
    await addStudent(t.ctx.db, klass.id, student.id);
    const questions = QuestionListSchema.parse([
      { kind: 'bed-regime', id: 'r', prompt: 'Start?', bedId: 'bed-a' },
    ]);
    const lesson = await insertLesson(t.ctx.db, {
      ownerId: teacher.id,
      classId: klass.id,
      title: 'L',
      introduction: '',
      scenario: EXAMPLE_SCENARIO_FILE,
      questions,
    });
    await updateLesson(t.ctx.db, lesson.id, { published: true });
    await saveAnswer(deps, student, lesson.id, {
      predictions: [{ questionId: 'r', choice: 'cycling' }],
    });

    const failed = await runLesson(deps, student, lesson.id);
    expect([
      failed.ranAt,
      failed.outcomes,
      failed.simulation?.status,
      failed.simulation?.error,
    ]).toEqual([null, null, 'failed', 'Stopped at the 60 s time limit for one run.']);
    const stored = (await findAnswersOf(t.ctx.db, student.id, [lesson.id])).get(lesson.id);
    expect([stored?.ranAt, stored?.results]).toEqual([null, null]);
    const changed = await saveAnswer(deps, student, lesson.id, {
      predictions: [{ questionId: 'r', choice: 'spill-stall' }],
    });
    expect(changed.predictions).toEqual([{ questionId: 'r', choice: 'spill-stall' }]);

    fail = false;
    const ran = await runLesson(deps, student, lesson.id);
    expect(ran.ranAt).not.toBeNull();
    expect(ran.outcomes).toEqual([
      {
        questionId: 'r',
        predicted: 'spill-stall',
        simulated: null,
        correct: null,
        difference: null,
      },
    ]);
  });
});
