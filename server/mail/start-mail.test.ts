import { createServer, type AddressInfo, type Server } from 'node:net';
import { pino } from 'pino';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { loadConfig } from '../config';
import { mailMessages } from '../db/schema';
import { createTestContext, type TestContext } from '../testing/test-context';
import { waitForMail } from '../testing/wait-for-mail';
import { startMail } from './start-mail';

const silent = pino({ level: 'silent' });

describe('startMail', () => {
  let t: TestContext;
  beforeEach(async () => {
    t = await createTestContext();
  });
  afterEach(async () => {
    await t.close();
  });

  it('starts the local outbox in a production demo run (TIDEWRIGHT_DEMO=1) without SMTP_URL', async () => {
    const config = loadConfig({ NODE_ENV: 'production', TIDEWRIGHT_DEMO: '1', SMTP_PORT: '0' });
    const mail = await startMail(config, t.ctx.db, 'Tidewright <no-reply@demo.test>', silent);
    try {
      await mail.mailer.send({ to: 'visitor@example.test', subject: 'Demo', text: 'Hello' });
      expect((await waitForMail(t.ctx.db, 'visitor@example.test')).subject).toBe('Demo');
    } finally {
      await mail.close();
    }
  });

  it('sends nothing in production without SMTP_URL, and says how to fix it', async () => {
    const config = loadConfig({ NODE_ENV: 'production', SMTP_PORT: '0' });
    const mail = await startMail(config, t.ctx.db, 'Tidewright <no-reply@prod.test>', silent);
    await expect(
      mail.mailer.send({ to: 'a@example.test', subject: 'x', text: 'y' }),
    ).rejects.toThrow(/SMTP_URL/);
    expect(await t.ctx.db.select().from(mailMessages)).toHaveLength(0);
    await mail.close();
  });

  it('falls back to a free port when SMTP_PORT is taken', async () => {
    const taken = await new Promise<Server>((resolve) => {
      const server = createServer().listen(0, '127.0.0.1', () => resolve(server));
    });
    const takenPort = (taken.address() as AddressInfo).port;
    const notes: string[] = [];
    const logger = pino({ level: 'warn' }, { write: (line: string) => void notes.push(line) });
    const mail = await startMail(
      loadConfig({ SMTP_PORT: String(takenPort) }),
      t.ctx.db,
      'b <b@localhost>',
      logger,
    );
    try {
      expect(notes.join('')).toContain(`SMTP port ${takenPort} is taken`);
      await mail.mailer.send({
        to: 'fallback@example.test',
        subject: 'Fallback',
        text: 'still delivered',
      });
      expect((await waitForMail(t.ctx.db, 'fallback@example.test')).textBody).toBe(
        'still delivered',
      );
    } finally {
      await mail.close();
      taken.close();
    }
  });
});
