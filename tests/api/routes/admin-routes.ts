/** Route table entries: `/api/admin/*`, all admin-only. */
import { createTestUser } from '../../../server/testing/test-client';
import type { RouteGroup } from '../route-table';

/** User management and the outbox. */
export const adminRoutes: RouteGroup = {
  name: 'admin',
  fixture: async (f) => {
    const { user } = await createTestUser(f.ctx, {
      role: 'member',
      name: 'Subject of admin actions',
    });
    f.params['userId'] = user.id;
  },
  routes: [
    { method: 'get', path: '/api/admin/users', access: ['admin'], okStatus: 200 },
    {
      method: 'patch',
      path: '/api/admin/users/:userId',
      access: ['admin'],
      body: () => ({ role: 'instructor' }),
      okStatus: 200,
      changesOtherUsers: true,
    },
    { method: 'get', path: '/api/admin/outbox', access: ['admin'], okStatus: 200 },
  ],
};
