import { z } from 'zod';
import type { Dimension } from './dimension';
import { parseQuantity } from './parse-quantity';

/** Lower bound a dimensional field must respect once in SI. */
export type QuantityBound = 'any' | 'nonnegative' | 'positive';

/**
 * A zod schema for one dimensional field: accepts a number (SI) or a string with a unit, outputs
 * the SI number. zod attaches the field's path to any issue, so a wrong dimension names the field.
 */
export function quantitySchema(dimension: Dimension, bound: QuantityBound = 'positive') {
  const parsed = z.union([z.number(), z.string()]).transform((value, ctx) => {
    const result = parseQuantity(value, dimension, '');
    if (result.success) return result.value;
    ctx.addIssue({ code: 'custom', message: result.issue.message });
    return z.NEVER;
  });
  if (bound === 'positive')
    return parsed.pipe(z.number().positive({ error: 'Must be greater than zero.' }));
  if (bound === 'nonnegative')
    return parsed.pipe(z.number().nonnegative({ error: 'Must not be negative.' }));
  return parsed.pipe(z.number());
}
