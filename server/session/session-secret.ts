/**
 * The secret that signs session cookies. It must outlive a restart, or every restart signs
 * everybody out: SESSION_SECRET in production; elsewhere a random one kept beside the data folder.
 */
import { randomBytes } from 'node:crypto';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import type { Config } from '../config';

/** Thrown when production starts without SESSION_SECRET. */
export class MissingSessionSecretError extends Error {
  readonly code = 'MISSING_SESSION_SECRET';
  constructor() {
    super(
      'Set SESSION_SECRET to a random string of at least 32 characters (e.g. `openssl rand -hex 32`) before starting in production.',
    );
  }
}

/** Returns SESSION_SECRET, or (outside production) a random secret stored in `<dataDir>.session-secret`. */
export function resolveSessionSecret(config: Config): string {
  if (config.sessionSecret) return config.sessionSecret;
  if (config.env === 'production') throw new MissingSessionSecretError();
  if (config.databaseUrl) return randomBytes(32).toString('hex');
  const path = `${config.dataDir}.session-secret`;
  if (existsSync(path)) {
    const stored = readFileSync(path, 'utf8').trim();
    if (stored.length >= 32) return stored;
  }
  const secret = randomBytes(32).toString('hex');
  writeFileSync(path, secret, { mode: 0o600 });
  return secret;
}
