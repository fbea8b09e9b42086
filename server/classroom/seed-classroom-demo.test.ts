import { count, eq } from 'drizzle-orm';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { classMembers, classes, lessons } from '../db/schema';
import { seedDemo } from '../db/seed';
import { createTestContext, type TestContext } from '../testing/test-context';
import { DEMO_CLASS_NAME, seedClassroomDemo } from './seed-classroom-demo';
import { STARTER_LESSONS } from './starter-lessons';

describe('seedClassroomDemo', () => {
  let t: TestContext;
  beforeEach(async () => {
    t = await createTestContext();
  });
  afterEach(async () => {
    await t.close();
  });

  it('gives the demo instructor the starter lessons and a demo class with the demo member, once', async () => {
    const ids = await seedDemo(t.ctx.db, [seedClassroomDemo]);
    await seedDemo(t.ctx.db, [seedClassroomDemo]);
    const teacherId = ids['teacher@tidewright.test'];
    const rows = await t.ctx.db
      .select()
      .from(lessons)
      .where(eq(lessons.ownerId, teacherId ?? ''));
    const library = rows.filter((l) => l.classId === null);
    const inClass = rows.filter((l) => l.classId !== null);
    expect(library.map((l) => l.title).sort()).toEqual(STARTER_LESSONS.map((s) => s.title).sort());
    expect(inClass.map((l) => [l.title, l.published]).sort()).toEqual(
      STARTER_LESSONS.map((s) => [s.title, true]).sort(),
    );
    const demoClasses = await t.ctx.db
      .select()
      .from(classes)
      .where(eq(classes.name, DEMO_CLASS_NAME));
    expect(demoClasses.map((c) => c.instructorId)).toEqual([teacherId]);
    const [members] = await t.ctx.db
      .select({ n: count() })
      .from(classMembers)
      .where(eq(classMembers.userId, ids['demo@tidewright.test'] ?? ''));
    expect(members?.n).toBe(1);
  });
});
