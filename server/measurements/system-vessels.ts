/** The vessels of a system that measurements can name, from its scenario. */
import { parseScenario, type Scenario } from '../../shared/scenario/index';
import { badRequest } from '../http/http-error';
import type { KnownVessel } from './parse-level-csv';

/** Vessel ids and rim heights, the bed ids, and the normalised scenario. */
export interface SystemVessels {
  scenario: Scenario;
  vessels: KnownVessel[];
  beds: string[];
}

/** Reads a system's scenario; a system whose scenario no longer validates is a 400 saying to fix it. */
export function systemVessels(scenarioDocument: unknown): SystemVessels {
  const parsed = parseScenario(scenarioDocument);
  if (!parsed.success) {
    const fields = parsed.issues.map((i) => ({
      path: i.path ? `scenario.${i.path}` : 'scenario',
      message: i.message,
    }));
    throw badRequest(
      'The system has scenario problems; fix them in the editor before adding measurements.',
      fields,
    );
  }
  const scenario = parsed.scenario;
  return {
    scenario,
    vessels: scenario.vessels.map((v) => ({ id: v.id, heightM: v.height })),
    beds: scenario.vessels.filter((v) => v.kind === 'bed').map((v) => v.id),
  };
}
