/**
 * Every mutating route with a body, sent malformed JSON, an oversized body, an unknown field and
 * each field with a value of the wrong type by a caller who may use it: a 400 that names the
 * field, and nothing stored.
 */
import type { Express } from 'express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ApiErrorSchema } from '../../shared/contracts/api-error';
import { createApp } from '../../server/app';
import { TestClient } from '../../server/testing/test-client';
import { createTestContext, type TestContext } from '../../server/testing/test-context';
import { digestDatabase } from './db-snapshot';
import { createRouteFixture, fillPath } from './route-fixture';
import { allRoutes, isMutating, routeTitle, type RouteCase } from './route-table';

/**
 * A value of another JSON type than `value`: a boolean for text and numbers (some fields take a
 * number or a quantity text such as "2 min", none takes true), text for everything else.
 */
function wrongTypeFor(value: unknown): unknown {
  if (typeof value === 'string' || typeof value === 'number') return true;
  return 'not-the-right-type';
}

describe('malformed bodies on every mutating route', () => {
  let t: TestContext;
  let app: Express;
  beforeAll(async () => {
    t = await createTestContext();
    app = createApp(t.ctx);
  });
  afterAll(async () => {
    await t.close();
  });

  /** Signs in the route's allowed caller and returns its client, path and valid body. */
  async function setUp(route: RouteCase) {
    const fixture = await createRouteFixture(t.ctx, route);
    const client = await TestClient.create(app);
    if (route.access !== 'public') await client.signIn(fixture.owner.email);
    const body = (await route.body?.(fixture)) as Record<string, unknown>;
    return { client, path: fillPath(route.path, fixture.params), body };
  }

  async function expectNothingStored(
    send: () => Promise<{ status: number; body: unknown }>,
    label = '',
  ) {
    const before = await digestDatabase(t.ctx.db);
    const res = await send();
    expect(
      await digestDatabase(t.ctx.db),
      `${label} answered ${res.status} and changed the database`,
    ).toEqual(before);
    return { status: res.status, error: ApiErrorSchema.parse(res.body).error };
  }

  const withBodies = allRoutes.filter((r) => isMutating(r) && r.body !== undefined);
  const titled = withBodies.map((r) => [routeTitle(r), r] as const);

  it.each(titled)('%s answers 400 INVALID_JSON to malformed JSON', async (_title, route) => {
    const { client, path } = await setUp(route);
    const { status, error } = await expectNothingStored(() =>
      client
        .send(route.method, path)
        .set('content-type', 'application/json')
        .send('{"name": "unterminated'),
    );
    expect([status, error.code]).toEqual([400, 'INVALID_JSON']);
  });

  it.each(titled)(
    '%s answers 400 BODY_TOO_LARGE, giving the limit, to a body over 1 MB',
    async (_title, route) => {
      const { client, path, body } = await setUp(route);
      const { status, error } = await expectNothingStored(() =>
        client.send(route.method, path).send({ ...body, padding: 'x'.repeat(1_100_000) }),
      );
      expect([status, error.code]).toEqual([400, 'BODY_TOO_LARGE']);
      expect(error.message).toContain('larger than the 1 MB limit');
      expect(error.fields).toEqual([{ path: '(body)', message: error.message }]);
    },
  );

  it.each(titled)('%s answers 400 with an unknown field at its own path', async (_title, route) => {
    const { client, path, body } = await setUp(route);
    const { status, error } = await expectNothingStored(() =>
      client.send(route.method, path).send({ ...body, sneakyExtra: true }),
    );
    expect(status).toBe(400);
    expect(error.fields).toEqual([
      { path: 'sneakyExtra', message: expect.stringContaining('"sneakyExtra"') },
    ]);
  });

  it.each(titled)(
    '%s answers 400 naming each field sent with the wrong type',
    async (_title, route) => {
      const { client, path, body } = await setUp(route);
      for (const key of Object.keys(body).filter((k) => !route.anyTypeFields?.includes(k))) {
        const { status, error } = await expectNothingStored(
          () => client.send(route.method, path).send({ ...body, [key]: wrongTypeFor(body[key]) }),
          `field ${key}`,
        );
        expect(status, `field ${key}`).toBe(400);
        expect(
          error.fields?.map((f) => f.path.split(/[.[]/)[0]),
          `field ${key}`,
        ).toContain(key);
      }
    },
  );

  it.each(titled)('%s answers 400 to a body that is not an object', async (_title, route) => {
    const { client, path } = await setUp(route);
    for (const wrong of [[1, 2, 3], 'just text', 42, null]) {
      const { status } = await expectNothingStored(() =>
        client
          .send(route.method, path)
          .set('content-type', 'application/json')
          .send(JSON.stringify(wrong)),
      );
      expect(status, JSON.stringify(wrong)).toBe(400);
    }
  });
});
