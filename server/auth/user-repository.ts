/** Reads and writes `users` rows; callers get the public `User` shape through `toUser`. */
import { eq, sql } from 'drizzle-orm';
import {
  UnitSystemSchema,
  UserRoleSchema,
  type User,
  type UserRole,
} from '../../shared/contracts/auth';
import type { Database } from '../db/database';
import { users } from '../db/schema';

/** A row of `users`, password hash included: never send it out. */
export type UserRow = typeof users.$inferSelect;

/** The public fields of a user row. */
export function toUser(row: UserRow): User {
  return {
    id: row.id,
    email: row.email,
    name: row.name,
    role: UserRoleSchema.parse(row.role),
    units: UnitSystemSchema.parse(row.units),
  };
}

/** The user with this id, if any. */
export async function findUserById(db: Database, id: string): Promise<UserRow | undefined> {
  const [row] = await db.select().from(users).where(eq(users.id, id));
  return row;
}

/** The user with this e-mail address, matched without case. */
export async function findUserByEmail(db: Database, email: string): Promise<UserRow | undefined> {
  const [row] = await db
    .select()
    .from(users)
    .where(eq(sql`lower(${users.email})`, email.trim().toLowerCase()));
  return row;
}

/** Inserts a user; returns undefined when the address is already taken. */
export async function insertUser(
  db: Database,
  values: { email: string; name: string; passwordHash: string; role?: UserRole },
): Promise<UserRow | undefined> {
  const [row] = await db
    .insert(users)
    .values({ ...values, email: values.email.toLowerCase() })
    .onConflictDoNothing()
    .returning();
  return row;
}

/** Replaces a user's password hash. */
export async function setPasswordHash(
  db: Database,
  userId: string,
  passwordHash: string,
): Promise<void> {
  await db.update(users).set({ passwordHash, updatedAt: new Date() }).where(eq(users.id, userId));
}
