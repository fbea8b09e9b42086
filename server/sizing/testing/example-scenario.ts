/** The shared example system (a 670 L tank and one bell-siphon bed), optionally changed, normalised (for tests). */
import { parseScenario, type Scenario } from '../../../shared/scenario/index';
import { withChanges } from '../../../shared/scenario/testing/with-changes';

/** The example scenario with `changes` (issue-style paths, as `withChanges` takes them) applied. */
export function exampleScenario(changes: Record<string, unknown> = {}): Scenario {
  const parsed = parseScenario(withChanges(changes));
  if (!parsed.success)
    throw new Error(`The changed example is invalid: ${JSON.stringify(parsed.issues)}`);
  return parsed.scenario;
}
