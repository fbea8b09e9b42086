import { eq } from 'drizzle-orm';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { parseScenario } from '../../shared/scenario/index';
import { DEMO_ACCOUNTS, seedDemo } from '../db/seed';
import { systems, users } from '../db/schema';
import { createTestContext, type TestContext } from '../testing/test-context';
import { seedDemoSystems } from './seed-demo-systems';

describe('seedDemoSystems', () => {
  let t: TestContext;
  beforeEach(async () => {
    t = await createTestContext();
  });
  afterEach(async () => {
    await t.close();
  });

  it('gives every demo account the greenhouse and tabletop systems, once, however often it runs', async () => {
    await seedDemo(t.ctx.db, [seedDemoSystems]);
    await seedDemo(t.ctx.db, [seedDemoSystems]);
    for (const account of DEMO_ACCOUNTS) {
      const rows = await t.ctx.db
        .select({ name: systems.name, scenario: systems.scenario, version: systems.version })
        .from(systems)
        .innerJoin(users, eq(users.id, systems.ownerId))
        .where(eq(users.email, account.email));
      expect(rows.map((r) => r.name).sort()).toEqual([
        'Classroom tabletop unit',
        'Community greenhouse: 500 L tank, sump and three beds',
      ]);
      for (const row of rows) {
        const parsed = parseScenario(row.scenario);
        expect(parsed.success).toBe(true);
        expect(row.version).toBe(1);
      }
    }
    const greenhouse = parseScenario(
      (
        await t.ctx.db
          .select()
          .from(systems)
          .where(eq(systems.name, 'Community greenhouse: 500 L tank, sump and three beds'))
      )[0]?.scenario,
    );
    expect(
      greenhouse.success && greenhouse.scenario.vessels.filter((v) => v.kind === 'bed'),
    ).toHaveLength(3);
  });
});
