/** Reads the `{user}` answer of `GET /api/auth/me` and `POST /api/auth/login`. */
import { MeResponseSchema, type User } from '../../../../shared/contracts/auth';

/** The user in a `{user}` body; anything else is a server bug and throws with the zod issues. */
export function readMeResponse(body: unknown): User {
  return MeResponseSchema.parse(body).user;
}
