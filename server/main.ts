/** Starts Tidewright: settings, database (migrated, demo seeded when new), then listen. */
import { pino } from 'pino';
import { createApp } from './app';
import { loadConfig } from './config';
import { openDatabase } from './db/database';
import { seedDemo } from './db/seed';
import { demoSeedSteps } from './db/demo-seed-steps';
import { readVersion } from './version';

async function main(): Promise<void> {
  const config = loadConfig();
  const logger = pino({ level: config.logLevel });
  const database = await openDatabase(
    config.databaseUrl ? { kind: 'postgres', url: config.databaseUrl } : { kind: 'pglite', dataDir: config.dataDir },
  );
  if (database.isNew && config.seedDemo) {
    await seedDemo(database.db, demoSeedSteps);
    logger.info('demo data seeded');
  }
  const ctx = { db: database.db, dbKind: database.kind, config, logger, version: readVersion() };
  const app = createApp(ctx);
  const server = app.listen(config.port, config.host, () => {
    logger.info(`Tidewright listening on http://localhost:${config.port} (${database.kind})`);
  });
  let stopping = false;
  const stop = (signal: string): void => {
    if (stopping) return;
    stopping = true;
    logger.info(`${signal}: shutting down`);
    server.close();
    server.closeAllConnections();
    void database.close().finally(() => process.exit(0));
  };
  process.on('SIGTERM', () => stop('SIGTERM'));
  process.on('SIGINT', () => stop('SIGINT'));
}

main().catch((error: unknown) => {
  process.stderr.write(`Tidewright could not start: ${error instanceof Error ? error.message : String(error)}\n`);
  process.exit(1);
});
