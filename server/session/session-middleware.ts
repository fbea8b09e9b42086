/** express-session configured for Tidewright: database store, hardened cookie, rolling idle expiry. */
import session from 'express-session';
import type { RequestHandler } from 'express';
import type { AppContext } from '../app-context';
import { DrizzleSessionStore } from './drizzle-session-store';
import { SESSION_COOKIE, loadSessionUser } from './user-session';

/**
 * The session middlewares for `/api`: the cookie is httpOnly, SameSite=Lax, Secure whenever the
 * request arrived over TLS (`secure: 'auto'` honours the app's `trust proxy`), and expires after
 * the idle timeout unless a request renews it. The second middleware sets `req.user`.
 */
export function sessionMiddleware(ctx: AppContext): RequestHandler[] {
  const handler = session({
    name: SESSION_COOKIE,
    secret: ctx.auth.sessionSecret,
    store: new DrizzleSessionStore(ctx.db),
    resave: false,
    saveUninitialized: false,
    rolling: true,
    unset: 'destroy',
    cookie: {
      httpOnly: true,
      sameSite: 'lax',
      secure: 'auto',
      path: '/',
      maxAge: ctx.auth.idleTimeoutMs,
    },
  });
  return [handler, loadSessionUser(ctx)];
}
