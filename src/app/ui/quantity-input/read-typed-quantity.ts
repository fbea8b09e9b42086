import { type Dimension, fromDisplay, parseQuantity } from '../../../../shared/scenario';

/** What a typed text means: an SI value (null for an empty field), or why it cannot be read. */
export type TypedQuantity =
  { success: true; valueSi: number | null } | { success: false; message: string };

const PLAIN_NUMBER = /^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i;

/**
 * Reads what someone typed into a quantity field: an empty text is no value; a bare number is in
 * the field's display unit `unit` (a mathjs unit: "mm", "in", "h"...); a number with a unit ("1 in",
 * "300 L/h") is read by the scenario's unit parser and must have the field's dimension.
 */
export function readTypedQuantity(text: string, dimension: Dimension, unit: string): TypedQuantity {
  const trimmed = text.trim().replace(',', '.');
  if (trimmed === '') return { success: true, valueSi: null };
  if (PLAIN_NUMBER.test(trimmed)) {
    return { success: true, valueSi: fromDisplay(Number(trimmed), unit, dimension) };
  }
  const parsed = parseQuantity(trimmed, dimension, '');
  return parsed.success
    ? { success: true, valueSi: parsed.value }
    : { success: false, message: parsed.issue.message };
}
