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
  const { db } = deps;

  router.get('/classes', requireAuth, async (req, res) => {
    res.json(await classService.listClasses(db, currentUser(req)));
  });
  router.post('/classes', teaches, async (req, res) => {
    res
      .status(201)
      .json(
        await classService.createClass(
          db,
          currentUser(req),
          parseOr400(ClassRequestSchema, req.body),
        ),
      );
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
  router.get('/classes/:classId/roster', requireAuth, async (req, res) => {
    res.json(
      await classService.getRoster(db, currentUser(req), param(req.params.classId), deps.now()),
    );
  });
  router.delete('/classes/:classId/students/:studentId', requireAuth, async (req, res) => {
    await classService.removeStudent(
      db,
      currentUser(req),
      param(req.params.classId),
      param(req.params.studentId),
    );
    res.status(204).end();
  });
  router.post('/classes/:classId/invitations', requireAuth, async (req, res) => {
    const body = parseOr400(InviteRequestSchema, req.body);
    res
      .status(201)
      .json(
        await invitationService.inviteStudents(
          deps,
          currentUser(req),
          param(req.params.classId),
          body,
        ),
      );
  });
  router.delete('/classes/:classId/invitations/:invitationId', requireAuth, async (req, res) => {
    await invitationService.revokeInvitation(
      deps,
      currentUser(req),
      param(req.params.classId),
      param(req.params.invitationId),
    );
    res.status(204).end();
  });

  router.get('/invitations/:token', async (req, res) => {
    res.json(await invitationService.previewInvitation(deps, param(req.params.token)));
  });
  router.post('/invitations/:token/accept', requireAuth, async (req, res) => {
    res.json(
      await invitationService.acceptInvitation(deps, currentUser(req), param(req.params.token)),
    );
  });

  mountLessonRoutes(router, deps);
  return router;
}

function mountLessonRoutes(router: Router, deps: ClassroomDeps): void {
  router.get('/lessons', teaches, async (req, res) => {
    res.json(await lessonService.listLibrary(deps, currentUser(req)));
  });
  router.post('/lessons', teaches, async (req, res) => {
    res
      .status(201)
      .json(
        await lessonService.createLesson(
          deps,
          currentUser(req),
          parseOr400(CreateLessonRequestSchema, req.body),
        ),
      );
  });
  router.get('/lessons/:lessonId', requireAuth, async (req, res) => {
    res.json(await lessonService.getLesson(deps, currentUser(req), param(req.params.lessonId)));
  });
  router.patch('/lessons/:lessonId', requireAuth, async (req, res) => {
    const body = parseOr400(UpdateLessonRequestSchema, req.body);
    res.json(
      await lessonService.updateLesson(deps, currentUser(req), param(req.params.lessonId), body),
    );
  });
  router.delete('/lessons/:lessonId', requireAuth, async (req, res) => {
    await lessonService.deleteLesson(deps, currentUser(req), param(req.params.lessonId));
    res.status(204).end();
  });
  router.post('/lessons/:lessonId/duplicate', requireAuth, async (req, res) => {
    const body = parseOr400(DuplicateLessonRequestSchema, req.body ?? {});
    res
      .status(201)
      .json(
        await lessonService.duplicateLesson(
          deps,
          currentUser(req),
          param(req.params.lessonId),
          body,
        ),
      );
  });
  // A student's actions name the lesson assigned to them (same ids, a different part in it).
  router.put('/lessons/:assignedLessonId/answer', requireAuth, async (req, res) => {
    const body = parseOr400(AnswerRequestSchema, req.body);
    res.json(
      await answerService.saveAnswer(
        deps,
        currentUser(req),
        param(req.params.assignedLessonId),
        body,
      ),
    );
  });
  router.post('/lessons/:assignedLessonId/run', requireAuth, async (req, res) => {
    res.json(
      await answerService.runLesson(deps, currentUser(req), param(req.params.assignedLessonId)),
    );
  });
  router.get('/lessons/:lessonId/report', requireAuth, async (req, res) => {
    res.json(await answerService.getReport(deps, currentUser(req), param(req.params.lessonId)));
  });
}
