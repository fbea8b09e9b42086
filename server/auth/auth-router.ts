/** `/api/auth/*`: register, sign in and out, who am I, password reset. */
import { Router } from 'express';
import {
  LoginRequestSchema,
  PasswordResetConfirmSchema,
  PasswordResetRequestSchema,
  RegisterRequestSchema,
  UpdateMeRequestSchema,
  type MeResponse,
  type PasswordResetAccepted,
} from '../../shared/contracts/auth';
import type { AppContext } from '../app-context';
import { HttpError } from '../http/http-error';
import { limiter } from '../http/rate-limit';
import { requireAuth } from '../http/require-auth';
import { parseOr400 } from '../http/validate';
import { SESSION_COOKIE, endUserSession, startUserSession } from '../session/user-session';
import { registerUser, updateProfile, verifyCredentials } from './auth-service';
import { confirmPasswordReset, requestPasswordReset } from './password-reset-service';
import { currentUser } from './session-user';

/** The auth routes; rate limiters are created once per app. */
export function authRouter(ctx: AppContext): Router {
  const router = Router();
  const { limits } = ctx.auth;
  const windowMs = limits.windowMs;
  const loginPerIp = limiter({
    what: 'failed sign-ins from this address',
    limit: limits.loginFailuresPerIp,
    windowMs,
    onlyFailures: true,
  });
  const loginPerAccount = limiter({
    what: 'failed sign-ins for this account',
    limit: limits.loginFailuresPerAccount,
    windowMs,
    onlyFailures: true,
    byAccount: true,
  });
  const registerPerIp = limiter({
    what: 'registrations from this address',
    limit: limits.registrationsPerIp,
    windowMs,
  });
  const resetPerIp = limiter({
    what: 'password reset requests from this address',
    limit: limits.resetsPerIp,
    windowMs,
  });
  const resetPerAccount = limiter({
    what: 'password reset requests for this address',
    limit: limits.resetsPerAccount,
    windowMs,
    byAccount: true,
  });

  router.post('/auth/register', registerPerIp, async (req, res) => {
    const input = parseOr400(RegisterRequestSchema, req.body);
    const user = await registerUser(ctx, input);
    await startUserSession(req, user.id, ctx.auth.now());
    res.status(201).json({ user } satisfies MeResponse);
  });

  router.post('/auth/login', loginPerIp, loginPerAccount, async (req, res) => {
    const input = parseOr400(LoginRequestSchema, req.body);
    const user = await verifyCredentials(ctx, input.email, input.password);
    if (!user) {
      throw new HttpError(
        401,
        'INVALID_CREDENTIALS',
        'That e-mail and password do not match an account. Check both, or reset the password.',
      );
    }
    await startUserSession(req, user.id, ctx.auth.now());
    res.json({ user } satisfies MeResponse);
  });

  router.post('/auth/logout', requireAuth, async (req, res) => {
    await endUserSession(req);
    res.clearCookie(SESSION_COOKIE, { path: '/' });
    res.status(204).end();
  });

  router.get('/auth/me', requireAuth, (req, res) => {
    res.json({ user: currentUser(req) } satisfies MeResponse);
  });

  router.patch('/auth/me', requireAuth, async (req, res) => {
    const changes = parseOr400(UpdateMeRequestSchema, req.body);
    res.json({ user: await updateProfile(ctx, currentUser(req).id, changes) } satisfies MeResponse);
  });

  router.post('/auth/password-reset', resetPerIp, resetPerAccount, (req, res) => {
    const { email } = parseOr400(PasswordResetRequestSchema, req.body);
    // Answered before the work is done, so neither the answer nor its timing tells whether the address has an account.
    requestPasswordReset(ctx, email).catch((error: unknown) =>
      ctx.logger.error({ err: error }, 'password reset e-mail failed'),
    );
    const minutes = Math.round(ctx.auth.resetTokenTtlMs / 60_000);
    const body: PasswordResetAccepted = {
      message: `If an account uses that address, a reset link is on its way. It works for ${minutes} minutes.`,
    };
    res.status(202).json(body);
  });

  router.post('/auth/password-reset/confirm', resetPerIp, async (req, res) => {
    const input = parseOr400(PasswordResetConfirmSchema, req.body);
    const userId = await confirmPasswordReset(ctx, input.token, input.password);
    // Its rows are gone already; ending it here stops this response from saving it again.
    if (req.session?.userId === userId) {
      await endUserSession(req);
      res.clearCookie(SESSION_COOKIE, { path: '/' });
    }
    res.status(204).end();
  });

  return router;
}
