/** `GET /api/systems/:id/inflow-window`: each bell-siphon bed's cycling inflow range, solved directly. */
import { cyclingInflowWindows } from '../../engine/index';
import type { InflowWindows } from '../../shared/contracts/sweeps';
import type { SessionUser } from '../auth/session-user';
import { requireSystemAccess } from '../auth/system-access';
import type { Database } from '../db/database';
import { HttpError } from '../http/http-error';
import { systemScenario } from './sweeps-service';

/**
 * The inflow window of every bell-siphon bed of a system the user may read, with the inflow its
 * pumps deliver at the starting levels. A system the solver cannot model is a 422 saying why.
 */
export async function getInflowWindows(
  db: Database,
  user: Pick<SessionUser, 'id'>,
  systemId: string,
): Promise<InflowWindows> {
  const { system } = await requireSystemAccess(db, user, systemId, 'read');
  const scenario = systemScenario(system.scenario);
  try {
    return { beds: cyclingInflowWindows(scenario) };
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    throw new HttpError(
      422,
      'NOT_SOLVABLE',
      `The inflow window cannot be solved for this system (${message}); run it instead.`,
    );
  }
}
