/** What the app's routers and services are given: no globals, everything passed in. */
import type { Logger } from 'pino';
import type { Config } from './config';
import type { Database } from './db/database';
import type { AuthSettings } from './auth/auth-settings';
import type { Mailer } from './mail/mailer';
import type { RunPool } from './runs/run-pool';

/** Dependencies shared by every router. Features add their services here. */
export interface AppContext {
  db: Database;
  dbKind: 'pglite' | 'postgres';
  config: Config;
  logger: Logger;
  version: string;
  /** Sessions, password hashing, reset links and rate limits. */
  auth: AuthSettings;
  /** Sends e-mail (password reset, class invitations). */
  mailer: Mailer;
  /**
   * Worker threads that run simulations (main.ts makes it and closes it on shutdown). When absent,
   * the runs feature makes one for this context on first use.
   */
  runPool?: RunPool;
}
