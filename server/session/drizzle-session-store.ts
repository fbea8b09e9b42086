/**
 * An express-session Store over the `sessions` table, so sessions live in the app's own
 * database (PGlite or PostgreSQL) and survive a restart.
 */
import { and, eq, gt, lt, sql } from 'drizzle-orm';
import session, { type SessionData } from 'express-session';
import type { Database } from '../db/database';
import { sessions } from '../db/schema';

const DEFAULT_TTL_MS = 24 * 60 * 60 * 1000;

/** When a session row stops being valid: its cookie's expiry, else a day from now. */
function expiryOf(sess: SessionData, nowMs: number): Date {
  const expires = sess.cookie?.expires;
  if (expires) return new Date(expires);
  const maxAge = sess.cookie?.maxAge;
  return new Date(nowMs + (typeof maxAge === 'number' ? maxAge : DEFAULT_TTL_MS));
}

/** Calls back with the outcome of a promise, the way express-session expects. */
function settle<T>(
  work: Promise<T>,
  callback: ((err: unknown, value?: T) => void) | undefined,
): void {
  work.then(
    (value) => callback?.(null, value),
    (error: unknown) => callback?.(error),
  );
}

/** Session rows in the `sessions` table: get, set (upsert), destroy, touch and prune. */
export class DrizzleSessionStore extends session.Store {
  constructor(private readonly db: Database) {
    super();
  }

  override get(sid: string, callback: (err: unknown, session?: SessionData | null) => void): void {
    const work = this.db
      .select({ sess: sessions.sess })
      .from(sessions)
      .where(and(eq(sessions.sid, sid), gt(sessions.expire, new Date())))
      .then(([row]) => (row ? (row.sess as SessionData) : null));
    settle(work, callback);
  }

  override set(sid: string, sess: SessionData, callback?: (err?: unknown) => void): void {
    const expire = expiryOf(sess, Date.now());
    const work = this.db
      .insert(sessions)
      .values({ sid, sess, expire })
      .onConflictDoUpdate({ target: sessions.sid, set: { sess, expire } });
    settle(work, callback);
  }

  override destroy(sid: string, callback?: (err?: unknown) => void): void {
    settle(this.db.delete(sessions).where(eq(sessions.sid, sid)), callback);
  }

  override touch(sid: string, sess: SessionData, callback?: () => void): void {
    const work = this.db
      .update(sessions)
      .set({ expire: expiryOf(sess, Date.now()) })
      .where(eq(sessions.sid, sid));
    settle(work, () => callback?.());
  }

  /** Deletes expired rows; main.ts runs it on an interval. Returns how many went. */
  async prune(): Promise<number> {
    const gone = await this.db
      .delete(sessions)
      .where(lt(sessions.expire, new Date()))
      .returning({ sid: sessions.sid });
    return gone.length;
  }
}

/** Signs a user out everywhere (after a password change or when disabled), optionally keeping one session. */
export async function destroyUserSessions(
  db: Database,
  userId: string,
  exceptSid?: string,
): Promise<void> {
  const ofUser = sql`${sessions.sess}->>'userId' = ${userId}`;
  await db
    .delete(sessions)
    .where(exceptSid ? and(ofUser, sql`${sessions.sid} <> ${exceptSid}`) : ofUser);
}
