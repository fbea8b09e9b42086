/** The knobs of sign-in, sessions and password reset, with production defaults. */
import type { Config } from '../config';

/** Limits on the unauthenticated endpoints, per client IP and per e-mail address. */
export interface AuthRateLimits {
  /** Length of every limiter's window. */
  windowMs: number;
  /** Failed sign-ins per IP per window. */
  loginFailuresPerIp: number;
  /** Failed sign-ins per e-mail address per window (known or not, so the limit reveals nothing). */
  loginFailuresPerAccount: number;
  /** Registrations per IP per window. */
  registrationsPerIp: number;
  /** Password-reset requests and confirmations per IP per window. */
  resetsPerIp: number;
  /** Password-reset requests per e-mail address per window. */
  resetsPerAccount: number;
}

/** Sign-in and session settings; tests shorten the clock and lower the bcrypt cost. */
export interface AuthSettings {
  /** Signs the session cookie and the CSRF token. */
  sessionSecret: string;
  /** bcrypt cost factor for new hashes (12 ≈ 0.23 s per hash on the reference machine). */
  bcryptCost: number;
  /** A session unused this long is signed out. */
  idleTimeoutMs: number;
  /** A session this old is signed out however active it is. */
  absoluteTimeoutMs: number;
  /** A password reset link works this long, once. */
  resetTokenTtlMs: number;
  /** Origin of the links in e-mails, e.g. `https://tidewright.example.org` (never the request's Host). */
  publicUrl: string;
  /** Sender of the e-mails. */
  mailFrom: string;
  /** Rate limits. */
  limits: AuthRateLimits;
  /** Milliseconds since the epoch; replaced in tests. */
  now: () => number;
}

const MINUTE_MS = 60_000;
const HOUR_MS = 60 * MINUTE_MS;

/** The production limits: generous for people, tight for scripts guessing passwords. */
export const DEFAULT_AUTH_LIMITS: AuthRateLimits = {
  windowMs: 15 * MINUTE_MS,
  loginFailuresPerIp: 50,
  loginFailuresPerAccount: 10,
  registrationsPerIp: 20,
  resetsPerIp: 20,
  resetsPerAccount: 5,
};

/** Settings from the server config and the resolved session secret. */
export function authSettingsFromConfig(config: Config, sessionSecret: string): AuthSettings {
  const publicUrl = (config.publicUrl ?? `http://localhost:${config.port}`).replace(/\/+$/, '');
  return {
    sessionSecret,
    bcryptCost: 12,
    idleTimeoutMs: 4 * HOUR_MS,
    absoluteTimeoutMs: 7 * 24 * HOUR_MS,
    resetTokenTtlMs: HOUR_MS,
    publicUrl,
    mailFrom: `Tidewright <no-reply@${new URL(publicUrl).hostname}>`,
    limits: DEFAULT_AUTH_LIMITS,
    now: () => Date.now(),
  };
}
