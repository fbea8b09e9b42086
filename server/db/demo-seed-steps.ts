/** The feature seed steps run on a new database after the demo accounts exist. */
import { seedDemoSystems } from '../systems/seed-demo-systems';
import { seedClassroomDemo } from '../classroom/seed-classroom-demo';
import type { SeedStep } from './seed';

/** Features append their idempotent steps here (demo systems, lessons). */
export const demoSeedSteps: SeedStep[] = [seedDemoSystems, seedClassroomDemo];
