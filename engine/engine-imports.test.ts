import { readdirSync, readFileSync } from 'node:fs';
import { join, relative } from 'node:path';
import { describe, expect, it } from 'vitest';

/** Every engine source file (tests and the command line aside). */
function engineSources(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const path = join(dir, entry.name);
    if (entry.isDirectory()) return engineSources(path);
    return entry.name.endsWith('.ts') && !entry.name.endsWith('.test.ts') && entry.name !== 'cli.ts'
      ? [path]
      : [];
  });
}

describe('engine imports', () => {
  it('loads no unit parser at run time, so a worker thread starts the engine in a fraction of a second', () => {
    // The scenario package's index pulls in mathjs (about a second to load per worker thread);
    // the engine gets SI numbers and needs only types and defaults from it.
    const offenders = engineSources(import.meta.dirname).flatMap((file) => {
      const text = readFileSync(file, 'utf8');
      const runtimeImports = [...text.matchAll(/^import (?!type )[^;]*?from '([^']+)';/gms)].map(
        (match) => match[1] as string,
      );
      return runtimeImports
        .filter((source) => source === 'mathjs' || /shared\/scenario(\/index)?$/.test(source))
        .map((source) => `${relative(import.meta.dirname, file)} imports ${source}`);
    });
    expect(offenders).toEqual([]);
  });
});
