/** Drizzle queries for systems and their shares. No HTTP, no rules: the service decides. */
import { and, desc, eq, or, sql } from 'drizzle-orm';
import type { Database } from '../db/database';
import { systems, systemShares, users } from '../db/schema';

/** A row of `systems`. */
export type SystemRow = typeof systems.$inferSelect;

/** A systems-table row: the system, its owner's name and the share access of the asking user. */
export interface SystemListRow {
  system: SystemRow;
  ownerName: string;
  shareAccess: string | null;
}

/** Systems the user owns or that are shared with them, most recently updated first. */
export async function listSystemsForUser(db: Database, userId: string): Promise<SystemListRow[]> {
  return db
    .select({ system: systems, ownerName: users.name, shareAccess: systemShares.access })
    .from(systems)
    .innerJoin(users, eq(users.id, systems.ownerId))
    .leftJoin(
      systemShares,
      and(eq(systemShares.systemId, systems.id), eq(systemShares.userId, userId)),
    )
    .where(or(eq(systems.ownerId, userId), eq(systemShares.userId, userId)))
    .orderBy(desc(systems.updatedAt), desc(systems.id));
}

/** Inserts a system at version 1. */
export async function insertSystem(
  db: Database,
  values: { ownerId: string; name: string; scenario: unknown; calibration?: unknown },
): Promise<SystemRow> {
  const [row] = await db
    .insert(systems)
    .values({
      ownerId: values.ownerId,
      name: values.name,
      scenario: values.scenario,
      calibration: values.calibration ?? null,
    })
    .returning();
  if (!row) throw new Error('Inserting a system returned no row.');
  return row;
}

/**
 * Saves name and scenario only if the stored version is `expectedVersion`, bumping the version.
 * Returns the new row, or undefined when the version did not match (or the row is gone).
 */
export async function updateSystemIfVersion(
  db: Database,
  id: string,
  expectedVersion: number,
  values: { name: string; scenario: unknown },
): Promise<SystemRow | undefined> {
  const [row] = await db
    .update(systems)
    .set({
      name: values.name,
      scenario: values.scenario,
      version: sql`${systems.version} + 1`,
      updatedAt: sql`now()`,
    })
    .where(and(eq(systems.id, id), eq(systems.version, expectedVersion)))
    .returning();
  return row;
}

/** Deletes a system (its shares and runs go with it). */
export async function deleteSystemRow(db: Database, id: string): Promise<void> {
  await db.delete(systems).where(eq(systems.id, id));
}

/** The stored `last_verdict` of a system. */
export async function setLastVerdict(
  db: Database,
  systemId: string,
  verdict: string | null,
): Promise<void> {
  await db.update(systems).set({ lastVerdict: verdict }).where(eq(systems.id, systemId));
}

/** A user's display name, or '' when the user is gone. */
export async function findUserName(db: Database, userId: string): Promise<string> {
  const [row] = await db.select({ name: users.name }).from(users).where(eq(users.id, userId));
  return row?.name ?? '';
}

/** A user found by e-mail, matched without case. */
export async function findUserByEmail(
  db: Database,
  email: string,
): Promise<{ id: string; email: string; name: string } | undefined> {
  const [row] = await db
    .select({ id: users.id, email: users.email, name: users.name })
    .from(users)
    .where(eq(sql`lower(${users.email})`, email.toLowerCase()));
  return row;
}

/** The id of a system owned by `ownerId` with exactly this name, if any. */
export async function findOwnedSystemByName(
  db: Database,
  ownerId: string,
  name: string,
): Promise<string | undefined> {
  const [row] = await db
    .select({ id: systems.id })
    .from(systems)
    .where(and(eq(systems.ownerId, ownerId), eq(systems.name, name)));
  return row?.id;
}

/** A share with the shared-with user's e-mail and name. */
export interface ShareRow {
  userId: string;
  email: string;
  name: string;
  access: string;
  createdAt: Date;
}

/** The shares of a system, in the order they were made. */
export async function listShares(db: Database, systemId: string): Promise<ShareRow[]> {
  return db
    .select({
      userId: systemShares.userId,
      email: users.email,
      name: users.name,
      access: systemShares.access,
      createdAt: systemShares.createdAt,
    })
    .from(systemShares)
    .innerJoin(users, eq(users.id, systemShares.userId))
    .where(eq(systemShares.systemId, systemId))
    .orderBy(systemShares.createdAt, users.email);
}

/** Shares a system with a user, or changes the access of an existing share. */
export async function upsertShare(
  db: Database,
  systemId: string,
  userId: string,
  access: string,
): Promise<void> {
  await db
    .insert(systemShares)
    .values({ systemId, userId, access })
    .onConflictDoUpdate({ target: [systemShares.systemId, systemShares.userId], set: { access } });
}

/** Removes a share; returns whether one existed. */
export async function deleteShare(
  db: Database,
  systemId: string,
  userId: string,
): Promise<boolean> {
  const deleted = await db
    .delete(systemShares)
    .where(and(eq(systemShares.systemId, systemId), eq(systemShares.userId, userId)))
    .returning({ userId: systemShares.userId });
  return deleted.length > 0;
}
