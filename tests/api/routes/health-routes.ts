/** Route table entries: the health check. */
import type { RouteGroup } from '../route-table';

/** `GET /api/health` is public (load balancers and the browser tests call it signed out). */
export const healthRoutes: RouteGroup = {
  name: 'health',
  routes: [{ method: 'get', path: '/api/health', access: 'public' }],
};
