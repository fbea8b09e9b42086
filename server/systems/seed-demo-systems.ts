/**
 * Demo seed step: every demo account gets the greenhouse three-bed system and the classroom
 * tabletop unit (the example files in `scenarios/`). Idempotent: a system of the same name that
 * the account already owns is left alone.
 */
import type { Database } from '../db/database';
import type { SeedStep } from '../db/seed';
import { readExampleScenario, TEMPLATE_FILES } from './system-templates';
import { checkScenarioDocument } from './systems-service';
import { findOwnedSystemByName, insertSystem } from './systems-repository';

/** The example files each demo account gets, in the order they are created. */
export const DEMO_SYSTEM_FILES = [TEMPLATE_FILES.greenhouse, TEMPLATE_FILES.tabletop] as const;

async function giveSystem(db: Database, ownerId: string, fileName: string): Promise<void> {
  const document = readExampleScenario(fileName);
  const name = typeof document['name'] === 'string' ? document['name'] : fileName;
  if (await findOwnedSystemByName(db, ownerId, name)) return;
  await insertSystem(db, {
    ownerId,
    name,
    scenario: checkScenarioDocument(document, name, `scenarios/${fileName}`),
  });
}

/** Gives each demo account the demo systems it does not have yet. */
export const seedDemoSystems: SeedStep = async (db, userIds) => {
  for (const ownerId of Object.values(userIds)) {
    for (const fileName of DEMO_SYSTEM_FILES) await giveSystem(db, ownerId, fileName);
  }
};
