/** `/api/admin/*`: users and the outbox, for the admin role only. */
import { Router } from 'express';
import {
  AdminUserPatchSchema,
  type AdminUserList,
  type AdminUserResponse,
  type OutboxList,
} from '../../shared/contracts/admin';
import type { AppContext } from '../app-context';
import { currentUser } from '../auth/session-user';
import { requireRole } from '../http/require-auth';
import { parseOr400 } from '../http/validate';
import { listMailMessages } from '../mail/mail-message-repository';
import { listUsers, patchUser } from './admin-users-service';

/** How many outbox messages the admin page shows. */
const OUTBOX_LIMIT = 200;

/** The admin routes; every one needs the admin role. */
export function adminRouter(ctx: AppContext): Router {
  const router = Router();
  const adminOnly = requireRole('admin');

  router.get('/admin/users', adminOnly, async (_req, res) => {
    res.json({ users: await listUsers(ctx) } satisfies AdminUserList);
  });

  router.patch('/admin/users/:userId', adminOnly, async (req, res) => {
    const patch = parseOr400(AdminUserPatchSchema, req.body);
    const user = await patchUser(ctx, currentUser(req), String(req.params['userId']), patch);
    res.json({ user } satisfies AdminUserResponse);
  });

  router.get('/admin/outbox', adminOnly, async (_req, res) => {
    const rows = await listMailMessages(ctx.db, OUTBOX_LIMIT);
    const body: OutboxList = {
      messages: rows.map((row) => ({
        id: row.id,
        from: row.fromAddress,
        to: row.toAddresses
          .split(',')
          .map((address) => address.trim())
          .filter(Boolean),
        subject: row.subject,
        text: row.textBody,
        receivedAt: row.receivedAt.toISOString(),
      })),
    };
    res.json(body);
  });

  return router;
}
