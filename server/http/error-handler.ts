/** The one error handler: JSON `{error: {code, message, fields?}}`; 5xx details go to the log only. */
import type { ErrorRequestHandler, RequestHandler } from 'express';
import type { ApiError } from '../../shared/contracts/api-error';
import { HttpError } from './http-error';

interface BodyParserError extends Error {
  type?: string;
  status?: number;
  expose?: boolean;
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
  } else if (
    err instanceof Error &&
    typeof (err as BodyParserError).status === 'number' &&
    (err as BodyParserError).expose
  ) {
    const parserError = err as BodyParserError;
    status = parserError.status ?? 400;
    const code =
      parserError.type === 'entity.too.large'
        ? 'BODY_TOO_LARGE'
        : parserError.type === 'entity.parse.failed'
          ? 'INVALID_JSON'
          : 'BAD_REQUEST';
    const message =
      code === 'BODY_TOO_LARGE'
        ? 'The request body is larger than this endpoint accepts.'
        : code === 'INVALID_JSON'
          ? 'The request body is not valid JSON.'
          : parserError.message;
    body = { error: { code, message } };
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
