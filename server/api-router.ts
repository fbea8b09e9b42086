/** The `/api` router: one sub-router per resource, ending in a JSON 404. */
import { Router } from 'express';
import type { AppContext } from './app-context';
import { notFoundHandler } from './http/error-handler';
import { healthRouter } from './health/health-router';
import { authRouter } from './auth/auth-router';
import { adminRouter } from './admin/admin-router';
import { systemsRouter } from './systems/systems-router';
import { runsRouter } from './runs/runs-router';
import { classroomRouter } from './classroom/classroom-router';
import { measurementsRouter } from './measurements/measurements-router';
import { sweepsRouter } from './sweeps/sweeps-router';
import { sizingRouter } from './sizing/sizing-router';

/** Mounts every resource's router. Features add their line here. */
export function apiRouter(ctx: AppContext): Router {
  const router = Router();
  router.use(healthRouter(ctx));
  router.use(authRouter(ctx));
  router.use(adminRouter(ctx));
  router.use(systemsRouter(ctx));
  router.use(runsRouter(ctx));
  router.use(classroomRouter(ctx));
  router.use(measurementsRouter(ctx));
  router.use(sweepsRouter(ctx));
  router.use(sizingRouter(ctx));
  router.use(notFoundHandler);
  return router;
}
