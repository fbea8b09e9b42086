/**
 * Who may do what with a system. Systems are private to their owner; a share grants `viewer`
 * (read) or `editor` (read and write); only the owner deletes or re-shares. Administrators get
 * no special access to other people's systems.
 */
import { and, eq } from 'drizzle-orm';
import type { Database } from '../db/database';
import { systems, systemShares } from '../db/schema';
import { HttpError, notFound } from '../http/http-error';
import type { SessionUser } from './session-user';

/** What the caller needs: read it, change it (or run it), or act as its owner (delete, share). */
export type SystemAccessNeed = 'read' | 'write' | 'owner';
/** The caller's standing on a system. */
export type SystemAccessLevel = 'owner' | 'editor' | 'viewer';
/** A row of `systems`. */
export type SystemRow = typeof systems.$inferSelect;

/** A system the caller may use, with the caller's access level. */
export interface SystemAccess {
  system: SystemRow;
  access: SystemAccessLevel;
}

const UUID_PATTERN = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

const ALLOWED: Record<SystemAccessNeed, readonly SystemAccessLevel[]> = {
  read: ['owner', 'editor', 'viewer'],
  write: ['owner', 'editor'],
  owner: ['owner'],
};

/** The caller's access level on a system, or null when it does not exist or is not theirs to see. */
export async function findSystemAccess(
  db: Database,
  userId: string,
  systemId: string,
): Promise<SystemAccess | null> {
  if (!UUID_PATTERN.test(systemId)) return null;
  const [row] = await db
    .select({ system: systems, shareAccess: systemShares.access })
    .from(systems)
    .leftJoin(
      systemShares,
      and(eq(systemShares.systemId, systems.id), eq(systemShares.userId, userId)),
    )
    .where(eq(systems.id, systemId));
  if (!row) return null;
  if (row.system.ownerId === userId) return { system: row.system, access: 'owner' };
  if (row.shareAccess === 'editor' || row.shareAccess === 'viewer') {
    return { system: row.system, access: row.shareAccess };
  }
  return null;
}

/**
 * Loads a system for `user` needing `need`. Throws 404 `NOT_FOUND` when the system does not
 * exist, the id is malformed, or the user has no access at all (the two are not told apart), and
 * 403 `SYSTEM_READ_ONLY` / `NOT_SYSTEM_OWNER` when the user can see it but not do this.
 */
export async function requireSystemAccess(
  db: Database,
  user: Pick<SessionUser, 'id'>,
  systemId: string,
  need: SystemAccessNeed,
): Promise<SystemAccess> {
  const found = await findSystemAccess(db, user.id, systemId);
  if (!found) throw notFound('That system');
  if (!ALLOWED[need].includes(found.access)) {
    throw need === 'write'
      ? new HttpError(
          403,
          'SYSTEM_READ_ONLY',
          'This system is shared with you to view only; ask its owner for editor access or duplicate it.',
        )
      : new HttpError(403, 'NOT_SYSTEM_OWNER', 'Only the owner of this system can do that.');
  }
  return found;
}
