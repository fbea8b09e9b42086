/**
 * Rate limits for the endpoints anyone can call (express-rate-limit, in-memory per process):
 * per client IP and per e-mail address. Over the limit: 429 `RATE_LIMITED` with Retry-After.
 */
import type { Request, RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import { HttpError } from './http-error';

/** One limiter: `limit` requests (or failed requests) per `windowMs`. */
export interface LimiterOptions {
  /** Names the limit in the 429 message, e.g. "sign-in attempts". */
  what: string;
  limit: number;
  windowMs: number;
  /** Count only requests that failed (status >= 400). */
  onlyFailures?: boolean;
  /** Key by the `email` field of the JSON body instead of the client IP. */
  byAccount?: boolean;
}

function clientIp(req: Request): string {
  return ipKeyGenerator(req.ip ?? req.socket.remoteAddress ?? 'unknown');
}

/** The lower-cased `email` of a JSON body, falling back to the client IP when there is none. */
function accountKey(req: Request): string {
  const body: unknown = req.body;
  if (body && typeof body === 'object' && 'email' in body && typeof body.email === 'string') {
    return `account:${body.email.trim().toLowerCase().slice(0, 254)}`;
  }
  return `ip:${clientIp(req)}`;
}

/** A limiter middleware; over the limit it passes a 429 HttpError (Retry-After already set). */
export function limiter(options: LimiterOptions): RequestHandler {
  return rateLimit({
    windowMs: options.windowMs,
    limit: options.limit,
    standardHeaders: 'draft-7',
    legacyHeaders: false,
    skipSuccessfulRequests: options.onlyFailures ?? false,
    keyGenerator: options.byAccount ? accountKey : clientIp,
    handler: (_req, res, next) => {
      const retryAfterS = res.getHeader('Retry-After');
      next(
        new HttpError(
          429,
          'RATE_LIMITED',
          `Too many ${options.what}. Try again in ${String(retryAfterS ?? 'a few')} seconds.`,
        ),
      );
    },
  });
}
