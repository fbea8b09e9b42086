/** Builds the users and resources one route case runs against. */
import type { AppContext } from '../../server/app-context';
import { createTestUser } from '../../server/testing/test-client';
import { routeGroups, type RouteCase, type RouteFixture } from './route-table';

/** The role the owner of a route's resources has: the route's first allowed role, else member. */
export function ownerRole(route: RouteCase): 'admin' | 'instructor' | 'member' {
  return Array.isArray(route.access) ? (route.access[0] ?? 'member') : 'member';
}

/** New owner, viewer and editor users, then every group's fixture step. */
export async function createRouteFixture(ctx: AppContext, route: RouteCase): Promise<RouteFixture> {
  const fixture: RouteFixture = {
    ctx,
    owner: (await createTestUser(ctx, { role: ownerRole(route), name: 'Owner' })).user,
    viewer: (await createTestUser(ctx, { role: 'member', name: 'Viewer' })).user,
    editor: (await createTestUser(ctx, { role: 'member', name: 'Editor' })).user,
    params: {},
  };
  for (const group of routeGroups) await group.fixture?.(fixture);
  return fixture;
}

/** The route's path with each `:name` replaced by `params[name]`; throws when a fixture lacks one. */
export function fillPath(path: string, params: Record<string, string>): string {
  return path.replace(/:([A-Za-z0-9_]+)/g, (_all, name: string) => {
    const value = params[name];
    if (value === undefined)
      throw new Error(
        `No fixture step sets params.${name} for ${path}; add one to its route group.`,
      );
    return encodeURIComponent(value);
  });
}
