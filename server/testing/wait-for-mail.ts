/** Test support: wait until the local SMTP server has stored a message for an address. */
import { desc, like } from 'drizzle-orm';
import type { Database } from '../db/database';
import { mailMessages } from '../db/schema';
import type { MailMessageRow } from '../mail/mail-message-repository';

/** Polls `mail_messages` for the newest message to `to` (every 25 ms, up to `timeoutMs`). */
export async function waitForMail(
  db: Database,
  to: string,
  timeoutMs = 5_000,
): Promise<MailMessageRow> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const [row] = await db
      .select()
      .from(mailMessages)
      .where(like(mailMessages.toAddresses, `%${to}%`))
      .orderBy(desc(mailMessages.receivedAt))
      .limit(1);
    if (row) return row;
    if (Date.now() > deadline) throw new Error(`No mail to ${to} arrived within ${timeoutMs} ms.`);
    await new Promise((resolve) => setTimeout(resolve, 25));
  }
}
