/** `/api/admin/*`: user management and the local mail outbox (admin role only). */
import { z } from 'zod';
import { UserRoleSchema, UserSchema } from './auth';

/** A user as administrators see them. */
export const AdminUserSchema = UserSchema.extend({
  disabled: z.boolean(),
  createdAt: z.string(),
});
/** A user in the admin table. */
export type AdminUser = z.infer<typeof AdminUserSchema>;

/** `GET /api/admin/users`: every user, by e-mail address. */
export const AdminUserListSchema = z.object({ users: z.array(AdminUserSchema) });
/** The admin users table. */
export type AdminUserList = z.infer<typeof AdminUserListSchema>;

/** `PATCH /api/admin/users/:userId`: change a role or disable/enable an account. */
export const AdminUserPatchSchema = z
  .strictObject({
    role: UserRoleSchema.optional(),
    disabled: z.boolean().optional(),
  })
  .refine((value) => value.role !== undefined || value.disabled !== undefined, {
    message: 'Send `role`, `disabled` or both.',
  });
/** A change to a user. */
export type AdminUserPatch = z.infer<typeof AdminUserPatchSchema>;

/** `{user}` after a change. */
export const AdminUserResponseSchema = z.object({ user: AdminUserSchema });
/** One changed user. */
export type AdminUserResponse = z.infer<typeof AdminUserResponseSchema>;

/** A message the local SMTP server received. */
export const OutboxMessageSchema = z.object({
  id: z.string(),
  from: z.string(),
  to: z.array(z.string()),
  subject: z.string(),
  text: z.string(),
  receivedAt: z.string(),
});
/** One outbox message (plain text only: HTML bodies are never shown). */
export type OutboxMessage = z.infer<typeof OutboxMessageSchema>;

/** `GET /api/admin/outbox`: the newest messages first. */
export const OutboxListSchema = z.object({ messages: z.array(OutboxMessageSchema) });
/** The outbox. */
export type OutboxList = z.infer<typeof OutboxListSchema>;
