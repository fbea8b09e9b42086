/** The one shape of every API error body. */
import { z } from 'zod';

/** A problem with one field of a request, named by its path (e.g. `scenario.vessels[0].height`). */
export const FieldErrorSchema = z.object({ path: z.string(), message: z.string() });
/** A problem with one field of a request. */
export type FieldError = z.infer<typeof FieldErrorSchema>;

/** `{error: {code, message, fields?}}`. */
export const ApiErrorSchema = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    fields: z.array(FieldErrorSchema).optional(),
  }),
});
/** The body of every 4xx/5xx response. */
export type ApiError = z.infer<typeof ApiErrorSchema>;

/** Turns a zod issue path into the `a.b[0].c` form the API and the forms show. */
export function formatIssuePath(path: readonly PropertyKey[]): string {
  let out = '';
  for (const key of path) {
    if (typeof key === 'number') out += `[${key}]`;
    else out += out ? `.${String(key)}` : String(key);
  }
  return out;
}
