import request from 'supertest';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { ApiErrorSchema } from '../shared/contracts/api-error';
import { HealthSchema } from '../shared/contracts/health';
import { createApp } from './app';
import { createTestContext, type TestContext } from './testing/test-context';

describe('createApp', () => {
  let t: TestContext;
  beforeEach(async () => {
    t = await createTestContext();
  });
  afterEach(async () => {
    await t.close();
  });

  it('answers GET /api/health with the database status and version', async () => {
    const res = await request(createApp(t.ctx)).get('/api/health');
    expect(res.status).toBe(200);
    const body = HealthSchema.parse(res.body);
    expect(body).toEqual({ status: 'ok', db: 'ok', dbKind: t.database.kind, version: 'test' });
  });

  it('answers an unknown API route with a JSON 404', async () => {
    const res = await request(createApp(t.ctx)).get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(ApiErrorSchema.parse(res.body).error.code).toBe('NOT_FOUND');
  });

  it('rejects malformed JSON with a 400 that names the body', async () => {
    const res = await request(createApp(t.ctx))
      .post('/api/health')
      .set('content-type', 'application/json')
      .send('{"a":');
    expect(res.status).toBe(400);
    const { error } = ApiErrorSchema.parse(res.body);
    expect(error.code).toBe('INVALID_JSON');
    expect(error.fields).toEqual([{ path: '(body)', message: error.message }]);
  });

  it('rejects a body over the size limit with a 400 that gives the limit', async () => {
    const res = await request(createApp(t.ctx))
      .post('/api/health')
      .set('content-type', 'application/json')
      .send(JSON.stringify({ blob: 'x'.repeat(1_100_000) }));
    expect(res.status).toBe(400);
    const { error } = ApiErrorSchema.parse(res.body);
    expect(error.code).toBe('BODY_TOO_LARGE');
    expect(error.message).toContain('larger than the 1 MB limit');
    expect(error.fields).toEqual([{ path: '(body)', message: error.message }]);
  });

  it('parses a body just under the size limit and goes on to the next check', async () => {
    const res = await request(createApp(t.ctx))
      .post('/api/health')
      .set('content-type', 'application/json')
      .send(JSON.stringify({ blob: 'x'.repeat(1_000_000) }));
    // Past the parser, the missing CSRF token is the next refusal.
    expect([res.status, ApiErrorSchema.parse(res.body).error.code]).toEqual([403, 'CSRF_FAILED']);
  });

  it('sends security headers', async () => {
    const res = await request(createApp(t.ctx)).get('/api/health');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['content-security-policy']).toContain("default-src 'self'");
    expect(res.headers['x-powered-by']).toBeUndefined();
  });
});
