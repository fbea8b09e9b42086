/** Route guards: a session (401 without one) and a role (403 without it). */
import type { RequestHandler } from 'express';
import type { UserRole } from '../../shared/contracts/auth';
import '../auth/session-user';
import { forbidden, unauthorized } from './http-error';

/** Lets the request through only with a signed-in user; otherwise 401 `UNAUTHENTICATED`. */
export const requireAuth: RequestHandler = (req, _res, next) => {
  if (!req.user) throw unauthorized();
  next();
};

/**
 * Lets the request through only for a signed-in user with one of `roles` (401 without a session,
 * 403 `FORBIDDEN` with another role). Roles do not imply each other: list every one allowed,
 * e.g. `requireRole('instructor', 'admin')`.
 */
export function requireRole(...roles: readonly UserRole[]): RequestHandler {
  const allowed = new Set(roles);
  return (req, _res, next) => {
    if (!req.user) throw unauthorized();
    if (!allowed.has(req.user.role)) {
      throw forbidden(
        `This needs the ${roles.join(' or ')} role; ask an administrator if you should have it.`,
      );
    }
    next();
  };
}
