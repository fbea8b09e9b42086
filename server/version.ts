/** The app version, from package.json. */
import { readFileSync } from 'node:fs';

/** Reads `version` from the root package.json. */
export function readVersion(): string {
  const url = new URL('../package.json', import.meta.url);
  const pkg = JSON.parse(readFileSync(url, 'utf8')) as { version?: unknown };
  return typeof pkg.version === 'string' ? pkg.version : '0.0.0';
}
