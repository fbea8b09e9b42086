/** Formats a number with `digits` significant digits (default 4) for event details and summaries. */
export function formatSignificant(value: number, digits = 4): string {
  if (!Number.isFinite(value)) return String(value);
  return Number(value.toPrecision(digits)).toString();
}
