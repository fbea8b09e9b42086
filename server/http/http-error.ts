/** Operational HTTP errors: thrown by services and routers, turned into JSON by the error handler. */
import type { FieldError } from '../../shared/contracts/api-error';

/** An expected failure with its HTTP status, stable code and a message that says what to do. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: FieldError[],
    readonly headers?: Record<string, string>,
  ) {
    super(message);
  }
}

/** 400 with the fields at fault. */
export const badRequest = (message: string, fields?: FieldError[]): HttpError =>
  new HttpError(400, 'VALIDATION_FAILED', message, fields);
/** 401: no session. */
export const unauthorized = (message = 'Sign in first.'): HttpError =>
  new HttpError(401, 'UNAUTHENTICATED', message);
/** 403: signed in but not allowed. */
export const forbidden = (message = 'Your role does not allow this.'): HttpError =>
  new HttpError(403, 'FORBIDDEN', message);
/** 404: absent, or not visible to this user (the two are not told apart). */
export const notFound = (what = 'That resource'): HttpError =>
  new HttpError(404, 'NOT_FOUND', `${what} was not found.`);
/** 409: a stale version or a duplicate. */
export const conflict = (message: string, code = 'CONFLICT'): HttpError =>
  new HttpError(409, code, message);
