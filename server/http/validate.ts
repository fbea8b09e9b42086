/** Parses a request part with a zod schema at the edge; a failure is a 400 naming every field. */
import type { z } from 'zod';
import { formatIssuePath } from '../../shared/contracts/api-error';
import { badRequest } from './http-error';

/** Returns the parsed value or throws a 400 `VALIDATION_FAILED` with `fields[]`. */
export function parseOr400<S extends z.ZodType>(
  schema: S,
  value: unknown,
  prefix = '',
): z.output<S> {
  const result = schema.safeParse(value);
  if (result.success) return result.data;
  const fields = result.error.issues.map((issue) => ({
    path: formatIssuePath([...(prefix ? [prefix] : []), ...issue.path]) || '(body)',
    message: issue.message,
  }));
  throw badRequest(
    `The request has ${fields.length} invalid field(s): ${fields.map((f) => f.path).join(', ')}.`,
    fields,
  );
}
