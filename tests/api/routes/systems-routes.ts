/** Route table entries: `/api/systems/*`. A system owned by the owner, shared with viewer and editor. */
import { EXAMPLE_SCENARIO_FILE } from '../../../shared/scenario/index';
import { insertSystem, upsertShare } from '../../../server/systems/systems-repository';
import type { RouteGroup } from '../route-table';

/** Systems: any signed-in user lists and creates; the rest follow the system's owner and shares. */
export const systemsRoutes: RouteGroup = {
  name: 'systems',
  fixture: async (f) => {
    const system = await insertSystem(f.ctx.db, {
      ownerId: f.owner.id,
      name: 'Fixture system',
      scenario: { ...EXAMPLE_SCENARIO_FILE, name: 'Fixture system' },
    });
    await upsertShare(f.ctx.db, system.id, f.viewer.id, 'viewer');
    await upsertShare(f.ctx.db, system.id, f.editor.id, 'editor');
    f.params['systemId'] = system.id;
    f.params['shareUserId'] = f.editor.id;
  },
  routes: [
    { method: 'get', path: '/api/systems', access: 'signed-in', okStatus: 200 },
    {
      method: 'post',
      path: '/api/systems',
      access: 'signed-in',
      body: () => ({ template: 'blank', name: 'Bench rig' }),
      okStatus: 201,
    },
    {
      method: 'post',
      path: '/api/systems/import',
      access: 'signed-in',
      body: () => EXAMPLE_SCENARIO_FILE,
      okStatus: 201,
    },
    {
      method: 'get',
      path: '/api/systems/:systemId',
      access: 'signed-in',
      ownership: { need: 'read', shareable: true },
      okStatus: 200,
    },
    {
      method: 'put',
      path: '/api/systems/:systemId',
      access: 'signed-in',
      ownership: { need: 'write', shareable: true },
      body: () => ({ version: 1, name: 'Renamed system' }),
      okStatus: 200,
    },
    {
      method: 'delete',
      path: '/api/systems/:systemId',
      access: 'signed-in',
      ownership: { need: 'owner', shareable: true },
      okStatus: 204,
    },
    {
      method: 'post',
      path: '/api/systems/:systemId/duplicate',
      access: 'signed-in',
      ownership: { need: 'read', shareable: true },
      okStatus: 201,
    },
    {
      method: 'get',
      path: '/api/systems/:systemId/scenario.json',
      access: 'signed-in',
      ownership: { need: 'read', shareable: true },
      okStatus: 200,
    },
    {
      method: 'get',
      path: '/api/systems/:systemId/shares',
      access: 'signed-in',
      ownership: { need: 'owner', shareable: true },
      okStatus: 200,
    },
    {
      method: 'post',
      path: '/api/systems/:systemId/shares',
      access: 'signed-in',
      ownership: { need: 'owner', shareable: true },
      body: (f) => ({ email: f.viewer.email, access: 'editor' }),
      okStatus: 201,
    },
    {
      method: 'delete',
      path: '/api/systems/:systemId/shares/:shareUserId',
      access: 'signed-in',
      ownership: { need: 'owner', shareable: true },
      okStatus: 204,
    },
  ],
};
