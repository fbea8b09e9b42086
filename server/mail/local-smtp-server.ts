/**
 * A real SMTP server on loopback for development, test and demo runs: every message it receives
 * goes into `mail_messages`, which the admin Outbox lists. It accepts plain SMTP without
 * authentication, so it never listens beyond 127.0.0.1.
 */
import type { AddressInfo } from 'node:net';
import { SMTPServer } from 'smtp-server';
import type { Database } from '../db/database';
import { insertMailMessage } from './mail-message-repository';
import { parseMailMessage } from './parse-mail-message';

/** Largest message accepted. */
const MAX_MESSAGE_BYTES = 2 * 1024 * 1024;

/** A running local SMTP server. */
export interface LocalSmtpServer {
  /** The port it listens on (useful after asking for port 0). */
  port: number;
  close(): Promise<void>;
}

function createServer(db: Database): SMTPServer {
  return new SMTPServer({
    name: 'tidewright-outbox',
    banner: 'Tidewright local outbox',
    authOptional: true,
    disabledCommands: ['AUTH', 'STARTTLS'],
    size: MAX_MESSAGE_BYTES,
    logger: false,
    closeTimeout: 1000,
    onConnect(session, callback) {
      const local = ['127.0.0.1', '::1', '::ffff:127.0.0.1'].includes(session.remoteAddress);
      callback(local ? null : new Error('The local outbox only accepts mail from this machine.'));
    },
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (chunk: Buffer) => chunks.push(chunk));
      stream.on('error', (error: Error) => callback(error));
      stream.on('end', () => {
        if (stream.sizeExceeded)
          return callback(Object.assign(new Error('Message too large'), { responseCode: 552 }));
        const raw = Buffer.concat(chunks).toString('utf8');
        const parsed = parseMailMessage(raw);
        const from = session.envelope.mailFrom ? session.envelope.mailFrom.address : '';
        insertMailMessage(db, {
          fromAddress: from,
          toAddresses: session.envelope.rcptTo.map((rcpt) => rcpt.address),
          subject: parsed.subject,
          textBody: parsed.text,
          htmlBody: parsed.html,
          raw,
        }).then(
          () => callback(null, 'Stored in the Tidewright outbox'),
          (error: unknown) => callback(error instanceof Error ? error : new Error(String(error))),
        );
      });
    },
  });
}

function listen(server: SMTPServer, port: number): Promise<number> {
  return new Promise((resolve, reject) => {
    // smtp-server re-emits the listening socket's errors on itself.
    const onError = (error: Error): void => reject(error);
    server.once('error', onError);
    server.listen(port, '127.0.0.1', () => {
      server.off('error', onError);
      resolve((server.server.address() as AddressInfo).port);
    });
  });
}

/**
 * Starts the outbox SMTP server on 127.0.0.1:`port` (0 picks a free port). When `port` is taken,
 * e.g. by another Tidewright instance, it falls back to a free port and says so through `onFallback`.
 */
export async function startLocalSmtpServer(
  db: Database,
  port: number,
  onFallback?: (wantedPort: number, usedPort: number) => void,
): Promise<LocalSmtpServer> {
  let server = createServer(db);
  let boundPort: number;
  try {
    boundPort = await listen(server, port);
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code !== 'EADDRINUSE' || port === 0) throw error;
    server = createServer(db);
    boundPort = await listen(server, 0);
    onFallback?.(port, boundPort);
  }
  server.on('error', () => undefined);
  const running = server;
  return { port: boundPort, close: () => new Promise((resolve) => running.close(() => resolve())) };
}
