/**
 * The table of every API route and who may call it. The authorization test
 * (`authz.test.ts`) walks it, and fails when the app has a route the table does not list.
 *
 * To add routes: write `tests/api/routes/<feature>-routes.ts` exporting a `RouteGroup` (its
 * routes and, if they act on a resource, a fixture step creating that resource owned by
 * `fixture.owner`), then add it to `routeGroups` below.
 */
import type { UserRole } from '../../shared/contracts/auth';
import type { AppContext } from '../../server/app-context';
import type { User } from '../../shared/contracts/auth';
import { adminRoutes } from './routes/admin-routes';
import { authRoutes } from './routes/auth-routes';
import { healthRoutes } from './routes/health-routes';
import { runsRoutes } from './routes/runs-routes';
import { systemsRoutes } from './routes/systems-routes';
import { classroomRoutes } from './routes/classroom-routes';
import { measurementsRoutes } from './routes/measurements-routes';
import { sweepsRoutes } from './routes/sweeps-routes';
import { sizingRoutes } from './routes/sizing-routes';

/** An HTTP method as supertest names it. */
export type HttpMethod = 'get' | 'post' | 'put' | 'patch' | 'delete';

/** The users and resources one route case runs against; fixture steps fill `params`. */
export interface RouteFixture {
  ctx: AppContext;
  /** Owns every resource named in `params`; has the route's first allowed role (else member). */
  owner: User;
  /** A member the owner's shareable resources are shared with as `viewer`. */
  viewer: User;
  /** A member the owner's shareable resources are shared with as `editor`. */
  editor: User;
  /** Values for the path's `:name` parameters, e.g. `{ systemId, runId, userId }`. */
  params: Record<string, string>;
}

/** Creates resources owned by `fixture.owner` and records their ids in `fixture.params`. */
export type FixtureStep = (fixture: RouteFixture) => Promise<void>;

/** One route and its rules. */
export interface RouteCase {
  method: HttpMethod;
  /** The Express path under the app, e.g. `/api/systems/:systemId/runs`. */
  path: string;
  /** `public` needs no session; `signed-in` any role; a list names the roles allowed. */
  access: 'public' | 'signed-in' | readonly UserRole[];
  /**
   * Set for routes acting on a resource in `params` owned by `fixture.owner`: what access they
   * need. Others who are not owner (and not shared with, for `shareable` resources) get 404;
   * a viewer trying to write, or an editor trying an owner action, gets 403 or 404.
   */
  ownership?: { need: 'read' | 'write' | 'owner'; shareable: boolean };
  /** Query parameters the route needs (e.g. the two run ids of a comparison). */
  query?: (fixture: RouteFixture) => Record<string, string>;
  /** A valid body (or a promise of one), so that a denial is the rules at work and not validation. */
  body?: (fixture: RouteFixture) => unknown;
  /** The status the allowed caller gets with `body` (default: any 2xx). */
  okStatus?: number;
  /** True for routes whose job is to change other users (admin user management). */
  changesOtherUsers?: boolean;
  /** Top-level body fields that accept values of any JSON type (skipped by the wrong-type test). */
  anyTypeFields?: readonly string[];
  /** How many random payloads the property test sends (default 20; lower it for costly routes). */
  fuzzRuns?: number;
}

/** A feature's routes and the fixture step their resources need. */
export interface RouteGroup {
  name: string;
  routes: readonly RouteCase[];
  fixture?: FixtureStep;
}

/** Every group; the authz test requires that together they list every route of the app. */
export const routeGroups: readonly RouteGroup[] = [
  healthRoutes,
  authRoutes,
  adminRoutes,
  systemsRoutes,
  runsRoutes,
  classroomRoutes,
  measurementsRoutes,
  sweepsRoutes,
  sizingRoutes,
];

/** All route cases of all groups. */
export const allRoutes: readonly RouteCase[] = routeGroups.flatMap((group) => group.routes);

/** Whether a route changes state (and so must carry the CSRF header). */
export function isMutating(route: RouteCase): boolean {
  return route.method !== 'get';
}

/** `METHOD /path` for test titles. */
export function routeTitle(route: Pick<RouteCase, 'method' | 'path'>): string {
  return `${route.method.toUpperCase()} ${route.path}`;
}
