/** Sends the session cookie with every API call and turns an expired session into a sign-in. */
import { HttpErrorResponse, type HttpInterceptorFn } from '@angular/common/http';
import { Injector, inject } from '@angular/core';
import { Router } from '@angular/router';
import { catchError, throwError } from 'rxjs';
import { AuthState } from '../auth/auth-state';
import { signInRedirect } from '../auth/role-guard';

/**
 * Calls whose 401 is an answer, not an expired session: "who am I" when signed out, a wrong
 * password at login, and signing out of a session that already ended.
 */
const ANSWERING_401 = ['/api/auth/me', '/api/auth/login', '/api/auth/logout'];

/**
 * Adds `withCredentials` to `/api` requests; on a 401 from any other API call, forgets the user
 * and navigates to `/sign-in?returnUrl=<current url>`. The error still reaches the caller.
 */
export const sessionInterceptor: HttpInterceptorFn = (request, next) => {
  const isApi = request.url.startsWith('/api/');
  if (!isApi) return next(request);
  const router = inject(Router);
  const injector = inject(Injector);
  const path = request.url.split('?')[0] ?? request.url;
  return next(request.clone({ withCredentials: true })).pipe(
    catchError((error: unknown) => {
      if (
        error instanceof HttpErrorResponse &&
        error.status === 401 &&
        !ANSWERING_401.includes(path)
      ) {
        injector.get(AuthState).forget();
        void router.navigateByUrl(signInRedirect(router, router.url));
      }
      return throwError(() => error);
    }),
  );
};
