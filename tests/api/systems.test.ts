/**
 * The systems API end to end (in-process app, fresh database per test): create, validation errors
 * by field path, templates, list, save with optimistic versions, duplicate, import/export, shares
 * and delete. Every answer is parsed with the shared contracts.
 */
import type { Express } from 'express';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { ApiErrorSchema } from '../../shared/contracts/api-error';
import {
  ShareListSchema,
  ShareSchema,
  SystemListSchema,
  SystemSchema,
  type System,
} from '../../shared/contracts/systems';
import { EXAMPLE_SCENARIO_FILE } from '../../shared/scenario/index';
import { createApp } from '../../server/app';
import { signedInClient, type TestClient } from '../../server/testing/test-client';
import { createTestContext, type TestContext } from '../../server/testing/test-context';

const scenario = (): Record<string, unknown> =>
  structuredClone(EXAMPLE_SCENARIO_FILE) as Record<string, unknown>;

describe('systems API', () => {
  let t: TestContext;
  let app: Express;
  let owner: TestClient;
  let ownerName: string;

  beforeEach(async () => {
    t = await createTestContext();
    app = createApp(t.ctx);
    const signedIn = await signedInClient(app, t.ctx, { name: 'Olive Owner' });
    owner = signedIn.client;
    ownerName = signedIn.user.name;
  });
  afterEach(async () => {
    await t.close();
  });

  async function create(client: TestClient, name = 'Bench rig'): Promise<System> {
    const res = await client.post('/api/systems').send({ name, scenario: scenario() });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    return SystemSchema.parse(res.body);
  }

  it('creates a system from a scenario at version 1, named in its scenario too', async () => {
    const res = await owner
      .post('/api/systems')
      .send({ name: '  Bench rig ', scenario: scenario() });
    expect(res.status).toBe(201);
    const system = SystemSchema.parse(res.body);
    expect(res.headers['location']).toBe(`/api/systems/${system.id}`);
    expect(system).toMatchObject({
      name: 'Bench rig',
      version: 1,
      access: 'owner',
      ownerName,
      lastVerdict: null,
    });
    expect(system.scenario).toEqual({ ...scenario(), name: 'Bench rig' });
    const again = SystemSchema.parse((await owner.get(`/api/systems/${system.id}`)).body);
    expect(again).toEqual(system);
  });

  it('rejects an invalid scenario with every problem named by its field path under scenario.', async () => {
    const bad = scenario();
    const vessels = bad['vessels'] as Array<Record<string, unknown>>;
    vessels[0] = { ...vessels[0], height: '3 L' };
    const pumps = bad['pumps'] as Array<Record<string, unknown>>;
    pumps[0] = { ...pumps[0], power: '35 m' };
    const res = await owner.post('/api/systems').send({ name: 'Broken', scenario: bad });
    expect(res.status).toBe(400);
    const { error } = ApiErrorSchema.parse(res.body);
    expect(error.code).toBe('VALIDATION_FAILED');
    expect(error.fields?.map((f) => f.path).sort()).toEqual([
      'scenario.pumps[0].power',
      'scenario.vessels[0].height',
    ]);
    expect(error.fields?.find((f) => f.path === 'scenario.vessels[0].height')?.message).toMatch(
      /length/,
    );
    expect(SystemListSchema.parse((await owner.get('/api/systems')).body).items).toEqual([]);
  });

  it('names the field of a broken cross-field rule (a standpipe taller than its bed)', async () => {
    const bad = scenario();
    const bed = (bad['vessels'] as Array<Record<string, unknown>>)[1] as {
      drain: { standpipe: Record<string, unknown> };
    };
    bed.drain.standpipe['height'] = '2 m';
    const res = await owner.post('/api/systems').send({ name: 'Tall standpipe', scenario: bad });
    expect(res.status).toBe(400);
    const paths = ApiErrorSchema.parse(res.body).error.fields?.map((f) => f.path) ?? [];
    expect(paths).toContain('scenario.vessels[1].drain.standpipe.height');
  });

  it('rejects a request without a name, and a scenario that is not an object, naming the fields', async () => {
    const noName = ApiErrorSchema.parse(
      (await owner.post('/api/systems').send({ scenario: scenario() })).body,
    );
    expect(noName.error.fields?.map((f) => f.path)).toEqual(['name']);
    const notObject = await owner.post('/api/systems').send({ name: 'x', scenario: [1, 2] });
    expect(notObject.status).toBe(400);
    expect(ApiErrorSchema.parse(notObject.body).error.fields?.[0]?.path).toBe('scenario');
    const badTemplate = ApiErrorSchema.parse(
      (await owner.post('/api/systems').send({ template: 'castle', name: 'x' })).body,
    );
    expect(badTemplate.error.fields?.map((f) => f.path)).toEqual(['template']);
  });

  it.each(['greenhouse', 'tabletop', 'timer-bed', 'blank'] as const)(
    'creates a valid system from the %s template',
    async (template) => {
      const res = await owner.post('/api/systems').send({ template, name: `From ${template}` });
      expect(res.status, JSON.stringify(res.body)).toBe(201);
      const system = SystemSchema.parse(res.body);
      expect(system.scenario['name']).toBe(`From ${template}`);
      expect(system.scenario['format']).toBe('scenario/1');
    },
  );

  it('lists my systems, then those shared with me, with beds, pumps, owner and my access', async () => {
    const mine = await create(owner, 'Mine');
    const other = await signedInClient(app, t.ctx, { name: 'Sam Sharer' });
    const theirs = await create(other.client, 'Theirs');
    const me = SystemSchema.parse((await owner.get(`/api/systems/${mine.id}`)).body);
    await other.client
      .post(`/api/systems/${theirs.id}/shares`)
      .send({ email: (await ownerEmail()).toUpperCase(), access: 'viewer' });
    await create(other.client, 'Not shared');
    const list = SystemListSchema.parse((await owner.get('/api/systems')).body);
    expect(list.items.map((i) => [i.name, i.access, i.ownerName])).toEqual([
      ['Mine', 'owner', ownerName],
      ['Theirs', 'viewer', 'Sam Sharer'],
    ]);
    expect(list.items[0]).toMatchObject({
      id: me.id,
      bedsCount: 1,
      pumpsCount: 1,
      pumpSummary: '1 pump, up to 2000 L/h',
      lastVerdict: null,
    });
  });

  async function ownerEmail(): Promise<string> {
    const res = await owner.get('/api/auth/me');
    return (res.body as { user: { email: string } }).user.email;
  }

  it('saves with the current version (+1) and answers 409 STALE_VERSION to a stale one', async () => {
    const system = await create(owner);
    const renamed = await owner
      .put(`/api/systems/${system.id}`)
      .send({ version: 1, name: 'Renamed' });
    expect(renamed.status).toBe(200);
    const saved = SystemSchema.parse(renamed.body);
    expect(saved).toMatchObject({ version: 2, name: 'Renamed' });
    expect(saved.scenario['name']).toBe('Renamed');
    const edited = scenario();
    edited['description'] = 'second save';
    const stale = await owner
      .put(`/api/systems/${system.id}`)
      .send({ version: 1, scenario: edited });
    expect(stale.status).toBe(409);
    const { error } = ApiErrorSchema.parse(stale.body);
    expect(error.code).toBe('STALE_VERSION');
    expect(error.message).toMatch(/version 1.*has 2.*reload/);
    const current = SystemSchema.parse((await owner.get(`/api/systems/${system.id}`)).body);
    expect(current.version).toBe(2);
    expect(current.scenario['description']).toBeUndefined();
    const fresh = await owner
      .put(`/api/systems/${system.id}`)
      .send({ version: 2, scenario: edited });
    expect(SystemSchema.parse(fresh.body)).toMatchObject({ version: 3, name: 'Renamed' });
  });

  it('refuses to save an invalid scenario and keeps the stored one and its version', async () => {
    const system = await create(owner);
    const bad = scenario();
    (bad['pumps'] as Array<Record<string, unknown>>)[0] = {
      ...(bad['pumps'] as Array<Record<string, unknown>>)[0],
      in: 'nowhere',
    };
    const res = await owner.put(`/api/systems/${system.id}`).send({ version: 1, scenario: bad });
    expect(res.status).toBe(400);
    expect(ApiErrorSchema.parse(res.body).error.fields?.map((f) => f.path)).toContain(
      'scenario.pumps[0].in',
    );
    expect(SystemSchema.parse((await owner.get(`/api/systems/${system.id}`)).body).version).toBe(1);
  });

  it('duplicates a system into a new one owned by the caller, also for a viewer', async () => {
    const system = await create(owner, 'Original');
    const copy = SystemSchema.parse(
      (await owner.post(`/api/systems/${system.id}/duplicate`).send({})).body,
    );
    expect(copy.id).not.toBe(system.id);
    expect(copy).toMatchObject({ name: 'Original (copy)', version: 1, access: 'owner' });
    expect(copy.scenario).toEqual({ ...system.scenario, name: 'Original (copy)' });
    const viewer = await signedInClient(app, t.ctx, { name: 'Vera Viewer' });
    await owner
      .post(`/api/systems/${system.id}/shares`)
      .send({ email: viewer.user.email, access: 'viewer' });
    const theirs = await viewer.client
      .post(`/api/systems/${system.id}/duplicate`)
      .send({ name: 'My take' });
    expect(theirs.status).toBe(201);
    expect(SystemSchema.parse(theirs.body)).toMatchObject({
      name: 'My take',
      ownerId: viewer.user.id,
      access: 'owner',
    });
  });

  it('exports the scenario as a download that imports back to the same scenario', async () => {
    const system = await create(owner, 'Export me');
    const res = await owner.get(`/api/systems/${system.id}/scenario.json`);
    expect(res.status).toBe(200);
    expect(res.headers['content-disposition']).toMatch(
      /^attachment; filename="?export-me\.scenario\.json"?$/,
    );
    expect(res.headers['content-type']).toMatch(/^application\/json/);
    const file: unknown = JSON.parse(res.text);
    expect(file).toEqual(system.scenario);
    const imported = await owner.post('/api/systems/import').send(file as object);
    expect(imported.status).toBe(201);
    const copy = SystemSchema.parse(imported.body);
    expect(copy.name).toBe('Export me');
    expect(copy.scenario).toEqual(system.scenario);
    const renamed = SystemSchema.parse(
      (await owner.post('/api/systems/import?name=Other').send(file as object)).body,
    );
    expect(renamed.name).toBe('Other');
  });

  it('rejects an imported file with errors named by their paths inside the file', async () => {
    const bad = scenario();
    bad['format'] = 'scenario/9';
    (bad['vessels'] as Array<Record<string, unknown>>)[1] = {
      ...(bad['vessels'] as Array<Record<string, unknown>>)[1],
      floorElevation: '2 L',
    };
    const res = await owner.post('/api/systems/import').send(bad);
    expect(res.status).toBe(400);
    const paths = ApiErrorSchema.parse(res.body).error.fields?.map((f) => f.path) ?? [];
    expect(paths).toEqual(expect.arrayContaining(['format', 'vessels[1].floorElevation']));
  });

  it('shares with viewers and editors: list, change, remove; only the owner manages shares', async () => {
    const system = await create(owner);
    const editor = await signedInClient(app, t.ctx, { name: 'Eddie Editor' });
    const added = await owner
      .post(`/api/systems/${system.id}/shares`)
      .send({ email: editor.user.email, access: 'viewer' });
    expect(added.status).toBe(201);
    expect(ShareSchema.parse(added.body)).toMatchObject({
      userId: editor.user.id,
      name: 'Eddie Editor',
      access: 'viewer',
    });
    expect(
      (await editor.client.put(`/api/systems/${system.id}`).send({ version: 1, name: 'Mine now' }))
        .status,
    ).toBe(403);
    await owner
      .post(`/api/systems/${system.id}/shares`)
      .send({ email: editor.user.email, access: 'editor' });
    const list = ShareListSchema.parse((await owner.get(`/api/systems/${system.id}/shares`)).body);
    expect(list.items.map((s) => [s.userId, s.access])).toEqual([[editor.user.id, 'editor']]);
    const save = await editor.client
      .put(`/api/systems/${system.id}`)
      .send({ version: 1, name: 'Edited by editor' });
    expect(SystemSchema.parse(save.body)).toMatchObject({ access: 'editor', version: 2 });
    expect((await editor.client.get(`/api/systems/${system.id}/shares`)).status).toBe(403);
    expect((await editor.client.delete(`/api/systems/${system.id}`)).status).toBe(403);
    expect((await owner.delete(`/api/systems/${system.id}/shares/${editor.user.id}`)).status).toBe(
      204,
    );
    expect((await editor.client.get(`/api/systems/${system.id}`)).status).toBe(404);
    expect((await owner.delete(`/api/systems/${system.id}/shares/${editor.user.id}`)).status).toBe(
      404,
    );
  });

  it('answers sharing with an unknown address (404) or with the owner (400) by the email field', async () => {
    const system = await create(owner);
    const unknown = await owner
      .post(`/api/systems/${system.id}/shares`)
      .send({ email: 'nobody@example.test', access: 'viewer' });
    expect(unknown.status).toBe(404);
    expect(ApiErrorSchema.parse(unknown.body).error).toMatchObject({
      code: 'USER_NOT_FOUND',
      fields: [{ path: 'email' }],
    });
    const self = await owner
      .post(`/api/systems/${system.id}/shares`)
      .send({ email: await ownerEmail(), access: 'editor' });
    expect(self.status).toBe(400);
    const badEmail = await owner
      .post(`/api/systems/${system.id}/shares`)
      .send({ email: 'not-an-email', access: 'owner' });
    expect(
      ApiErrorSchema.parse(badEmail.body)
        .error.fields?.map((f) => f.path)
        .sort(),
    ).toEqual(['access', 'email']);
  });

  it('deletes a system; it is then gone for everyone', async () => {
    const system = await create(owner);
    expect((await owner.delete(`/api/systems/${system.id}`)).status).toBe(204);
    expect((await owner.get(`/api/systems/${system.id}`)).status).toBe(404);
    expect(SystemListSchema.parse((await owner.get('/api/systems')).body).items).toEqual([]);
  });
});
