/**
 * CSRF protection by a signed double-submit token, in Angular HttpClient's own convention: the
 * server sets the readable `XSRF-TOKEN` cookie and every mutating request must echo it in
 * `X-XSRF-TOKEN`. A page on another site can neither read the cookie nor set the header.
 * The token carries an HMAC so a value planted in the cookie by a sibling domain is refused.
 */
import { createHmac, randomBytes, timingSafeEqual } from 'node:crypto';
import type { Request, RequestHandler } from 'express';
import { XSRF_COOKIE, XSRF_HEADER } from '../../shared/contracts/auth';
import { HttpError } from './http-error';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/** The value of one cookie from the Cookie header, or undefined. */
export function readCookie(req: Request, name: string): string | undefined {
  const header = req.headers.cookie;
  if (!header) return undefined;
  for (const part of header.split(';')) {
    const eq = part.indexOf('=');
    if (eq < 0 || part.slice(0, eq).trim() !== name) continue;
    try {
      return decodeURIComponent(part.slice(eq + 1).trim());
    } catch {
      return undefined;
    }
  }
  return undefined;
}

function sameText(a: string, b: string): boolean {
  const left = Buffer.from(a);
  const right = Buffer.from(b);
  return left.length === right.length && timingSafeEqual(left, right);
}

/** Issues and checks CSRF tokens signed with a key derived from `secret`. */
export function csrfProtection(secret: string): RequestHandler {
  const key = createHmac('sha256', secret).update('tidewright csrf token').digest();
  const sign = (nonce: string): string =>
    createHmac('sha256', key).update(nonce).digest('base64url');
  const isGenuine = (token: string | undefined): token is string => {
    const [nonce, mac, extra] = (token ?? '').split('.');
    return !!nonce && !!mac && extra === undefined && sameText(mac, sign(nonce));
  };
  return (req, res, next) => {
    const token = readCookie(req, XSRF_COOKIE);
    const genuine = isGenuine(token);
    if (!genuine) {
      const nonce = randomBytes(24).toString('base64url');
      res.cookie(XSRF_COOKIE, `${nonce}.${sign(nonce)}`, {
        sameSite: 'lax',
        secure: req.secure,
        path: '/',
      });
    }
    if (SAFE_METHODS.has(req.method)) return next();
    const echoed = req.get(XSRF_HEADER);
    if (!genuine || !echoed || !sameText(echoed, token)) {
      throw new HttpError(
        403,
        'CSRF_FAILED',
        'This request lacks its security token (the XSRF-TOKEN cookie echoed in X-XSRF-TOKEN). Reload the page and try again.',
      );
    }
    next();
  };
}
