/** A broken cross-field rule: the path of the field to fix and what is wrong. */
export interface RuleIssue {
  path: (string | number)[];
  message: string;
}

/** One rule to check: whether it is broken, the field to fix and the message that says how. */
export type RuleCheck = readonly [broken: boolean, path: (string | number)[], message: string];

/** The issues of the broken rules among `checks`, in order. */
export function brokenRules(checks: readonly RuleCheck[]): RuleIssue[] {
  return checks.filter(([broken]) => broken).map(([, path, message]) => ({ path, message }));
}
