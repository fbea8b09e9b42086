/**
 * What the session holds (the user id and two timestamps) and the middleware that turns it into
 * `req.user` on every API request, enforcing the idle and absolute timeouts.
 */
import type { Request, RequestHandler } from 'express';
import '../auth/session-user';
import type { AppContext } from '../app-context';
import { findUserById, toUser } from '../auth/user-repository';

declare module 'express-session' {
  interface SessionData {
    /** The signed-in user's id. */
    userId?: string;
    /** When this sign-in happened (ms since the epoch), for the absolute timeout. */
    signedInAtMs?: number;
    /** When this session last served a request (ms since the epoch), for the idle timeout. */
    lastSeenAtMs?: number;
  }
}

/** Refresh `lastSeenAtMs` at most this often, so busy pages do not write the session on every call. */
const LAST_SEEN_RESOLUTION_MS = 60_000;

function promised(run: (done: (err?: unknown) => void) => void): Promise<void> {
  return new Promise((resolve, reject) => run((err) => (err ? reject(err) : resolve())));
}

/** Signs `userId` in on a fresh session id (so a planted id never gains a sign-in). */
export async function startUserSession(req: Request, userId: string, nowMs: number): Promise<void> {
  await promised((done) => req.session.regenerate(done));
  req.session.userId = userId;
  req.session.signedInAtMs = nowMs;
  req.session.lastSeenAtMs = nowMs;
  await promised((done) => req.session.save(done));
}

/** Ends the session: its row is deleted and its cookie cleared. */
export async function endUserSession(req: Request): Promise<void> {
  await promised((done) => req.session.destroy(done));
  req.user = undefined;
}

/** Why a stored session no longer signs anyone in, or null while it is valid. */
function expiredReason(req: Request, nowMs: number, ctx: AppContext): string | null {
  const { signedInAtMs, lastSeenAtMs } = req.session;
  if (signedInAtMs === undefined || nowMs - signedInAtMs > ctx.auth.absoluteTimeoutMs)
    return 'absolute';
  if (lastSeenAtMs === undefined || nowMs - lastSeenAtMs > ctx.auth.idleTimeoutMs) return 'idle';
  return null;
}

/** Sets `req.user` from the session; a timed-out session or a disabled or deleted user is signed out. */
export function loadSessionUser(ctx: AppContext): RequestHandler {
  return async (req, _res, next) => {
    const userId = req.session?.userId;
    if (!userId) return next();
    const nowMs = ctx.auth.now();
    const row =
      expiredReason(req, nowMs, ctx) === null ? await findUserById(ctx.db, userId) : undefined;
    if (!row || row.disabled) {
      // A fresh empty session (not destroy): this request may go on to sign in or register.
      await promised((done) => req.session.regenerate(done));
      return next();
    }
    req.user = toUser(row);
    if (nowMs - (req.session.lastSeenAtMs ?? 0) >= LAST_SEEN_RESOLUTION_MS)
      req.session.lastSeenAtMs = nowMs;
    next();
  };
}

/** Name of the session cookie. */
export const SESSION_COOKIE = 'tidewright.sid';
