/**
 * Reads the `{error: {code, message, fields?}}` body of a failed API call. The schema is written
 * with `zod/mini` (13 kB) rather than importing the shared one built on full zod (450 kB), so the
 * first page stays small; the type annotation keeps it in step with the shared contract.
 */
import * as z from 'zod/mini';
import type { ApiError } from '../../../../shared/contracts/api-error';

const ApiErrorBodySchema: z.ZodMiniType<ApiError> = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    fields: z.optional(z.array(z.object({ path: z.string(), message: z.string() }))),
  }),
});

/** The API error in `body` (an `HttpErrorResponse.error`), or null if the body is not one. */
export function readApiError(body: unknown): ApiError | null {
  const parsed = ApiErrorBodySchema.safeParse(body);
  return parsed.success ? parsed.data : null;
}
