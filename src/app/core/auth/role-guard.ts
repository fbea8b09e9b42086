/** Route guards that let a route through only for signed-in users with one of some roles. */
import { inject } from '@angular/core';
import {
  type CanActivateFn,
  type CanMatchFn,
  type GuardResult,
  Router,
  type UrlTree,
} from '@angular/router';
import { AuthState } from './auth-state';
import type { UserRole } from '../../../../shared/contracts/auth';

/**
 * A guard for `canMatch` or `canActivate`: signed-out visitors go to `/sign-in?returnUrl=…`,
 * signed-in users without one of `roles` go home. With no roles, any signed-in user passes.
 *
 * @example { path: 'admin', canMatch: [roleGuard('admin')], loadChildren: … }
 */
export function roleGuard(...roles: readonly UserRole[]): CanMatchFn & CanActivateFn {
  return async (): Promise<GuardResult> => {
    const auth = inject(AuthState);
    const router = inject(Router);
    const attempted = router.currentNavigation()?.extractedUrl.toString() ?? router.url;
    const user = await auth.ready();
    if (!user) return signInRedirect(router, attempted);
    if (roles.length > 0 && !roles.includes(user.role)) return router.parseUrl('/');
    return true;
  };
}

/**
 * A guard for pages meant for signed-out visitors (home and sign-in): a signed-in user is sent
 * to `/systems` instead.
 */
export const signedOutGuard: CanActivateFn = async (): Promise<GuardResult> => {
  const router = inject(Router);
  const user = await inject(AuthState).ready();
  return user ? router.parseUrl('/systems') : true;
};

/** `/sign-in?returnUrl=<url>`, the way every "please sign in" redirect is built. */
export function signInRedirect(router: Router, returnUrl: string): UrlTree {
  const keep = returnUrl && returnUrl !== '/' && !returnUrl.startsWith('/sign-in');
  return router.createUrlTree(['/sign-in'], keep ? { queryParams: { returnUrl } } : {});
}
