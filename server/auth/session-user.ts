/**
 * The signed-in user on a request: `req.user` is set by the session middleware from the
 * `users` row (so role changes and disabling take effect on the next request).
 */
import type { Request } from 'express';
import type { User } from '../../shared/contracts/auth';
import { unauthorized } from '../http/http-error';

/** The user a request acts for: the public user fields, loaded fresh on every request. */
export type SessionUser = User;

declare global {
  // Express's own request type is widened through its global namespace.
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface Request {
      /** The signed-in user, or undefined for anonymous requests. */
      user?: SessionUser;
    }
  }
}

/** The signed-in user of this request; throws 401 when nobody is signed in. */
export function currentUser(req: Request): SessionUser {
  if (!req.user) throw unauthorized();
  return req.user;
}
