/**
 * Every mutating route whose body nests objects, sent an unknown field inside the first nested
 * object: a 400 whose field path is the unknown field's own (`scenario.vessels[0].sneakyNested`),
 * with a message naming it, and nothing stored.
 */
import type { Express } from 'express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ApiErrorSchema } from '../../shared/contracts/api-error';
import { formatIssuePath } from '../../shared/scenario/index';
import { createApp } from '../../server/app';
import { TestClient } from '../../server/testing/test-client';
import { createTestContext, type TestContext } from '../../server/testing/test-context';
import { digestDatabase } from './db-snapshot';
import { createRouteFixture, fillPath } from './route-fixture';
import { allRoutes, routeTitle } from './route-table';

/** The routes whose valid bodies hold an object inside the body (directly or in a list). */
const NESTED = new Set([
  'POST /api/systems/import',
  'POST /api/systems/:systemId/measurements/preview',
  'POST /api/systems/:systemId/measurements',
  'POST /api/systems/:systemId/measurements/stopwatch',
  'POST /api/systems/:systemId/calibrations',
  'POST /api/systems/:systemId/sweeps',
  'POST /api/lessons',
  'PUT /api/lessons/:assignedLessonId/answer',
]);

const isPlainObject = (value: unknown): value is Record<string, unknown> =>
  typeof value === 'object' && value !== null && !Array.isArray(value);

/** The path of the first object nested in `body`, depth first, or null when there is none. */
function firstNestedObject(body: Record<string, unknown>): PropertyKey[] | null {
  const visit = (value: unknown, path: PropertyKey[]): PropertyKey[] | null => {
    if (Array.isArray(value)) {
      for (const [index, item] of value.entries()) {
        const found = visit(item, [...path, index]);
        if (found) return found;
      }
      return null;
    }
    return isPlainObject(value) && path.length > 0 ? path : null;
  };
  for (const [key, value] of Object.entries(body)) {
    const found = visit(value, [key]);
    if (found) return found;
  }
  return null;
}

/** A deep copy of `body` with `extra: true` added to the object at `path`. */
function withExtraAt(
  body: Record<string, unknown>,
  path: PropertyKey[],
  extra: string,
): Record<string, unknown> {
  const copy = structuredClone(body);
  let target: unknown = copy;
  for (const key of path) target = (target as Record<PropertyKey, unknown>)[key];
  (target as Record<string, unknown>)[extra] = true;
  return copy;
}

describe('unknown fields inside nested objects', () => {
  let t: TestContext;
  let app: Express;
  beforeAll(async () => {
    t = await createTestContext();
    app = createApp(t.ctx);
  });
  afterAll(async () => {
    await t.close();
  });

  const routes = allRoutes.filter((route) => NESTED.has(routeTitle(route)));

  it('covers every route the list names', () => {
    expect(routes.map(routeTitle).sort()).toEqual([...NESTED].sort());
  });

  it.each(routes.map((r) => [routeTitle(r), r] as const))(
    '%s reports the unknown nested field at its own path',
    async (_title, route) => {
      const fixture = await createRouteFixture(t.ctx, route);
      const client = await TestClient.create(app);
      await client.signIn(fixture.owner.email);
      const body = (await route.body?.(fixture)) as Record<string, unknown>;
      const nested = firstNestedObject(body);
      expect(nested, 'the valid body has a nested object').not.toBeNull();
      if (!nested) return;
      const before = await digestDatabase(t.ctx.db);
      const res = await client
        .send(route.method, fillPath(route.path, fixture.params))
        .send(withExtraAt(body, nested, 'sneakyNested'));
      expect(await digestDatabase(t.ctx.db)).toEqual(before);
      expect(res.status).toBe(400);
      expect(ApiErrorSchema.parse(res.body).error.fields).toContainEqual({
        path: formatIssuePath([...nested, 'sneakyNested']),
        message: expect.stringContaining('"sneakyNested"'),
      });
    },
  );
});
