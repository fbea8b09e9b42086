/** Route table entries: sizing checks and the build sheet of the systems group's system (read access). */
import type { RouteGroup } from '../route-table';

const read = { need: 'read', shareable: true } as const;

/** Anyone who may read a system may read its sizing checks and its build sheet. */
export const sizingRoutes: RouteGroup = {
  name: 'sizing',
  routes: [
    {
      method: 'get',
      path: '/api/systems/:systemId/sizing',
      access: 'signed-in',
      ownership: read,
      okStatus: 200,
    },
    {
      method: 'get',
      path: '/api/systems/:systemId/build-sheet',
      access: 'signed-in',
      ownership: read,
      okStatus: 200,
    },
  ],
};
