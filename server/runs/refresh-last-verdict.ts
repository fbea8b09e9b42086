/** Keeps `systems.last_verdict` equal to the worst verdict status of the system's latest completed run. */
import type { Database } from '../db/database';
import { setLastVerdict } from '../systems/systems-repository';
import { latestCompletedVerdict } from './runs-repository';

/** Recomputes and stores the system's last verdict (null when no run has completed). */
export async function refreshLastVerdict(db: Database, systemId: string): Promise<void> {
  await setLastVerdict(db, systemId, await latestCompletedVerdict(db, systemId));
}
