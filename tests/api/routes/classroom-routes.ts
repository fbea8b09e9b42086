/**
 * Route table entries: `/api/classes`, `/api/lessons`, `/api/invitations`. The fixture gives the
 * owner a class with a student, an open invitation and a published lesson; and makes the owner a
 * student of another instructor's class, with a lesson assigned to them and an invitation for
 * their address (the student-side routes act on those).
 */
import { eq } from 'drizzle-orm';
import { classInvitations } from '../../../server/db/schema';
import { upsertPredictions } from '../../../server/classroom/lesson-repository';
import { createTestUser } from '../../../server/testing/test-client';
import { lessonRequest, makeClass, makeInvitation, makeLesson } from '../classroom-fixtures';
import type { RouteCase, RouteGroup } from '../route-table';

/** A complete answer to the fixture lesson. */
const ANSWER = {
  predictions: [
    { questionId: 'period', value: 600 },
    { questionId: 'regime', choice: 'cycling' },
    { questionId: 'low', value: 0.45 },
  ],
};
const teaches = ['instructor', 'admin'] as const;
const owned = (need: 'read' | 'write' | 'owner'): RouteCase['ownership'] => ({
  need,
  shareable: false,
});

/** Classes, rosters, invitations, lessons, answers and reports. */
export const classroomRoutes: RouteGroup = {
  name: 'classroom',
  fixture: async (f) => {
    const { user: student } = await createTestUser(f.ctx, { name: 'Student' });
    const { user: otherTeacher } = await createTestUser(f.ctx, {
      role: 'instructor',
      name: 'Other teacher',
    });
    const classId = await makeClass(f.ctx, f.owner.id, [student.id]);
    await makeInvitation(f.ctx, classId, 'invited@example.test');
    const [invitation] = await f.ctx.db
      .select()
      .from(classInvitations)
      .where(eq(classInvitations.classId, classId));
    const attended = await makeClass(f.ctx, otherTeacher.id, [f.owner.id], 'Attended class');
    const joinable = await makeClass(f.ctx, otherTeacher.id, [], 'Joinable class');
    const assignedLessonId = await makeLesson(f.ctx, otherTeacher.id, attended);
    await upsertPredictions(f.ctx.db, assignedLessonId, f.owner.id, ANSWER.predictions);
    Object.assign(f.params, {
      classId,
      studentId: student.id,
      invitationId: invitation?.id ?? '',
      lessonId: await makeLesson(f.ctx, f.owner.id, classId),
      assignedLessonId,
      token: await makeInvitation(f.ctx, joinable, f.owner.email),
    });
  },
  routes: [
    { method: 'get', path: '/api/classes', access: 'signed-in', okStatus: 200 },
    {
      method: 'post',
      path: '/api/classes',
      access: teaches,
      body: () => ({ name: 'Spring term' }),
      okStatus: 201,
    },
    {
      method: 'get',
      path: '/api/classes/:classId',
      access: 'signed-in',
      ownership: owned('read'),
      okStatus: 200,
    },
    {
      method: 'patch',
      path: '/api/classes/:classId',
      access: 'signed-in',
      ownership: owned('owner'),
      body: () => ({ name: 'Renamed' }),
      okStatus: 200,
    },
    {
      method: 'delete',
      path: '/api/classes/:classId',
      access: 'signed-in',
      ownership: owned('owner'),
      okStatus: 204,
    },
    {
      method: 'get',
      path: '/api/classes/:classId/roster',
      access: 'signed-in',
      ownership: owned('owner'),
      okStatus: 200,
    },
    {
      method: 'delete',
      path: '/api/classes/:classId/students/:studentId',
      access: 'signed-in',
      ownership: owned('owner'),
      okStatus: 204,
    },
    {
      method: 'post',
      path: '/api/classes/:classId/invitations',
      access: 'signed-in',
      ownership: owned('owner'),
      body: () => ({ emails: ['new-student@example.test'] }),
      okStatus: 201,
    },
    {
      method: 'delete',
      path: '/api/classes/:classId/invitations/:invitationId',
      access: 'signed-in',
      ownership: owned('owner'),
      okStatus: 204,
    },
    { method: 'get', path: '/api/invitations/:token', access: 'public', okStatus: 200 },
    { method: 'post', path: '/api/invitations/:token/accept', access: 'signed-in', okStatus: 200 },
    { method: 'get', path: '/api/lessons', access: teaches, okStatus: 200 },
    {
      method: 'post',
      path: '/api/lessons',
      access: teaches,
      body: () => lessonRequest(),
      okStatus: 201,
    },
    {
      method: 'get',
      path: '/api/lessons/:lessonId',
      access: 'signed-in',
      ownership: owned('read'),
      okStatus: 200,
    },
    {
      method: 'patch',
      path: '/api/lessons/:lessonId',
      access: 'signed-in',
      ownership: owned('owner'),
      body: () => ({ revealed: true }),
      okStatus: 200,
    },
    {
      method: 'delete',
      path: '/api/lessons/:lessonId',
      access: 'signed-in',
      ownership: owned('owner'),
      okStatus: 204,
    },
    {
      method: 'post',
      path: '/api/lessons/:lessonId/duplicate',
      access: 'signed-in',
      ownership: owned('owner'),
      body: () => ({}),
      okStatus: 201,
    },
    {
      method: 'get',
      path: '/api/lessons/:lessonId/report',
      access: 'signed-in',
      ownership: owned('owner'),
      okStatus: 200,
    },
    {
      method: 'put',
      path: '/api/lessons/:assignedLessonId/answer',
      access: 'signed-in',
      ownership: owned('write'),
      body: () => ANSWER,
      okStatus: 200,
    },
    {
      method: 'post',
      path: '/api/lessons/:assignedLessonId/run',
      access: 'signed-in',
      ownership: owned('write'),
      okStatus: 200,
    },
  ],
};
