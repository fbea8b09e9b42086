import type { z } from 'zod';
import { formatIssuePath, type ScenarioIssue } from './scenario-issue';

/**
 * Zod's issues as path-and-message pairs, each path under `prefix` (e.g. `['scenario']` when the
 * checked value is nested in a request body). An unknown-keys issue names the object holding the
 * keys; it becomes one issue per key, at the key's own path (`beds[0].colour`), so a form or a
 * client can point at the very field to remove.
 */
export function issuesFromZod(
  issues: readonly z.core.$ZodIssue[],
  prefix: readonly PropertyKey[] = [],
): ScenarioIssue[] {
  return issues.flatMap((issue) =>
    issue.code === 'unrecognized_keys'
      ? issue.keys.map((key) => ({
          path: formatIssuePath([...prefix, ...issue.path, key]),
          message: `"${key}" is not a field here; remove it or check its spelling.`,
        }))
      : [{ path: formatIssuePath([...prefix, ...issue.path]), message: issue.message }],
  );
}
