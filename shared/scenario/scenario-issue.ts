/**
 * One problem found in a scenario. `path` names the field the way a person writes it, e.g.
 * `vessels[1].drain.standpipe.height`; an empty path means the whole document.
 */
export interface ScenarioIssue {
  path: string;
  message: string;
}

/** Formats a zod-style path (`['vessels', 1, 'drain']`) as `vessels[1].drain`. */
export function formatIssuePath(path: ReadonlyArray<PropertyKey>): string {
  let text = '';
  for (const key of path) {
    if (typeof key === 'number') text += `[${key}]`;
    else text += text === '' ? String(key) : `.${String(key)}`;
  }
  return text;
}
