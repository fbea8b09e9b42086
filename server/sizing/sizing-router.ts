/** `/api/systems/:id/sizing` and `/api/systems/:id/build-sheet`: the web layer only. */
import { Router, type Request } from 'express';
import { BuildSheetQuerySchema, SizingQuerySchema } from '../../shared/contracts/sizing';
import { parseQuantity } from '../../shared/scenario/index';
import type { AppContext } from '../app-context';
import { currentUser } from '../auth/session-user';
import { requireSystemAccess } from '../auth/system-access';
import { badRequest } from '../http/http-error';
import { requireAuth } from '../http/require-auth';
import { parseOr400 } from '../http/validate';
import { runPoolFor } from '../runs/run-pool-for';
import { systemScenario } from '../sweeps/sweeps-service';
import { buildSheet } from './build-sheet';
import { sizingReport } from './sizing-service';

const param = (req: Request, name: string): string => String(req.params[name] ?? '');

/** The bulkhead fitting depth of the query, m (0–100 mm), or undefined for each size's default. */
function fittingDepthM(value: string | undefined): number | undefined {
  if (value === undefined) return undefined;
  const parsed = parseQuantity(value, 'length', 'fittingDepth');
  if (!parsed.success) throw badRequest(parsed.issue.message, [parsed.issue]);
  if (!(parsed.value >= 0 && parsed.value <= 0.1))
    throw badRequest('Choose a fitting depth from 0 to 100 mm.', [
      { path: 'fittingDepth', message: 'Choose a depth from 0 to 100 mm.' },
    ]);
  return parsed.value;
}

/** The sizing checks (what-if runs on the pool) and the build sheet of a system the user may read. */
export function sizingRouter(ctx: AppContext): Router {
  const router = Router();
  router.use(['/systems/:systemId/sizing', '/systems/:systemId/build-sheet'], requireAuth);
  router.get('/systems/:systemId/sizing', async (req, res) => {
    const query = parseOr400(SizingQuerySchema, req.query);
    res.json(
      await sizingReport(
        { db: ctx.db, pool: runPoolFor(ctx) },
        currentUser(req),
        param(req, 'systemId'),
        query,
      ),
    );
  });
  router.get('/systems/:systemId/build-sheet', async (req, res) => {
    const { fittingDepth } = parseOr400(BuildSheetQuerySchema, req.query);
    const depth = fittingDepthM(fittingDepth);
    const { system } = await requireSystemAccess(
      ctx.db,
      currentUser(req),
      param(req, 'systemId'),
      'read',
    );
    res.json(buildSheet(system, systemScenario(system.scenario), depth));
  });
  return router;
}
