/** The one error handler: JSON `{error: {code, message, fields?}}`; 5xx details go to the log only. */
import type { ErrorRequestHandler, RequestHandler } from 'express';
import type { ApiError } from '../../shared/contracts/api-error';
import { HttpError } from './http-error';

interface BodyParserError extends Error {
  type?: string;
  status?: number;
  expose?: boolean;
  /** For `entity.too.large`: the limit in bytes. */
  limit?: number;
}

function isBodyParserError(err: unknown): err is BodyParserError {
  return (
    err instanceof Error &&
    typeof (err as BodyParserError).status === 'number' &&
    (err as BodyParserError).expose === true
  );
}

/** A byte count as people say it: `1 MB`, `512 kB`, `1.5 MB`. */
function byteSize(bytes: number): string {
  const mb = bytes / (1024 * 1024);
  if (mb >= 1) return `${Number(mb.toFixed(1))} MB`;
  return `${Number((bytes / 1024).toFixed(1))} kB`;
}

/**
 * A body the parser refused (a 4xx, as `expose` says). Every one is a 400 in the validation shape, the whole body being the
 * field at fault: bad JSON, a body over the limit (with the limit), or another parser refusal.
 */
function bodyParserAnswer(err: BodyParserError): { status: number; body: ApiError } {
  let code = 'BAD_REQUEST';
  let message = err.message;
  if (err.type === 'entity.too.large') {
    code = 'BODY_TOO_LARGE';
    const limit = err.limit === undefined ? 'size' : byteSize(err.limit);
    message = `The request body is larger than the ${limit} limit; send less data at once.`;
  } else if (err.type === 'entity.parse.failed') {
    code = 'INVALID_JSON';
    message = 'The request body is not valid JSON; check its quotes, commas and brackets.';
  }
  return { status: 400, body: { error: { code, message, fields: [{ path: '(body)', message }] } } };
}

/** Maps HttpError and body-parser errors to their status; anything else is a logged 500. */
export const errorHandler: ErrorRequestHandler = (err: unknown, req, res, _next) => {
  let status = 500;
  let body: ApiError = {
    error: { code: 'INTERNAL', message: 'Something went wrong on our side; it has been logged.' },
  };
  if (err instanceof HttpError) {
    status = err.status;
    body = {
      error: {
        code: err.code,
        message: err.message,
        ...(err.fields ? { fields: err.fields } : {}),
      },
    };
    for (const [name, value] of Object.entries(err.headers ?? {})) res.setHeader(name, value);
  } else if (isBodyParserError(err)) {
    ({ status, body } = bodyParserAnswer(err));
  }
  if (status >= 500) req.log?.error({ err }, 'request failed');
  if (res.headersSent) return;
  res.status(status).json(body);
};

/** The JSON 404 that ends the API router. */
export const notFoundHandler: RequestHandler = (req, res) => {
  const body: ApiError = {
    error: { code: 'NOT_FOUND', message: `No API route ${req.method} ${req.originalUrl}.` },
  };
  res.status(404).json(body);
};
