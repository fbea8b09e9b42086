/** Parses a request part with a zod schema at the edge; a failure is a 400 naming every field. */
import type { z } from 'zod';
import { issuesFromZod } from '../../shared/scenario/index';
import { badRequest } from './http-error';

/**
 * Returns the parsed value or throws a 400 `VALIDATION_FAILED` with `fields[]`, each path under
 * `prefix` when given; an unknown field is reported at its own path, one entry per field, and a
 * problem with the whole body at `(body)`.
 */
export function parseOr400<S extends z.ZodType>(
  schema: S,
  value: unknown,
  prefix = '',
): z.output<S> {
  const result = schema.safeParse(value);
  if (result.success) return result.data;
  const fields = issuesFromZod(result.error.issues, prefix ? [prefix] : []).map((field) => ({
    path: field.path || '(body)',
    message: field.message,
  }));
  throw badRequest(
    `The request has ${fields.length} invalid field(s): ${fields.map((f) => f.path).join(', ')}.`,
    fields,
  );
}
