/** `/api/systems/:id/runs` and `/api/runs`: the web layer only (parse, call the service, answer). */
import { Router, type Request } from 'express';
import {
  RunCompareQuerySchema,
  RunGetQuerySchema,
  RunListQuerySchema,
  RunSeriesQuerySchema,
  StartRunRequestSchema,
} from '../../shared/contracts/runs';
import type { AppContext } from '../app-context';
import { currentUser } from '../auth/session-user';
import { requireAuth } from '../http/require-auth';
import { parseOr400 } from '../http/validate';
import { runsDepsFor } from './run-pool-for';
import {
  compareTwoRuns,
  getRunResultFile,
  getRunSeries,
  getRunSeriesCsv,
} from './run-results-service';
import { cancelRun, deleteRun, getRun, listRuns, startRun } from './runs-service';

const param = (req: Request, name: string): string => String(req.params[name] ?? '');

/** Start, list, read, cancel, delete and compare runs; series as JSON and CSV; the result file. */
export function runsRouter(ctx: AppContext): Router {
  const router = Router();
  const deps = runsDepsFor(ctx);
  router.use(['/systems/:systemId/runs', '/runs'], requireAuth);

  router.post('/systems/:systemId/runs', async (req, res) => {
    const request = parseOr400(StartRunRequestSchema, req.body ?? {});
    const result = await startRun(deps, currentUser(req), param(req, 'systemId'), request);
    if (result.kind === 'ended') {
      res.status(201).location(`/api/runs/${result.run.id}`).json(result.run);
    } else {
      res.status(202).location(`/api/runs/${result.started.id}`).json(result.started);
    }
  });
  router.get('/systems/:systemId/runs', async (req, res) => {
    const query = parseOr400(RunListQuerySchema, req.query);
    res.json(await listRuns(deps, currentUser(req), param(req, 'systemId'), query));
  });
  router.get('/runs/compare', async (req, res) => {
    const { a, b } = parseOr400(RunCompareQuerySchema, req.query);
    res.json(await compareTwoRuns(deps, currentUser(req), a, b));
  });
  router.get('/runs/:runId', async (req, res) => {
    const { snapshot } = parseOr400(RunGetQuerySchema, req.query);
    res.json(await getRun(deps, currentUser(req), param(req, 'runId'), snapshot === '1'));
  });
  router.post('/runs/:runId/cancel', async (req, res) => {
    res.json(await cancelRun(deps, currentUser(req), param(req, 'runId')));
  });
  router.delete('/runs/:runId', async (req, res) => {
    await deleteRun(deps, currentUser(req), param(req, 'runId'));
    res.status(204).end();
  });
  router.get('/runs/:runId/series', async (req, res) => {
    const query = parseOr400(RunSeriesQuerySchema, req.query);
    res.json(await getRunSeries(deps, currentUser(req), param(req, 'runId'), query));
  });
  router.get('/runs/:runId/series.csv', async (req, res) => {
    const { fileName, csv } = await getRunSeriesCsv(deps, currentUser(req), param(req, 'runId'));
    res.attachment(fileName).type('text/csv').send(csv);
  });
  router.get('/runs/:runId/result.json', async (req, res) => {
    const { fileName, file } = await getRunResultFile(deps, currentUser(req), param(req, 'runId'));
    res.attachment(fileName).type('application/json').send(JSON.stringify(file));
  });
  return router;
}
