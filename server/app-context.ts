/** What the app's routers and services are given: no globals, everything passed in. */
import type { Logger } from 'pino';
import type { Config } from './config';
import type { Database } from './db/database';

/** Dependencies shared by every router. Features add their services here. */
export interface AppContext {
  db: Database;
  dbKind: 'pglite' | 'postgres';
  config: Config;
  logger: Logger;
  version: string;
}
