/**
 * Reads the `{user}` answer of `GET /api/auth/me` and `POST /api/auth/login`. The schema is
 * written with `zod/mini` (13 kB) instead of importing the shared one built on full zod (450 kB),
 * so the first page stays small; its type annotation keeps it in step with the shared contract.
 */
import * as z from 'zod/mini';
import type { MeResponse, User } from '../../../../shared/contracts/auth';

const MeResponseBodySchema: z.ZodMiniType<MeResponse> = z.object({
  user: z.object({
    id: z.string(),
    email: z.string(),
    name: z.string(),
    role: z.enum(['admin', 'instructor', 'member']),
    units: z.enum(['metric', 'us']),
  }),
});

/** The user in a `{user}` body; anything else is a server bug and throws with the zod issues. */
export function readMeResponse(body: unknown): User {
  return MeResponseBodySchema.parse(body).user;
}
