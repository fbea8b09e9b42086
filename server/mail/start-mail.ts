/** Chooses how the app sends mail at start: SMTP_URL, or the local outbox server outside production. */
import type { Logger } from 'pino';
import type { Config } from '../config';
import type { Database } from '../db/database';
import { startLocalSmtpServer } from './local-smtp-server';
import { createLocalMailer, createSmtpMailer, type Mailer } from './mailer';

/** The mailer and how to stop it (and the local server, if one was started). */
export interface MailSetup {
  mailer: Mailer;
  close(): Promise<void>;
}

/**
 * With SMTP_URL set, mail goes to that server. Otherwise, in development, test and demo runs
 * (outside production, or with TIDEWRIGHT_DEMO=1), a local SMTP server on 127.0.0.1:SMTP_PORT
 * stores mail for the admin Outbox. In production without SMTP_URL, mail cannot be sent: each
 * attempt fails and is logged, and password reset tells nobody.
 */
export async function startMail(
  config: Config,
  db: Database,
  from: string,
  logger: Logger,
): Promise<MailSetup> {
  if (config.smtpUrl) {
    const mailer = createSmtpMailer(config.smtpUrl, from);
    return { mailer, close: async () => mailer.close() };
  }
  if (!config.seedDemo) {
    logger.warn('SMTP_URL is not set: password reset e-mails cannot be sent.');
    const mailer: Mailer = {
      send: () => Promise.reject(new Error('No mail server: set SMTP_URL to an SMTP server URL.')),
      close: () => undefined,
    };
    return { mailer, close: async () => undefined };
  }
  const server = await startLocalSmtpServer(db, config.smtpPort, (wanted, used) =>
    logger.warn(`SMTP port ${wanted} is taken; the local outbox listens on ${used} instead.`),
  );
  logger.info(
    `Local outbox SMTP server on 127.0.0.1:${server.port}; read mail under Admin → Outbox.`,
  );
  const mailer = createLocalMailer(server.port, from);
  return {
    mailer,
    close: async () => {
      mailer.close();
      await server.close();
    },
  };
}
