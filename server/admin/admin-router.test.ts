import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import {
  AdminUserListSchema,
  AdminUserResponseSchema,
  OutboxListSchema,
} from '../../shared/contracts/admin';
import { ApiErrorSchema } from '../../shared/contracts/api-error';
import { createApp } from '../app';
import { createTestUser, signedInClient } from '../testing/test-client';
import { createTestContext, type TestContext } from '../testing/test-context';
import { waitForMail } from '../testing/wait-for-mail';

describe('the admin API', () => {
  let t: TestContext;
  beforeEach(async () => {
    t = await createTestContext();
  });
  afterEach(async () => {
    await t.close();
  });

  it('lists users by e-mail without password hashes', async () => {
    const app = createApp(t.ctx);
    await createTestUser(t.ctx, { email: 'zed@example.test' });
    const { client } = await signedInClient(app, t.ctx, {
      role: 'admin',
      email: 'admin@example.test',
    });
    const res = await client.get('/api/admin/users');
    const { users } = AdminUserListSchema.parse(res.body);
    expect(users.map((u) => u.email)).toEqual(['admin@example.test', 'zed@example.test']);
    expect(JSON.stringify(res.body)).not.toMatch(/\$2[aby]\$/);
  });

  it('changes a role, which takes effect on the user’s next request', async () => {
    const app = createApp(t.ctx);
    const { client: admin } = await signedInClient(app, t.ctx, { role: 'admin' });
    const { client: member, user } = await signedInClient(app, t.ctx, { role: 'member' });
    expect((await member.get('/api/admin/users')).status).toBe(403);
    const res = await admin.patch(`/api/admin/users/${user.id}`).send({ role: 'admin' });
    expect(AdminUserResponseSchema.parse(res.body).user.role).toBe('admin');
    expect((await member.get('/api/admin/users')).status).toBe(200);
  });

  it('does not let an administrator demote or disable themselves', async () => {
    const app = createApp(t.ctx);
    const { client, user } = await signedInClient(app, t.ctx, { role: 'admin' });
    for (const patch of [{ role: 'member' }, { disabled: true }]) {
      const res = await client.patch(`/api/admin/users/${user.id}`).send(patch);
      expect(res.status).toBe(409);
      expect(ApiErrorSchema.parse(res.body).error.code).toBe('CANNOT_CHANGE_SELF');
    }
    expect((await client.get('/api/admin/users')).status).toBe(200);
  });

  it('answers 404 for an unknown or malformed user id and 400 naming an unknown role', async () => {
    const { client } = await signedInClient(createApp(t.ctx), t.ctx, { role: 'admin' });
    expect(
      (
        await client
          .patch('/api/admin/users/00000000-0000-4000-8000-000000000000')
          .send({ role: 'member' })
      ).status,
    ).toBe(404);
    expect((await client.patch('/api/admin/users/42').send({ role: 'member' })).status).toBe(404);
    const { user } = await createTestUser(t.ctx);
    const bad = await client.patch(`/api/admin/users/${user.id}`).send({ role: 'owner' });
    expect(bad.status).toBe(400);
    expect(ApiErrorSchema.parse(bad.body).error.fields?.map((f) => f.path)).toEqual(['role']);
  });

  it('lists mail the local SMTP server received, newest first, as plain text', async () => {
    const mailer = t.ctx.mailer;
    await mailer.send({
      to: 'first@example.test',
      subject: 'Première',
      text: 'Open http://localhost:3000/x',
    });
    await waitForMail(t.ctx.db, 'first@example.test');
    await mailer.send({
      to: 'second@example.test',
      subject: 'Second',
      text: 'Body',
      html: '<script>alert(1)</script>',
    });
    await waitForMail(t.ctx.db, 'second@example.test');
    const { client } = await signedInClient(createApp(t.ctx), t.ctx, { role: 'admin' });
    const { messages } = OutboxListSchema.parse((await client.get('/api/admin/outbox')).body);
    expect(messages.map((m) => [m.to, m.subject, m.text])).toEqual([
      [['second@example.test'], 'Second', 'Body'],
      [['first@example.test'], 'Première', 'Open http://localhost:3000/x'],
    ]);
    expect(messages[0]?.from).toBe('no-reply@localhost');
  });
});
