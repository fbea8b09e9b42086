/** User management for administrators: list users, change roles, disable and enable accounts. */
import { asc, eq } from 'drizzle-orm';
import type { AdminUser, AdminUserPatch } from '../../shared/contracts/admin';
import type { AppContext } from '../app-context';
import type { SessionUser } from '../auth/session-user';
import { findUserById, toUser, type UserRow } from '../auth/user-repository';
import { users } from '../db/schema';
import { conflict, notFound } from '../http/http-error';
import { destroyUserSessions } from '../session/drizzle-session-store';

const UUID_PATTERN = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** A user row as the admin table shows it. */
export function toAdminUser(row: UserRow): AdminUser {
  return { ...toUser(row), disabled: row.disabled, createdAt: row.createdAt.toISOString() };
}

/** Every user, ordered by e-mail address. */
export async function listUsers(ctx: AppContext): Promise<AdminUser[]> {
  const rows = await ctx.db.select().from(users).orderBy(asc(users.email));
  return rows.map(toAdminUser);
}

/**
 * Changes a user's role or disabled flag. An administrator cannot demote or disable themselves
 * (so there is always an administrator left). Disabling signs the user out everywhere.
 */
export async function patchUser(
  ctx: AppContext,
  actor: SessionUser,
  userId: string,
  patch: AdminUserPatch,
): Promise<AdminUser> {
  const target = UUID_PATTERN.test(userId) ? await findUserById(ctx.db, userId) : undefined;
  if (!target) throw notFound('That user');
  if (
    target.id === actor.id &&
    ((patch.role !== undefined && patch.role !== 'admin') || patch.disabled === true)
  ) {
    throw conflict(
      'You cannot remove your own admin role or disable yourself; ask another administrator.',
      'CANNOT_CHANGE_SELF',
    );
  }
  const [row] = await ctx.db
    .update(users)
    .set({ ...patch, updatedAt: new Date() })
    .where(eq(users.id, target.id))
    .returning();
  if (!row) throw notFound('That user');
  if (patch.disabled === true) await destroyUserSessions(ctx.db, row.id);
  return toAdminUser(row);
}
