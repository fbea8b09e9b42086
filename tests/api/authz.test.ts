/**
 * Authorization over every route in the route table: 401 without a session, 403 without the CSRF
 * header or the role, 404 (and no change anywhere) for resources that are not the caller's, and
 * the allowed caller succeeding. The first test fails when the app serves a route the table lacks.
 */
import type { Express } from 'express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { UserRoleSchema, type UserRole } from '../../shared/contracts/auth';
import { ApiErrorSchema } from '../../shared/contracts/api-error';
import { apiRouter } from '../../server/api-router';
import { createApp } from '../../server/app';
import { TestClient, signedInClient } from '../../server/testing/test-client';
import { createTestContext, type TestContext } from '../../server/testing/test-context';
import { digestDatabase } from './db-snapshot';
import { listApiRoutes } from './list-api-routes';
import { createRouteFixture, fillPath } from './route-fixture';
import {
  allRoutes,
  isMutating,
  routeTitle,
  type RouteCase,
  type RouteFixture,
} from './route-table';

const ROLES = UserRoleSchema.options;
const titled = (routes: readonly RouteCase[]): [string, RouteCase][] =>
  routes.map((r) => [routeTitle(r), r]);
const allowedRoles = (route: RouteCase): readonly UserRole[] =>
  Array.isArray(route.access) ? route.access : ROLES;

describe('authorization over every API route', () => {
  let t: TestContext;
  let app: Express;
  beforeAll(async () => {
    t = await createTestContext();
    app = createApp(t.ctx);
  });
  afterAll(async () => {
    await t.close();
  });

  /** Sends the route's request; the body is built first, so building it is not part of the request. */
  async function call(
    client: TestClient,
    route: RouteCase,
    fixture: RouteFixture,
    withCsrf = true,
  ) {
    const body = route.body ? ((await route.body(fixture)) as object) : undefined;
    const path = fillPath(route.path, fixture.params);
    const before = await digestDatabase(t.ctx.db);
    const sent = withCsrf ? client.send(route.method, path) : client.agent[route.method](path);
    const test = route.query ? sent.query(route.query(fixture)) : sent;
    const res = await (body === undefined ? test : test.send(body));
    return { res, before };
  }

  /** Runs the request and returns its status, asserting no table changed. */
  async function statusChangingNothing(
    client: TestClient,
    route: RouteCase,
    fixture: RouteFixture,
    withCsrf = true,
  ) {
    const { res, before } = await call(client, route, fixture, withCsrf);
    expect(await digestDatabase(t.ctx.db)).toEqual(before);
    return res;
  }

  it('lists every route the app serves, each once', () => {
    const served = listApiRoutes(apiRouter(t.ctx), '/api').map(routeTitle);
    const listed = allRoutes.map(routeTitle);
    expect(new Set(listed).size, 'a route is listed twice').toBe(listed.length);
    const unlisted = served.filter((title) => !listed.includes(title));
    expect(
      unlisted,
      'served but missing from the route table: add them to a RouteGroup in tests/api/routes/',
    ).toEqual([]);
    expect(
      listed.filter((title) => !served.includes(title)),
      'listed but not served',
    ).toEqual([]);
  });

  const guarded = allRoutes.filter((r) => r.access !== 'public');
  it.each(titled(guarded))(
    '%s answers 401 without a session and changes nothing',
    async (_title, route) => {
      const fixture = await createRouteFixture(t.ctx, route);
      const anonymous = await TestClient.create(app);
      expect((await statusChangingNothing(anonymous, route, fixture)).status).toBe(401);
    },
  );

  it.each(titled(allRoutes.filter(isMutating)))(
    '%s answers 403 CSRF_FAILED without the X-XSRF-TOKEN header',
    async (_title, route) => {
      const fixture = await createRouteFixture(t.ctx, route);
      const { client } = await signedInClient(app, t.ctx, { role: allowedRoles(route)[0] });
      const res = await statusChangingNothing(client, route, fixture, false);
      expect(res.status).toBe(403);
      expect(ApiErrorSchema.parse(res.body).error.code).toBe('CSRF_FAILED');
    },
  );

  const roleLimited = allRoutes.filter(
    (r) => Array.isArray(r.access) && r.access.length < ROLES.length,
  );
  it.each(titled(roleLimited))(
    '%s answers 403 to every role it does not allow',
    async (_title, route) => {
      for (const role of ROLES.filter((r) => !allowedRoles(route).includes(r))) {
        const fixture = await createRouteFixture(t.ctx, route);
        const { client } = await signedInClient(app, t.ctx, { role });
        expect((await statusChangingNothing(client, route, fixture)).status, `as ${role}`).toBe(
          403,
        );
      }
    },
  );

  const owned = allRoutes.filter((r) => r.ownership);
  it.each(titled(owned))(
    '%s answers 404 to users of every allowed role who do not own it, changing nothing',
    async (_title, route) => {
      for (const role of allowedRoles(route)) {
        const fixture = await createRouteFixture(t.ctx, route);
        const { client } = await signedInClient(app, t.ctx, { role });
        expect(
          (await statusChangingNothing(client, route, fixture)).status,
          `as a stranger with role ${role}`,
        ).toBe(404);
      }
    },
  );

  const sharedWrites = owned.filter((r) => r.ownership?.shareable && r.ownership.need !== 'read');
  it.each(titled(sharedWrites))(
    '%s refuses a viewer (and an editor, for owner actions), changing nothing',
    async (_title, route) => {
      const fixture = await createRouteFixture(t.ctx, route);
      const denied =
        route.ownership?.need === 'owner' ? [fixture.viewer, fixture.editor] : [fixture.viewer];
      for (const user of denied) {
        const client = await TestClient.create(app);
        await client.signIn(user.email);
        expect([403, 404], `as ${user.name}`).toContain(
          (await statusChangingNothing(client, route, fixture)).status,
        );
      }
    },
  );

  const sharedUses = owned.filter((r) => r.ownership?.shareable && r.ownership.need !== 'owner');
  it.each(titled(sharedUses))('%s works for the user it is shared with', async (_title, route) => {
    const fixture = await createRouteFixture(t.ctx, route);
    const client = await TestClient.create(app);
    await client.signIn(
      route.ownership?.need === 'read' ? fixture.viewer.email : fixture.editor.email,
    );
    const { res } = await call(client, route, fixture);
    expect(res.status, JSON.stringify(res.body)).toBeGreaterThanOrEqual(200);
    expect(res.status).toBeLessThan(300);
  });

  it.each(titled(allRoutes))('%s works for its allowed caller', async (_title, route) => {
    const fixture = await createRouteFixture(t.ctx, route);
    const client = await TestClient.create(app);
    if (route.access !== 'public') await client.signIn(fixture.owner.email);
    const { res } = await call(client, route, fixture);
    if (route.okStatus !== undefined)
      expect(res.status, JSON.stringify(res.body)).toBe(route.okStatus);
    else
      expect(
        res.status >= 200 && res.status < 300,
        `${res.status} ${JSON.stringify(res.body)}`,
      ).toBe(true);
  });
});
