/** Reads the `{error: {code, message, fields?}}` body of a failed API call. */
import { type ApiError, ApiErrorSchema } from '../../../../shared/contracts/api-error';

/** The API error in `body` (an `HttpErrorResponse.error`), or null if the body is not one. */
export function readApiError(body: unknown): ApiError | null {
  const parsed = ApiErrorSchema.safeParse(body);
  return parsed.success ? parsed.data : null;
}
