import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { seedDemo, DEMO_ACCOUNTS } from '../../server/db/seed';
import { users } from '../../server/db/schema';
import { createTestContext } from '../../server/testing/test-context';

const url = process.env['TEST_DATABASE_URL'];

describe.skipIf(!url)('the PostgreSQL server path (DATABASE_URL)', () => {
  it('migrates a new database, reports it in health and seeds the demo accounts once', async () => {
    const t = await createTestContext();
    try {
      expect(t.database.kind).toBe('postgres');
      expect(t.database.isNew).toBe(true);
      const health = await request(createApp(t.ctx)).get('/api/health');
      expect(health.body).toMatchObject({ status: 'ok', db: 'ok', dbKind: 'postgres' });
      await seedDemo(t.ctx.db);
      await seedDemo(t.ctx.db);
      const rows = await t.ctx.db.select({ email: users.email }).from(users);
      expect(rows.map((r) => r.email).sort()).toEqual(DEMO_ACCOUNTS.map((a) => a.email).sort());
    } finally {
      await t.close();
    }
  });
});
