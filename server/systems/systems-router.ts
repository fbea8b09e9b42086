/** `/api/systems`: the web layer only (parse, call the service, answer). */
import { Router, type Request } from 'express';
import {
  CreateSystemFromScenarioSchema,
  CreateSystemFromTemplateSchema,
  DuplicateSystemRequestSchema,
  ImportSystemQuerySchema,
  ShareRequestSchema,
  UpdateSystemRequestSchema,
} from '../../shared/contracts/systems';
import type { AppContext } from '../app-context';
import { currentUser } from '../auth/session-user';
import { requireAuth } from '../http/require-auth';
import { parseOr400 } from '../http/validate';
import { runsDepsFor } from '../runs/run-pool-for';
import { cancelRunsOfSystem } from '../runs/runs-service';
import { listSystemShares, shareSystem, unshareSystem } from './shares-service';
import {
  createSystem,
  deleteSystem,
  duplicateSystem,
  exportSystemScenario,
  getSystem,
  importSystem,
  listSystems,
  updateSystem,
} from './systems-service';

const param = (req: Request, name: string): string => String(req.params[name] ?? '');

/** Systems: list, create (scenario or template), import, read, save, delete, duplicate, export, shares. */
export function systemsRouter(ctx: AppContext): Router {
  const router = Router();
  const { db } = ctx;
  router.use('/systems', requireAuth);

  router.get('/systems', async (req, res) => {
    res.json(await listSystems(db, currentUser(req)));
  });
  router.post('/systems', async (req, res) => {
    const body: unknown = req.body;
    const isTemplate = typeof body === 'object' && body !== null && 'template' in body;
    const request = isTemplate
      ? parseOr400(CreateSystemFromTemplateSchema, body)
      : parseOr400(CreateSystemFromScenarioSchema, body);
    const system = await createSystem(db, currentUser(req), request);
    res.status(201).location(`/api/systems/${system.id}`).json(system);
  });
  router.post('/systems/import', async (req, res) => {
    const { name } = parseOr400(ImportSystemQuerySchema, req.query);
    const system = await importSystem(db, currentUser(req), req.body, name);
    res.status(201).location(`/api/systems/${system.id}`).json(system);
  });
  router.get('/systems/:systemId', async (req, res) => {
    res.json(await getSystem(db, currentUser(req), param(req, 'systemId')));
  });
  router.put('/systems/:systemId', async (req, res) => {
    const request = parseOr400(UpdateSystemRequestSchema, req.body);
    res.json(await updateSystem(db, currentUser(req), param(req, 'systemId'), request));
  });
  router.delete('/systems/:systemId', async (req, res) => {
    const user = currentUser(req);
    const systemId = param(req, 'systemId');
    await deleteSystem(db, user, systemId, () => cancelRunsOfSystem(runsDepsFor(ctx), systemId));
    res.status(204).end();
  });
  router.post('/systems/:systemId/duplicate', async (req, res) => {
    const { name } = parseOr400(DuplicateSystemRequestSchema, req.body ?? {});
    const system = await duplicateSystem(db, currentUser(req), param(req, 'systemId'), name);
    res.status(201).location(`/api/systems/${system.id}`).json(system);
  });
  router.get('/systems/:systemId/scenario.json', async (req, res) => {
    const { fileName, document } = await exportSystemScenario(
      db,
      currentUser(req),
      param(req, 'systemId'),
    );
    res
      .attachment(fileName)
      .type('application/json')
      .send(`${JSON.stringify(document, null, 2)}\n`);
  });
  router.get('/systems/:systemId/shares', async (req, res) => {
    res.json(await listSystemShares(db, currentUser(req), param(req, 'systemId')));
  });
  router.post('/systems/:systemId/shares', async (req, res) => {
    const request = parseOr400(ShareRequestSchema, req.body);
    res.status(201).json(await shareSystem(db, currentUser(req), param(req, 'systemId'), request));
  });
  router.delete('/systems/:systemId/shares/:shareUserId', async (req, res) => {
    await unshareSystem(db, currentUser(req), param(req, 'systemId'), param(req, 'shareUserId'));
    res.status(204).end();
  });
  return router;
}
