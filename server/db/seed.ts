/**
 * The demo seed: our own invented scenario (a community-garden greenhouse and a classroom
 * tabletop unit) with three demo accounts. Idempotent: running it twice adds nothing.
 */
import bcrypt from 'bcryptjs';
import { eq, sql } from 'drizzle-orm';
import type { Database } from './database';
import { users } from './schema';

/** The password of every demo account (README lists them). */
export const DEMO_PASSWORD = 'tidewright-demo';

/** The demo accounts: one per role. */
export const DEMO_ACCOUNTS = [
  { email: 'admin@tidewright.test', name: 'Ada Admin', role: 'admin' },
  { email: 'teacher@tidewright.test', name: 'Theo Teacher', role: 'instructor' },
  { email: 'demo@tidewright.test', name: 'Dana Demo', role: 'member' },
] as const;

/** Extra seeding steps features register (demo systems, lessons); each must be idempotent. */
export type SeedStep = (db: Database, userIds: Record<string, string>) => Promise<void>;

/** Creates the demo accounts (if absent) and runs the feature steps. Returns the account ids. */
export async function seedDemo(
  db: Database,
  steps: SeedStep[] = [],
): Promise<Record<string, string>> {
  const passwordHash = await bcrypt.hash(DEMO_PASSWORD, 12);
  const ids: Record<string, string> = {};
  for (const account of DEMO_ACCOUNTS) {
    await db
      .insert(users)
      .values({ email: account.email, name: account.name, role: account.role, passwordHash })
      .onConflictDoNothing();
    const [row] = await db
      .select({ id: users.id })
      .from(users)
      .where(eq(sql`lower(${users.email})`, account.email));
    if (row) ids[account.email] = row.id;
  }
  for (const step of steps) await step(db, ids);
  return ids;
}
