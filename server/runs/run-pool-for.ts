/** The run pool of an app context: `ctx.runPool` (made by main.ts), else one made on first use. */
import type { AppContext } from '../app-context';
import { defaultRunPoolOptions, RunPool } from './run-pool';
import type { RunsDeps } from './runs-service';

// Contexts built without a pool (other features' tests) get one of their own on first use; its
// idle workers do not keep the process alive.
const fallbackPools = new WeakMap<AppContext, RunPool>();

/** The pool runs go to in this context. */
export function runPoolFor(ctx: AppContext): RunPool {
  if (ctx.runPool) return ctx.runPool;
  let pool = fallbackPools.get(ctx);
  if (!pool) {
    pool = new RunPool(defaultRunPoolOptions());
    fallbackPools.set(ctx, pool);
  }
  return pool;
}

/** What the runs service needs, from an app context. */
export function runsDepsFor(ctx: AppContext): RunsDeps {
  return { db: ctx.db, pool: runPoolFor(ctx), logger: ctx.logger };
}
