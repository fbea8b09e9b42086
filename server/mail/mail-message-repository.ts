/** The `mail_messages` table: mail the local SMTP server received, shown in the admin Outbox. */
import { desc } from 'drizzle-orm';
import type { Database } from '../db/database';
import { mailMessages } from '../db/schema';

/** A stored message. */
export type MailMessageRow = typeof mailMessages.$inferSelect;

/** Stores one received message. */
export async function insertMailMessage(
  db: Database,
  message: {
    fromAddress: string;
    toAddresses: string[];
    subject: string;
    textBody: string;
    htmlBody: string | null;
    raw: string;
  },
): Promise<void> {
  await db.insert(mailMessages).values({ ...message, toAddresses: message.toAddresses.join(', ') });
}

/** The newest `limit` messages, newest first. */
export async function listMailMessages(db: Database, limit: number): Promise<MailMessageRow[]> {
  return db.select().from(mailMessages).orderBy(desc(mailMessages.receivedAt)).limit(limit);
}
