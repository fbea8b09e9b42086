/**
 * Class invitations end to end through the API and the local SMTP server: the e-mailed link,
 * registering with the invited address, joining, and the ways a link stops working.
 */
import type { Express } from 'express';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { ApiErrorSchema } from '../../shared/contracts/api-error';
import { MeResponseSchema } from '../../shared/contracts/auth';
import {
  AcceptInvitationResultSchema,
  ClassDetailSchema,
  ClassListSchema,
  InvitationPreviewSchema,
  InviteResultSchema,
  RosterSchema,
} from '../../shared/contracts/classroom';
import { createApp } from '../../server/app';
import { addStudent } from '../../server/classroom/class-repository';
import { TestClient, createTestUser, signedInClient } from '../../server/testing/test-client';
import { createTestContext, type TestContext } from '../../server/testing/test-context';
import { waitForMail } from '../../server/testing/wait-for-mail';
import { makeClass, makeInvitation } from './classroom-fixtures';

/** The token of the `/join/<token>` link in a message's text. */
function joinToken(text: string): string {
  const match = /\/join\/([A-Za-z0-9_-]+)/.exec(text);
  if (!match?.[1]) throw new Error(`No join link in: ${text}`);
  return match[1];
}

describe('class invitations', () => {
  let t: TestContext;
  let app: Express;
  let teacher: TestClient;
  let classId: string;

  beforeEach(async () => {
    t = await createTestContext();
    app = createApp(t.ctx);
    const signedIn = await signedInClient(app, t.ctx, { role: 'instructor', name: 'Theo Teacher' });
    teacher = signedIn.client;
    classId = await makeClass(t.ctx, signedIn.user.id, [], 'Tabletop physics');
  });
  afterEach(async () => {
    await t.close();
  });

  it('e-mails a link with which a newcomer registers and joins the class', async () => {
    const invite = await teacher
      .post(`/api/classes/${classId}/invitations`)
      .send({ emails: ['  Sam@Example.test '] });
    expect(invite.status).toBe(201);
    const result = InviteResultSchema.parse(invite.body);
    expect(result.invited.map((i) => [i.email, i.status])).toEqual([['sam@example.test', 'open']]);

    const mail = await waitForMail(t.ctx.db, 'sam@example.test');
    expect(mail.subject).toBe('Join "Tabletop physics" on Tidewright');
    expect(mail.textBody).toContain(`${t.ctx.auth.publicUrl}/join/`);
    const token = joinToken(mail.textBody);

    const visitor = await TestClient.create(app);
    const preview = InvitationPreviewSchema.parse(
      (await visitor.get(`/api/invitations/${token}`)).body,
    );
    expect(preview).toEqual({
      className: 'Tabletop physics',
      instructorName: 'Theo Teacher',
      email: 'sam@example.test',
      status: 'open',
      hasAccount: false,
    });

    const registered = await visitor
      .post('/api/auth/register')
      .send({ name: 'Sam Student', email: 'sam@example.test', password: 'gravel beds drain fast' });
    expect(registered.status).toBe(201);
    const accepted = await visitor.post(`/api/invitations/${token}/accept`);
    expect(accepted.status).toBe(200);
    expect(AcceptInvitationResultSchema.parse(accepted.body)).toEqual({
      classId,
      className: 'Tabletop physics',
    });

    const classes = ClassListSchema.parse((await visitor.get('/api/classes')).body);
    expect(classes.items.map((c) => [c.id, c.myRole, c.instructorName])).toEqual([
      [classId, 'student', 'Theo Teacher'],
    ]);
    const roster = RosterSchema.parse((await teacher.get(`/api/classes/${classId}/roster`)).body);
    expect(roster.students.map((s) => [s.name, s.email])).toEqual([
      ['Sam Student', 'sam@example.test'],
    ]);
    expect(roster.invitations).toEqual([]);
    expect(
      InvitationPreviewSchema.parse((await visitor.get(`/api/invitations/${token}`)).body).status,
    ).toBe('accepted');
    expect((await visitor.post(`/api/invitations/${token}/accept`)).status).toBe(200);
  });

  it('lets someone who already has an account sign in and join', async () => {
    const { user, password } = await createTestUser(t.ctx, {
      email: 'kim@example.test',
      name: 'Kim',
    });
    await teacher.post(`/api/classes/${classId}/invitations`).send({ emails: [user.email] });
    const token = joinToken((await waitForMail(t.ctx.db, user.email)).textBody);
    const kim = await TestClient.create(app);
    expect(
      InvitationPreviewSchema.parse((await kim.get(`/api/invitations/${token}`)).body).hasAccount,
    ).toBe(true);
    await kim.signIn(user.email, password);
    expect((await kim.post(`/api/invitations/${token}/accept`)).status).toBe(200);
    expect(ClassDetailSchema.parse((await kim.get(`/api/classes/${classId}`)).body).myRole).toBe(
      'student',
    );
  });

  it('reports addresses already in the class instead of inviting them again', async () => {
    const { user } = await createTestUser(t.ctx, { email: 'member@example.test' });
    await addStudent(t.ctx.db, classId, user.id);
    const res = await teacher
      .post(`/api/classes/${classId}/invitations`)
      .send({ emails: ['member@example.test', 'new@example.test', 'new@example.test'] });
    const result = InviteResultSchema.parse(res.body);
    expect(result.alreadyMembers).toEqual(['member@example.test']);
    expect(result.invited.map((i) => i.email)).toEqual(['new@example.test']);
  });

  it('refuses a link used by someone signed in with another address, and joins nothing', async () => {
    const token = await makeInvitation(t.ctx, classId, 'sam@example.test');
    const { client: other } = await signedInClient(app, t.ctx, { email: 'pat@example.test' });
    const res = await other.post(`/api/invitations/${token}/accept`);
    expect(res.status).toBe(403);
    const error = ApiErrorSchema.parse(res.body).error;
    expect(error.code).toBe('INVITATION_FOR_OTHER_ADDRESS');
    expect(error.message).toContain('sam@example.test');
    expect(ClassListSchema.parse((await other.get('/api/classes')).body).items).toEqual([]);
  });

  it('refuses an expired link with 410 and shows it as expired', async () => {
    const token = await makeInvitation(
      t.ctx,
      classId,
      'late@example.test',
      new Date(Date.now() - 1000),
    );
    const { client } = await signedInClient(app, t.ctx, { email: 'late@example.test' });
    expect(
      InvitationPreviewSchema.parse((await client.get(`/api/invitations/${token}`)).body).status,
    ).toBe('expired');
    const res = await client.post(`/api/invitations/${token}/accept`);
    expect([res.status, ApiErrorSchema.parse(res.body).error.code]).toEqual([
      410,
      'INVITATION_EXPIRED',
    ]);
  });

  it('voids the old link when the address is invited again, and when the invitation is withdrawn', async () => {
    const first = await makeInvitation(t.ctx, classId, 'sam@example.test');
    const again = InviteResultSchema.parse(
      (
        await teacher
          .post(`/api/classes/${classId}/invitations`)
          .send({ emails: ['sam@example.test'] })
      ).body,
    );
    const visitor = await TestClient.create(app);
    const stale = await visitor.get(`/api/invitations/${first}`);
    expect([stale.status, ApiErrorSchema.parse(stale.body).error.code]).toEqual([
      404,
      'INVITATION_NOT_FOUND',
    ]);
    const token = joinToken((await waitForMail(t.ctx.db, 'sam@example.test')).textBody);
    expect((await visitor.get(`/api/invitations/${token}`)).status).toBe(200);
    const roster = RosterSchema.parse((await teacher.get(`/api/classes/${classId}/roster`)).body);
    expect(roster.invitations.map((i) => i.id)).toEqual([again.invited[0]?.id]);
    expect(
      (await teacher.delete(`/api/classes/${classId}/invitations/${again.invited[0]?.id}`)).status,
    ).toBe(204);
    expect((await visitor.get(`/api/invitations/${token}`)).status).toBe(404);
  });

  it('answers a malformed or unknown token with the same 404', async () => {
    const visitor = await TestClient.create(app);
    for (const token of ['short', 'x'.repeat(43), '../../etc']) {
      const res = await visitor.get(`/api/invitations/${encodeURIComponent(token)}`);
      expect(res.status).toBe(404);
      expect(ApiErrorSchema.parse(res.body).error.code).toBe('INVITATION_NOT_FOUND');
    }
  });

  it('will not let the instructor join their own class as a student', async () => {
    const me = MeResponseSchema.parse((await teacher.get('/api/auth/me')).body).user;
    const res = InviteResultSchema.parse(
      (await teacher.post(`/api/classes/${classId}/invitations`).send({ emails: [me.email] })).body,
    );
    expect(res.invited).toEqual([]);
    expect(res.alreadyMembers).toHaveLength(1);
  });

  it('names the invalid addresses of a request', async () => {
    const res = await teacher
      .post(`/api/classes/${classId}/invitations`)
      .send({ emails: ['ok@example.test', 'not-an-address'] });
    expect(res.status).toBe(400);
    expect(ApiErrorSchema.parse(res.body).error.fields?.map((f) => f.path)).toEqual(['emails[1]']);
  });
});
