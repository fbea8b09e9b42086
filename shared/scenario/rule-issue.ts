/** A broken cross-field rule: the path of the field to fix and what is wrong. */
export interface RuleIssue {
  path: (string | number)[];
  message: string;
}
