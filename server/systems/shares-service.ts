/** Sharing a system with named users as viewer or editor (owner only). No HTTP objects here. */
import type { Share, ShareList, ShareRequest } from '../../shared/contracts/systems';
import type { SessionUser } from '../auth/session-user';
import { requireSystemAccess } from '../auth/system-access';
import type { Database } from '../db/database';
import { badRequest, HttpError, notFound } from '../http/http-error';
import {
  deleteShare,
  findUserByEmail,
  listShares,
  upsertShare,
  type ShareRow,
} from './systems-repository';

type User = Pick<SessionUser, 'id'>;

const toShare = (row: ShareRow): Share => ({
  userId: row.userId,
  email: row.email,
  name: row.name,
  access: row.access === 'editor' ? 'editor' : 'viewer',
  createdAt: row.createdAt.toISOString(),
});

/** `GET /api/systems/:id/shares`. */
export async function listSystemShares(
  db: Database,
  user: User,
  systemId: string,
): Promise<ShareList> {
  await requireSystemAccess(db, user, systemId, 'owner');
  return { items: (await listShares(db, systemId)).map(toShare) };
}

/** `POST /api/systems/:id/shares`: shares with the account of `email`, or changes its access. */
export async function shareSystem(
  db: Database,
  user: User,
  systemId: string,
  request: ShareRequest,
): Promise<Share> {
  const { system } = await requireSystemAccess(db, user, systemId, 'owner');
  const target = await findUserByEmail(db, request.email);
  if (!target) {
    throw new HttpError(
      404,
      'USER_NOT_FOUND',
      'No Tidewright account uses that e-mail address; ask them to register first.',
      [{ path: 'email', message: 'No account uses this address.' }],
    );
  }
  if (target.id === system.ownerId) {
    throw badRequest('You own this system already; share it with someone else.', [
      { path: 'email', message: 'This is the owner of the system.' },
    ]);
  }
  await upsertShare(db, system.id, target.id, request.access);
  const row = (await listShares(db, system.id)).find((share) => share.userId === target.id);
  if (!row) throw new Error('A share just written was not found.');
  return toShare(row);
}

/** `DELETE /api/systems/:id/shares/:userId`. */
export async function unshareSystem(
  db: Database,
  user: User,
  systemId: string,
  userId: string,
): Promise<void> {
  const { system } = await requireSystemAccess(db, user, systemId, 'owner');
  const uuid = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
  if (!uuid.test(userId) || !(await deleteShare(db, system.id, userId)))
    throw notFound('That share');
}
