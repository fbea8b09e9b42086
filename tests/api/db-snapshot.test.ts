import { eq } from 'drizzle-orm';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { users } from '../../server/db/schema';
import { createTestUser } from '../../server/testing/test-client';
import { createTestContext, type TestContext } from '../../server/testing/test-context';
import { digestRowsMentioning, digestDatabase } from './db-snapshot';

describe('database snapshots for the authorization tests', () => {
  let t: TestContext;
  beforeEach(async () => {
    t = await createTestContext();
  });
  afterEach(async () => {
    await t.close();
  });

  it('see a change to any row', async () => {
    const { user } = await createTestUser(t.ctx);
    const before = await digestDatabase(t.ctx.db);
    await t.ctx.db.update(users).set({ name: 'Changed' }).where(eq(users.id, user.id));
    expect(await digestDatabase(t.ctx.db)).not.toEqual(before);
  });

  it('digest only the rows mentioning the watched ids', async () => {
    const watched = (await createTestUser(t.ctx)).user;
    const other = (await createTestUser(t.ctx)).user;
    const before = await digestRowsMentioning(t.ctx.db, [watched.id]);
    await t.ctx.db.update(users).set({ name: 'Other changed' }).where(eq(users.id, other.id));
    expect(await digestRowsMentioning(t.ctx.db, [watched.id])).toEqual(before);
    await t.ctx.db.update(users).set({ units: 'us' }).where(eq(users.id, watched.id));
    expect(await digestRowsMentioning(t.ctx.db, [watched.id])).not.toEqual(before);
  });
});
