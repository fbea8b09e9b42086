/**
 * Password reset by e-mail: a random single-use token with an expiry, stored only as its
 * SHA-256 hash, sent as a link to the account's address. Confirming sets the new password and
 * signs the account out everywhere.
 */
import { createHash, randomBytes } from 'node:crypto';
import bcrypt from 'bcryptjs';
import { and, eq, gt, isNull } from 'drizzle-orm';
import type { AppContext } from '../app-context';
import { passwordResets } from '../db/schema';
import { HttpError } from '../http/http-error';
import { destroyUserSessions } from '../session/drizzle-session-store';
import { passwordResetMail } from './password-reset-mail';
import { findUserByEmail, setPasswordHash } from './user-repository';

/** SHA-256 hex of a token: what the database keeps. */
export function hashResetToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}

/**
 * Issues a token for the account with this address (if there is one and it is enabled) and
 * e-mails the link; earlier unused tokens of that account stop working. Says nothing about
 * whether the account exists: callers answer 202 either way, before this finishes.
 */
export async function requestPasswordReset(ctx: AppContext, email: string): Promise<void> {
  const user = await findUserByEmail(ctx.db, email);
  if (!user || user.disabled) return;
  const token = randomBytes(32).toString('base64url');
  const nowMs = ctx.auth.now();
  await ctx.db.transaction(async (tx) => {
    await tx
      .update(passwordResets)
      .set({ usedAt: new Date(nowMs) })
      .where(and(eq(passwordResets.userId, user.id), isNull(passwordResets.usedAt)));
    await tx.insert(passwordResets).values({
      userId: user.id,
      tokenHash: hashResetToken(token),
      expiresAt: new Date(nowMs + ctx.auth.resetTokenTtlMs),
    });
  });
  const link = `${ctx.auth.publicUrl}/reset-password?token=${encodeURIComponent(token)}`;
  await ctx.mailer.send(passwordResetMail(user.email, user.name, link, ctx.auth.resetTokenTtlMs));
}

/**
 * Uses a token once: marks it used and stores the new password's hash in one step, so two
 * concurrent confirmations cannot both succeed. 400 `RESET_TOKEN_INVALID` for an unknown, used
 * or expired token. Returns the id of the user whose password changed.
 */
export async function confirmPasswordReset(
  ctx: AppContext,
  token: string,
  password: string,
): Promise<string> {
  const passwordHash = await bcrypt.hash(password, ctx.auth.bcryptCost);
  const now = new Date(ctx.auth.now());
  const [used] = await ctx.db
    .update(passwordResets)
    .set({ usedAt: now })
    .where(
      and(
        eq(passwordResets.tokenHash, hashResetToken(token)),
        isNull(passwordResets.usedAt),
        gt(passwordResets.expiresAt, now),
      ),
    )
    .returning({ userId: passwordResets.userId });
  if (!used) {
    throw new HttpError(
      400,
      'RESET_TOKEN_INVALID',
      'This reset link is invalid, used or expired. Ask for a new one from the sign-in page.',
    );
  }
  await setPasswordHash(ctx.db, used.userId, passwordHash);
  await destroyUserSessions(ctx.db, used.userId);
  return used.userId;
}
