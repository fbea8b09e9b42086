/**
 * Class invitations: the instructor names addresses, each gets an e-mailed link that works for
 * `INVITATION_VALID_DAYS`; opening it shows the class, and the person signed in with the invited
 * address joins it. Inviting an address again sends a new link and voids the old one.
 */
import type {
  AcceptInvitationResult,
  Invitation,
  InvitationPreview,
  InviteRequest,
  InviteResult,
} from '../../shared/contracts/classroom';
import type { SessionUser } from '../auth/session-user';
import { findUserByEmail } from '../auth/user-repository';
import { HttpError } from '../http/http-error';
import { requireClass } from './class-access';
import { addStudent, findClassById, memberEmails } from './class-repository';
import type { ClassroomDeps } from './classroom-deps';
import * as invitations from './invitation-repository';
import { invitationMail } from './invitation-mail';
import { invitationStatus } from './invitation-status';
import { hashInvitationToken, newInvitationToken } from './invitation-token';

/** How long an invitation link works. */
export const INVITATION_VALID_DAYS = 14;
const DAY_MS = 24 * 3600 * 1000;

const invalidLink = (): HttpError =>
  new HttpError(
    404,
    'INVITATION_NOT_FOUND',
    'This invitation link is not valid (perhaps a newer one replaced it); ask your instructor to invite you again.',
  );

/** E-mails an invitation to each address not already in the class. */
export async function inviteStudents(
  deps: ClassroomDeps,
  user: SessionUser,
  classId: string,
  request: InviteRequest,
): Promise<InviteResult> {
  const found = await requireClass(deps.db, user.id, classId, 'instructor');
  const emails = [...new Set(request.emails)];
  const members = await memberEmails(deps.db, classId, emails);
  const alreadyMembers = emails.filter((e) => members.has(e) || e === user.email.toLowerCase());
  const invited: Invitation[] = [];
  for (const email of emails.filter((e) => !alreadyMembers.includes(e))) {
    const sent = await sendInvitation(deps, {
      classId,
      className: found.row.name,
      email,
      instructorName: user.name,
    });
    if (!sent) {
      const earlier =
        invited.length > 0
          ? ` Invitations to ${invited.map((i) => i.email).join(', ')} were sent.`
          : '';
      const message = `The mail server refused the invitation to ${email}; check the address and try again.${earlier}`;
      throw new HttpError(502, 'MAIL_FAILED', message);
    }
    invited.push(sent);
  }
  return { invited, alreadyMembers };
}

/** Stores a fresh invitation and e-mails its link; undefined (and nothing stored) when the mail fails. */
async function sendInvitation(
  deps: ClassroomDeps,
  to: { classId: string; className: string; email: string; instructorName: string },
): Promise<Invitation | undefined> {
  const { token, tokenHash } = newInvitationToken();
  const expiresAt = new Date(deps.now().getTime() + INVITATION_VALID_DAYS * DAY_MS);
  const row = await invitations.replaceInvitation(deps.db, {
    classId: to.classId,
    email: to.email,
    tokenHash,
    expiresAt,
  });
  const link = `${deps.publicUrl}/join/${token}`;
  try {
    await deps.mailer.send(
      invitationMail({
        to: to.email,
        instructorName: to.instructorName,
        className: to.className,
        link,
        validDays: INVITATION_VALID_DAYS,
      }),
    );
  } catch {
    await invitations.deleteInvitation(deps.db, to.classId, row.id);
    return undefined;
  }
  const { createdAt } = row;
  return {
    id: row.id,
    email: to.email,
    status: 'open',
    createdAt: createdAt.toISOString(),
    expiresAt: expiresAt.toISOString(),
  };
}

/** Withdraws an invitation not yet accepted (the class's instructor only). */
export async function revokeInvitation(
  deps: ClassroomDeps,
  user: SessionUser,
  classId: string,
  invitationId: string,
): Promise<void> {
  await requireClass(deps.db, user.id, classId, 'instructor');
  const open = await invitations.listOpenInvitations(deps.db, classId);
  if (
    !open.some((i) => i.id === invitationId) ||
    !(await invitations.deleteInvitation(deps.db, classId, invitationId))
  ) {
    throw new HttpError(
      404,
      'NOT_FOUND',
      'That invitation was not found (or was already accepted).',
    );
  }
}

/** What an invitation link offers; anyone holding the link may ask. */
export async function previewInvitation(
  deps: ClassroomDeps,
  token: string,
): Promise<InvitationPreview> {
  const { invitation, klass } = await loadByToken(deps, token);
  const account = await findUserByEmail(deps.db, invitation.email);
  return {
    className: klass.row.name,
    instructorName: klass.instructorName,
    email: invitation.email,
    status: invitationStatus(invitation, deps.now()),
    hasAccount: account !== undefined,
  };
}

/**
 * Joins the class for the signed-in user, who must use the invited address. Accepting again is
 * harmless; an expired link answers 410 `INVITATION_EXPIRED`, another address 403
 * `INVITATION_FOR_OTHER_ADDRESS`, a link accepted by someone else 409 `INVITATION_USED`.
 */
export async function acceptInvitation(
  deps: ClassroomDeps,
  user: SessionUser,
  token: string,
): Promise<AcceptInvitationResult> {
  const { invitation, klass } = await loadByToken(deps, token);
  const result = { classId: klass.row.id, className: klass.row.name };
  if (invitation.acceptedBy === user.id) return result;
  if (invitation.acceptedAt)
    throw new HttpError(
      409,
      'INVITATION_USED',
      'This invitation was already used; ask your instructor to invite you again.',
    );
  if (invitation.email !== user.email.toLowerCase()) {
    throw new HttpError(
      403,
      'INVITATION_FOR_OTHER_ADDRESS',
      `This invitation is for ${invitation.email}, but you are signed in as ${user.email}. Sign out and sign in (or register) with ${invitation.email}.`,
    );
  }
  if (invitationStatus(invitation, deps.now()) === 'expired') {
    throw new HttpError(
      410,
      'INVITATION_EXPIRED',
      'This invitation has expired; ask your instructor to invite you again.',
    );
  }
  if (klass.row.instructorId === user.id)
    throw new HttpError(
      409,
      'ALREADY_INSTRUCTOR',
      'You teach this class, so you cannot join it as a student.',
    );
  await addStudent(deps.db, klass.row.id, user.id);
  await invitations.markAccepted(deps.db, invitation.id, user.id, deps.now());
  return result;
}

async function loadByToken(deps: ClassroomDeps, token: string) {
  if (!/^[A-Za-z0-9_-]{20,100}$/.test(token)) throw invalidLink();
  const invitation = await invitations.findInvitationByTokenHash(
    deps.db,
    hashInvitationToken(token),
  );
  const klass = invitation ? await findClassById(deps.db, invitation.classId) : undefined;
  if (!invitation || !klass) throw invalidLink();
  return { invitation, klass };
}
