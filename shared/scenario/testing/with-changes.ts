import { EXAMPLE_SCENARIO_FILE } from '../example-scenario-file';

/** Splits `vessels[1].drain.to` into `['vessels', 1, 'drain', 'to']`. */
function splitPath(path: string): (string | number)[] {
  return path
    .replace(/\[(\d+)\]/g, '.$1')
    .split('.')
    .map((key) => (/^\d+$/.test(key) ? Number(key) : key));
}

function isContainer(value: unknown): value is Record<string | number, unknown> {
  return typeof value === 'object' && value !== null;
}

/**
 * A deep copy of `base` (the example scenario file by default) with each change applied at its
 * issue-style path (`vessels[1].drain.bell.innerDiameter`); `undefined` deletes the field. For
 * tests that break one rule at a time.
 */
export function withChanges(
  changes: Record<string, unknown>,
  base: unknown = EXAMPLE_SCENARIO_FILE,
): unknown {
  const copy: unknown = structuredClone(base);
  for (const [path, value] of Object.entries(changes)) {
    const keys = splitPath(path);
    const last = keys.pop();
    let node: unknown = copy;
    for (const key of keys) node = isContainer(node) ? node[key] : undefined;
    if (!isContainer(node) || last === undefined) throw new Error(`No field at ${path}`);
    if (value === undefined) delete node[last];
    else node[last] = value;
  }
  return copy;
}
