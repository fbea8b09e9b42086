/** The e-mail addresses typed into the invite box: split on commas, semicolons, spaces and new lines. */
export function splitAddresses(text: string): string[] {
  const parts = text
    .split(/[\s,;]+/)
    .map((part) => part.trim())
    .filter((part) => part.length > 0);
  return [...new Set(parts)];
}
