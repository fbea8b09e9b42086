/**
 * The signed-in person as the session endpoints describe them. Written with `zod/mini` to keep
 * full zod out of the first page the app loads.
 */
import * as z from 'zod/mini';

/** The three roles, from the one who can do most to the one who can do least. */
export const UserRoleSchema = z.enum(['admin', 'instructor', 'member']);
/** A role: `admin`, `instructor` or `member`. */
export type UserRole = z.infer<typeof UserRoleSchema>;

/** The signed-in user: identity, role and preferred unit system (`metric` or US customary). */
export const AuthUserSchema = z.object({
  id: z.string(),
  name: z.string(),
  email: z.string(),
  role: UserRoleSchema,
  units: z.enum(['metric', 'us']),
});
/** The signed-in user. */
export type AuthUser = z.infer<typeof AuthUserSchema>;

const WrappedUserSchema = z.object({ user: AuthUserSchema });

/**
 * Reads a `GET /api/auth/me` or `POST /api/auth/login` body, which is either the user itself or
 * `{user}`; anything else is a server bug and throws with the zod issues in the message.
 */
export function parseAuthUser(body: unknown): AuthUser {
  const wrapped = WrappedUserSchema.safeParse(body);
  if (wrapped.success) return wrapped.data.user;
  return AuthUserSchema.parse(body);
}
