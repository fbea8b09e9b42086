/**
 * `/api/classes`, `/api/lessons` and `/api/invitations`: the web layer of the classroom. Parses
 * requests with the shared schemas, calls the services, answers. Who may do what is decided in
 * the services (class-access, lesson-access), beyond the role needed to create classes and lessons.
 */
import { Router } from 'express';
import {
  AnswerRequestSchema,
  ClassRequestSchema,
  CreateLessonRequestSchema,
  DuplicateLessonRequestSchema,
  InviteRequestSchema,
  UpdateLessonRequestSchema,
} from '../../shared/contracts/classroom';
import { currentUser } from '../auth/session-user';
import { requireAuth, requireRole } from '../http/require-auth';
import { parseOr400 } from '../http/validate';
import type { AppContext } from '../app-context';
import { classroomDepsFor, type ClassroomDeps } from './classroom-deps';
import * as answerService from './answer-service';
import * as classService from './class-service';
import * as invitationService from './invitation-service';
import * as lessonService from './lesson-service';

/** A path parameter as a string (Express types them loosely; a missing one matches nothing). */
const param = (value: string | string[] | undefined): string =>
  typeof value === 'string' ? value : '';

/** Roles that may teach: create classes and lessons. */
const teaches = requireRole('instructor', 'admin');

/** The classroom routes; `deps` replaces what the context would give (tests). */
export function classroomRouter(
  ctx: AppContext,
  deps: ClassroomDeps = classroomDepsFor(ctx),
): Router {
  const router = Router();
  mountClassRoutes(router, deps);
  mountRosterRoutes(router, deps);
  mountInvitationLinkRoutes(router, deps);
  mountLessonRoutes(router, deps);
  mountAnswerRoutes(router, deps);
  return router;
}

/** `/classes` and `/classes/:classId`. */
function mountClassRoutes(router: Router, { db }: ClassroomDeps): void {
  router.get('/classes', requireAuth, async (req, res) => {
    res.json(await classService.listClasses(db, currentUser(req)));
  });
  router.post('/classes', teaches, async (req, res) => {
    const body = parseOr400(ClassRequestSchema, req.body);
    res.status(201).json(await classService.createClass(db, currentUser(req), body));
  });
  router.get('/classes/:classId', requireAuth, async (req, res) => {
    res.json(await classService.getClass(db, currentUser(req), param(req.params.classId)));
  });
  router.patch('/classes/:classId', requireAuth, async (req, res) => {
    const body = parseOr400(ClassRequestSchema, req.body);
    res.json(await classService.renameClass(db, currentUser(req), param(req.params.classId), body));
  });
  router.delete('/classes/:classId', requireAuth, async (req, res) => {
    await classService.deleteClass(db, currentUser(req), param(req.params.classId));
    res.status(204).end();
  });
}

/** The roster of a class: students and invitations. */
function mountRosterRoutes(router: Router, deps: ClassroomDeps): void {
  router.get('/classes/:classId/roster', requireAuth, async (req, res) => {
    const classId = param(req.params.classId);
    res.json(await classService.getRoster(deps.db, currentUser(req), classId, deps.now()));
  });
  router.delete('/classes/:classId/students/:studentId', requireAuth, async (req, res) => {
    const { classId, studentId } = req.params;
    await classService.removeStudent(deps.db, currentUser(req), param(classId), param(studentId));
    res.status(204).end();
  });
  router.post('/classes/:classId/invitations', requireAuth, async (req, res) => {
    const body = parseOr400(InviteRequestSchema, req.body);
    const classId = param(req.params.classId);
    res
      .status(201)
      .json(await invitationService.inviteStudents(deps, currentUser(req), classId, body));
  });
  router.delete('/classes/:classId/invitations/:invitationId', requireAuth, async (req, res) => {
    const { classId, invitationId } = req.params;
    await invitationService.revokeInvitation(
      deps,
      currentUser(req),
      param(classId),
      param(invitationId),
    );
    res.status(204).end();
  });
}

/** The e-mailed invitation link: what it offers (no sign-in), and joining. */
function mountInvitationLinkRoutes(router: Router, deps: ClassroomDeps): void {
  router.get('/invitations/:token', async (req, res) => {
    res.json(await invitationService.previewInvitation(deps, param(req.params.token)));
  });
  router.post('/invitations/:token/accept', requireAuth, async (req, res) => {
    const token = param(req.params.token);
    res.json(await invitationService.acceptInvitation(deps, currentUser(req), token));
  });
}

/** The library and lessons as their owner manages them. */
function mountLessonRoutes(router: Router, deps: ClassroomDeps): void {
  router.get('/lessons', teaches, async (req, res) => {
    res.json(await lessonService.listLibrary(deps, currentUser(req)));
  });
  router.post('/lessons', teaches, async (req, res) => {
    const body = parseOr400(CreateLessonRequestSchema, req.body);
    res.status(201).json(await lessonService.createLesson(deps, currentUser(req), body));
  });
  router.get('/lessons/:lessonId', requireAuth, async (req, res) => {
    res.json(await lessonService.getLesson(deps, currentUser(req), param(req.params.lessonId)));
  });
  router.patch('/lessons/:lessonId', requireAuth, async (req, res) => {
    const body = parseOr400(UpdateLessonRequestSchema, req.body);
    const lessonId = param(req.params.lessonId);
    res.json(await lessonService.updateLesson(deps, currentUser(req), lessonId, body));
  });
  router.delete('/lessons/:lessonId', requireAuth, async (req, res) => {
    await lessonService.deleteLesson(deps, currentUser(req), param(req.params.lessonId));
    res.status(204).end();
  });
  router.post('/lessons/:lessonId/duplicate', requireAuth, async (req, res) => {
    const body = parseOr400(DuplicateLessonRequestSchema, req.body ?? {});
    const lessonId = param(req.params.lessonId);
    res
      .status(201)
      .json(await lessonService.duplicateLesson(deps, currentUser(req), lessonId, body));
  });
}

/** Students' predictions and runs, and the owner's report of them. */
function mountAnswerRoutes(router: Router, deps: ClassroomDeps): void {
  // A student's actions name the lesson assigned to them (same ids, a different part in it).
  router.put('/lessons/:assignedLessonId/answer', requireAuth, async (req, res) => {
    const body = parseOr400(AnswerRequestSchema, req.body);
    const lessonId = param(req.params.assignedLessonId);
    res.json(await answerService.saveAnswer(deps, currentUser(req), lessonId, body));
  });
  router.post('/lessons/:assignedLessonId/run', requireAuth, async (req, res) => {
    const lessonId = param(req.params.assignedLessonId);
    res.json(await answerService.runLesson(deps, currentUser(req), lessonId));
  });
  router.get('/lessons/:lessonId/report', requireAuth, async (req, res) => {
    res.json(await answerService.getReport(deps, currentUser(req), param(req.params.lessonId)));
  });
}
