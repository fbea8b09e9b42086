import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { systemShares, systems } from '../db/schema';
import { HttpError } from '../http/http-error';
import { createTestUser } from '../testing/test-client';
import { createTestContext, type TestContext } from '../testing/test-context';
import { requireSystemAccess, type SystemAccessNeed } from './system-access';

describe('requireSystemAccess', () => {
  let t: TestContext;
  beforeEach(async () => {
    t = await createTestContext();
  });
  afterEach(async () => {
    await t.close();
  });

  async function world() {
    const owner = (await createTestUser(t.ctx)).user;
    const viewer = (await createTestUser(t.ctx)).user;
    const editor = (await createTestUser(t.ctx)).user;
    const stranger = (await createTestUser(t.ctx)).user;
    const admin = (await createTestUser(t.ctx, { role: 'admin' })).user;
    const [system] = await t.ctx.db
      .insert(systems)
      .values({ ownerId: owner.id, name: 'Greenhouse', scenario: {} })
      .returning();
    if (!system) throw new Error('no system inserted');
    await t.ctx.db.insert(systemShares).values([
      { systemId: system.id, userId: viewer.id, access: 'viewer' },
      { systemId: system.id, userId: editor.id, access: 'editor' },
    ]);
    return { owner, viewer, editor, stranger, admin, systemId: system.id };
  }

  async function outcome(
    user: { id: string },
    systemId: string,
    need: SystemAccessNeed,
  ): Promise<string | number> {
    try {
      return (await requireSystemAccess(t.ctx.db, user, systemId, need)).access;
    } catch (error) {
      if (error instanceof HttpError) return error.status;
      throw error;
    }
  }

  it('gives each user the access the sharing rules say, per need', async () => {
    const w = await world();
    const table: [string, { id: string }, string | number, string | number, string | number][] = [
      ['owner', w.owner, 'owner', 'owner', 'owner'],
      ['editor', w.editor, 'editor', 'editor', 403],
      ['viewer', w.viewer, 'viewer', 403, 403],
      ['stranger', w.stranger, 404, 404, 404],
      ['admin (no special access)', w.admin, 404, 404, 404],
    ];
    for (const [who, user, read, write, owner] of table) {
      expect([
        who,
        await outcome(user, w.systemId, 'read'),
        await outcome(user, w.systemId, 'write'),
        await outcome(user, w.systemId, 'owner'),
      ]).toEqual([who, read, write, owner]);
    }
  });

  it('answers 404 for a malformed or unknown id instead of a database error', async () => {
    const w = await world();
    expect(await outcome(w.owner, 'not-a-uuid', 'read')).toBe(404);
    expect(await outcome(w.owner, "1' or '1'='1", 'read')).toBe(404);
    expect(await outcome(w.owner, '00000000-0000-4000-8000-000000000000', 'read')).toBe(404);
  });
});
