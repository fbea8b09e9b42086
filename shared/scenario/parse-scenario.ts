import { normaliseScenario } from './normalise-scenario';
import type { Scenario } from './scenario';
import { ScenarioInputSchema } from './scenario-input-schema';
import { issuesFromZod } from './issues-from-zod';
import type { ScenarioIssue } from './scenario-issue';

/** The outcome of reading a scenario document. */
export type ParseScenarioResult =
  { success: true; scenario: Scenario } | { success: false; issues: ScenarioIssue[] };

/**
 * Validates any value as a scenario file and returns the normalised scenario (SI numbers, all
 * defaults filled in), or every issue found, each with the path of its field (an unknown field's
 * own path). Never throws for bad input. A normalised scenario parses back to itself.
 */
export function parseScenario(input: unknown): ParseScenarioResult {
  const parsed = ScenarioInputSchema.safeParse(input);
  if (!parsed.success) return { success: false, issues: issuesFromZod(parsed.error.issues) };
  return { success: true, scenario: normaliseScenario(parsed.data) };
}
