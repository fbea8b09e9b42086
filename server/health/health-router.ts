/** `GET /api/health`: the server answers and its database runs a query. */
import { Router } from 'express';
import { sql } from 'drizzle-orm';
import type { Health } from '../../shared/contracts/health';
import type { AppContext } from '../app-context';

/** Health check used by the browser tests, CI and load balancers. */
export function healthRouter(ctx: AppContext): Router {
  const router = Router();
  router.get('/health', async (_req, res) => {
    let db: Health['db'] = 'ok';
    try {
      await ctx.db.execute(sql`select 1`);
    } catch {
      db = 'down';
    }
    const body: Health = {
      status: db === 'ok' ? 'ok' : 'degraded',
      db,
      dbKind: ctx.dbKind,
      version: ctx.version,
    };
    res.status(db === 'ok' ? 200 : 503).json(body);
  });
  return router;
}
