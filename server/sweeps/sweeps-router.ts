/** `/api/systems/:id/sweeps`, `/api/sweeps` and `/api/systems/:id/inflow-window`: the web layer only. */
import { Router, type Request } from 'express';
import {
  CellRunRequestSchema,
  StartSweepRequestSchema,
  SweepGetQuerySchema,
} from '../../shared/contracts/sweeps';
import type { AppContext } from '../app-context';
import { currentUser } from '../auth/session-user';
import { requireAuth } from '../http/require-auth';
import { parseOr400 } from '../http/validate';
import { runsDepsFor } from '../runs/run-pool-for';
import { runSweepCell } from './cell-run-service';
import { getInflowWindows } from './inflow-window-service';
import { sweepQueueFor } from './sweep-queue';
import {
  cancelSweep,
  deleteSweep,
  getSweep,
  listSweeps,
  startSweep,
  type SweepsDeps,
} from './sweeps-service';

const param = (req: Request, name: string): string => String(req.params[name] ?? '');

/** Start, list, read, cancel and delete sweeps; run one cell in full; the inflow windows. */
export function sweepsRouter(ctx: AppContext): Router {
  const router = Router();
  // The queue (and with PostgreSQL its job workers) starts on the first sweep request.
  const deps = (): SweepsDeps => ({ db: ctx.db, queue: sweepQueueFor(ctx), logger: ctx.logger });
  router.use(
    ['/systems/:systemId/sweeps', '/systems/:systemId/inflow-window', '/sweeps'],
    requireAuth,
  );

  router.post('/systems/:systemId/sweeps', async (req, res) => {
    const request = parseOr400(StartSweepRequestSchema, req.body ?? {});
    const sweep = await startSweep(deps(), currentUser(req), param(req, 'systemId'), request);
    res.status(202).location(`/api/sweeps/${sweep.id}`).json(sweep);
  });
  router.get('/systems/:systemId/sweeps', async (req, res) => {
    res.json(await listSweeps(deps(), currentUser(req), param(req, 'systemId')));
  });
  router.get('/systems/:systemId/inflow-window', async (req, res) => {
    res.json(await getInflowWindows(ctx.db, currentUser(req), param(req, 'systemId')));
  });
  router.get('/sweeps/:sweepId', async (req, res) => {
    const { cells } = parseOr400(SweepGetQuerySchema, req.query);
    res.json(await getSweep(deps(), currentUser(req), param(req, 'sweepId'), cells !== '0'));
  });
  router.post('/sweeps/:sweepId/cancel', async (req, res) => {
    res.json(await cancelSweep(deps(), currentUser(req), param(req, 'sweepId')));
  });
  router.delete('/sweeps/:sweepId', async (req, res) => {
    await deleteSweep(deps(), currentUser(req), param(req, 'sweepId'));
    res.status(204).end();
  });
  router.post('/sweeps/:sweepId/cell-runs', async (req, res) => {
    const { index } = parseOr400(CellRunRequestSchema, req.body ?? {});
    const run = await runSweepCell(
      runsDepsFor(ctx),
      currentUser(req),
      param(req, 'sweepId'),
      index,
    );
    res.status(201).location(`/api/runs/${run.runId}`).json(run);
  });
  return router;
}
