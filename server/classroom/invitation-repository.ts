/** Reads and writes `class_invitations`; tokens are stored only as their SHA-256 hash. */
import { and, desc, eq, isNull } from 'drizzle-orm';
import type { Database } from '../db/database';
import { classInvitations } from '../db/schema';

/** A row of `class_invitations`. */
export type InvitationRow = typeof classInvitations.$inferSelect;

/**
 * Stores a fresh invitation for `email` to a class, first deleting that address's unaccepted
 * invitations to the same class (so only the newest link works).
 */
export async function replaceInvitation(
  db: Database,
  values: { classId: string; email: string; tokenHash: string; expiresAt: Date },
): Promise<InvitationRow> {
  return db.transaction(async (tx) => {
    await tx
      .delete(classInvitations)
      .where(
        and(
          eq(classInvitations.classId, values.classId),
          eq(classInvitations.email, values.email),
          isNull(classInvitations.acceptedAt),
        ),
      );
    const [row] = await tx.insert(classInvitations).values(values).returning();
    if (!row) throw new Error('Inserting an invitation returned no row.');
    return row;
  });
}

/** The invitation whose token hashes to `tokenHash`, if any. */
export async function findInvitationByTokenHash(
  db: Database,
  tokenHash: string,
): Promise<InvitationRow | undefined> {
  const [row] = await db
    .select()
    .from(classInvitations)
    .where(eq(classInvitations.tokenHash, tokenHash));
  return row;
}

/** The class's invitations not yet accepted, newest first. */
export async function listOpenInvitations(db: Database, classId: string): Promise<InvitationRow[]> {
  return db
    .select()
    .from(classInvitations)
    .where(and(eq(classInvitations.classId, classId), isNull(classInvitations.acceptedAt)))
    .orderBy(desc(classInvitations.createdAt));
}

/** Marks an invitation accepted by `userId`. */
export async function markAccepted(
  db: Database,
  invitationId: string,
  userId: string,
  at: Date,
): Promise<void> {
  await db
    .update(classInvitations)
    .set({ acceptedAt: at, acceptedBy: userId })
    .where(eq(classInvitations.id, invitationId));
}

/** Deletes one invitation of a class; returns whether it existed. */
export async function deleteInvitation(
  db: Database,
  classId: string,
  invitationId: string,
): Promise<boolean> {
  const removed = await db
    .delete(classInvitations)
    .where(and(eq(classInvitations.classId, classId), eq(classInvitations.id, invitationId)))
    .returning({ id: classInvitations.id });
  return removed.length > 0;
}
