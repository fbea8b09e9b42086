/** Starts Tidewright: settings, database (migrated, demo seeded when new), then listen. */
import { pino } from 'pino';
import { createApp } from './app';
import { loadConfig } from './config';
import { openDatabase } from './db/database';
import { seedDemo } from './db/seed';
import { demoSeedSteps } from './db/demo-seed-steps';
import { readVersion } from './version';
import { authSettingsFromConfig } from './auth/auth-settings';
import { startMail } from './mail/start-mail';
import { DrizzleSessionStore } from './session/drizzle-session-store';
import { resolveSessionSecret } from './session/session-secret';
import { defaultRunPoolOptions, RunPool } from './runs/run-pool';
import { failInterruptedRuns } from './runs/runs-repository';
import { closeSweepQueue, startSweepWorkers } from './sweeps/sweep-queue';

/** Expired sessions are deleted this often. */
const SESSION_PRUNE_INTERVAL_MS = 15 * 60_000;

async function main(): Promise<void> {
  const config = loadConfig();
  const logger = pino({ level: config.logLevel });
  const database = await openDatabase(
    config.databaseUrl
      ? { kind: 'postgres', url: config.databaseUrl }
      : { kind: 'pglite', dataDir: config.dataDir },
  );
  if (database.isNew && config.seedDemo) {
    await seedDemo(database.db, demoSeedSteps);
    logger.info('demo data seeded');
  }
  const auth = authSettingsFromConfig(config, resolveSessionSecret(config));
  const mail = await startMail(config, database.db, auth.mailFrom, logger);
  const interrupted = await failInterruptedRuns(
    database.db,
    'The server stopped during this run; run it again.',
  );
  if (interrupted > 0)
    logger.warn(`${interrupted} run(s) left over from the last start were marked failed`);
  const runPool = new RunPool(defaultRunPoolOptions());
  const ctx = {
    db: database.db,
    dbKind: database.kind,
    config,
    logger,
    version: readVersion(),
    auth,
    mailer: mail.mailer,
    runPool,
  };
  // With PostgreSQL every server process takes shared sweep cells from the start.
  if (ctx.dbKind === 'postgres') await startSweepWorkers(ctx);
  const sessionStore = new DrizzleSessionStore(database.db);
  const pruneTimer = setInterval(() => {
    sessionStore
      .prune()
      .catch((error: unknown) => logger.warn({ err: error }, 'could not prune sessions'));
  }, SESSION_PRUNE_INTERVAL_MS);
  pruneTimer.unref();
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
    clearInterval(pruneTimer);
    void closeSweepQueue(ctx)
      .then(() => runPool.close())
      .then(() => mail.close())
      .catch(() => undefined)
      .then(() => database.close())
      .finally(() => process.exit(0));
  };
  process.on('SIGTERM', () => stop('SIGTERM'));
  process.on('SIGINT', () => stop('SIGINT'));
}

main().catch((error: unknown) => {
  process.stderr.write(
    `Tidewright could not start: ${error instanceof Error ? error.message : String(error)}\n`,
  );
  process.exit(1);
});
