/**
 * Property: whatever body anyone sends to any mutating route, the server answers below 500 and
 * nobody else's data changes. Each payload is sent both by the route's allowed caller (on their
 * own resources) and by a stranger aimed at a bystander's resources.
 */
import fc from 'fast-check';
import type { Express } from 'express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { TestClient } from '../../server/testing/test-client';
import { createTestContext, type TestContext } from '../../server/testing/test-context';
import { digestRowsMentioning } from './db-snapshot';
import { createRouteFixture, fillPath } from './route-fixture';
import {
  allRoutes,
  isMutating,
  routeTitle,
  type RouteCase,
  type RouteFixture,
} from './route-table';

/** Ids that identify a fixture's users and resources. */
function idsOf(fixture: RouteFixture): string[] {
  return [fixture.owner.id, fixture.viewer.id, fixture.editor.id, ...Object.values(fixture.params)];
}

/** Payloads: any JSON value, the valid body with fields replaced or added, or raw text. */
function payloads(
  valid: Record<string, unknown> | undefined,
): fc.Arbitrary<{ raw: string } | { json: unknown }> {
  const keys = Object.keys(valid ?? {});
  const mutatedValid = fc
    .record({ key: keys.length ? fc.constantFrom(...keys) : fc.string(), value: fc.jsonValue() })
    .map(({ key, value }) => ({ json: { ...valid, [key]: value } }));
  return fc.oneof(
    fc.jsonValue().map((json) => ({ json })),
    fc
      .dictionary(
        fc.oneof(fc.constantFrom(...keys, '__proto__', 'constructor'), fc.string()),
        fc.jsonValue(),
      )
      .map((json) => ({ json })),
    mutatedValid,
    fc.string().map((raw) => ({ raw })),
  );
}

describe('random payloads on every mutating route', () => {
  let t: TestContext;
  let app: Express;
  beforeAll(async () => {
    t = await createTestContext();
    app = createApp(t.ctx);
  });
  afterAll(async () => {
    await t.close();
  });

  async function send(
    client: TestClient,
    route: RouteCase,
    path: string,
    payload: { raw: string } | { json: unknown },
  ) {
    const test = client.send(route.method, path).set('content-type', 'application/json');
    return 'raw' in payload ? test.send(payload.raw) : test.send(JSON.stringify(payload.json));
  }

  const mutating = allRoutes.filter(isMutating).map((r) => [routeTitle(r), r] as const);
  it.each(mutating)(
    '%s never answers 5xx and never changes another user’s data',
    async (_title, route) => {
      const mine = await createRouteFixture(t.ctx, route);
      const bystander = await createRouteFixture(t.ctx, route);
      const valid = (await route.body?.(mine)) as Record<string, unknown> | undefined;
      const owner = await TestClient.create(app);
      if (route.access !== 'public') await owner.signIn(mine.owner.email);
      const stranger = await TestClient.create(app);
      await stranger.signIn(mine.viewer.email);
      const watched = idsOf(bystander);
      await fc.assert(
        fc.asyncProperty(payloads(valid), async (payload) => {
          const before = await digestRowsMentioning(t.ctx.db, watched);
          const asOwner = await send(owner, route, fillPath(route.path, mine.params), payload);
          const asStranger = await send(
            stranger,
            route,
            fillPath(route.path, bystander.params),
            payload,
          );
          expect(asOwner.status, `owner: ${JSON.stringify(asOwner.body)}`).toBeLessThan(500);
          expect(asStranger.status, `stranger: ${JSON.stringify(asStranger.body)}`).toBeLessThan(
            500,
          );
          expect(
            await digestRowsMentioning(t.ctx.db, watched),
            'a bystander’s rows changed',
          ).toEqual(before);
        }),
        { numRuns: route.fuzzRuns ?? 20 },
      );
    },
  );
});
