/**
 * `/api/classes`, `/api/lessons` and `/api/invitations`: classes an instructor teaches, lessons
 * (a scenario snapshot plus prediction questions), students' predictions and their runs.
 *
 * Visibility: an instructor (or admin) sees only the classes they teach and the lessons they own;
 * a student sees only the classes they belong to, the published lessons of those classes and their
 * own answers. Anything else answers 404 `NOT_FOUND` (absent and hidden are not told apart); a
 * student asking for an instructor's action on their own class answers 403 `NOT_CLASS_INSTRUCTOR`.
 *
 * Numbers are SI: a period in seconds, a level in metres above the vessel's floor.
 */
import { z } from 'zod';
import { EmailSchema } from './auth';
import { ClassRoleSchema, LessonListItemSchema } from './classroom-lessons';

export * from './classroom-lessons';
export * from './classroom-questions';

/** A class's name as people type it. */
export const ClassNameSchema = z
  .string()
  .trim()
  .min(1, { error: 'Give the class a name.' })
  .max(200, { error: 'Use at most 200 characters.' });

/** `POST /api/classes` (instructor or admin) and `PATCH /api/classes/:id`. */
export const ClassRequestSchema = z.strictObject({ name: ClassNameSchema });
/** A class to create or rename. */
export type ClassRequest = z.infer<typeof ClassRequestSchema>;

/** One row of `GET /api/classes`: classes I teach first, then those I attend; each newest first. */
export const ClassListItemSchema = z.object({
  id: z.uuid(),
  name: z.string(),
  instructorName: z.string(),
  myRole: ClassRoleSchema,
  studentCount: z.number().int().nonnegative(),
  lessonCount: z.number().int().nonnegative(),
  createdAt: z.iso.datetime({ offset: true }),
});
/** One class in the list. */
export type ClassListItem = z.infer<typeof ClassListItemSchema>;

/** `GET /api/classes`. */
export const ClassListSchema = z.object({ items: z.array(ClassListItemSchema) });
/** The caller's classes. */
export type ClassList = z.infer<typeof ClassListSchema>;

/** `GET /api/classes/:id`: the class and its lessons (students see the published ones only). */
export const ClassDetailSchema = z.object({
  id: z.uuid(),
  name: z.string(),
  instructorName: z.string(),
  myRole: ClassRoleSchema,
  studentCount: z.number().int().nonnegative(),
  lessons: z.array(LessonListItemSchema),
  createdAt: z.iso.datetime({ offset: true }),
});
/** A class with its lessons. */
export type ClassDetail = z.infer<typeof ClassDetailSchema>;

/** A student on the roster. */
export const StudentSchema = z.object({
  userId: z.uuid(),
  name: z.string(),
  email: z.string(),
  joinedAt: z.iso.datetime({ offset: true }),
});
/** A student on the roster. */
export type Student = z.infer<typeof StudentSchema>;

/** An invitation's state: `open` (link works), `accepted` or `expired`. */
export const InvitationStatusSchema = z.enum(['open', 'accepted', 'expired']);
/** An invitation's state. */
export type InvitationStatus = z.infer<typeof InvitationStatusSchema>;

/** An invitation as its instructor sees it (never the token). */
export const InvitationSchema = z.object({
  id: z.uuid(),
  email: z.string(),
  status: InvitationStatusSchema,
  createdAt: z.iso.datetime({ offset: true }),
  expiresAt: z.iso.datetime({ offset: true }),
});
/** An invitation. */
export type Invitation = z.infer<typeof InvitationSchema>;

/** `GET /api/classes/:id/roster` (instructor of the class). */
export const RosterSchema = z.object({
  students: z.array(StudentSchema),
  invitations: z.array(InvitationSchema),
});
/** The roster and the invitations not yet accepted. */
export type Roster = z.infer<typeof RosterSchema>;

/** The most addresses one invitation request may name. */
export const MAX_INVITES_PER_REQUEST = 50;

/** `POST /api/classes/:id/invitations` (instructor of the class): addresses to invite. */
export const InviteRequestSchema = z.strictObject({
  emails: z
    .array(EmailSchema)
    .min(1, { error: 'Name at least one e-mail address.' })
    .max(MAX_INVITES_PER_REQUEST, {
      error: `Invite at most ${MAX_INVITES_PER_REQUEST} people at a time.`,
    }),
});
/** Addresses to invite. */
export type InviteRequest = z.infer<typeof InviteRequestSchema>;

/**
 * Answer of `POST /api/classes/:id/invitations` (201): the invitations e-mailed (inviting an
 * address again sends a fresh link and revokes the old one) and the addresses already in the class.
 */
export const InviteResultSchema = z.object({
  invited: z.array(InvitationSchema),
  alreadyMembers: z.array(z.string()),
});
/** What an invitation request did. */
export type InviteResult = z.infer<typeof InviteResultSchema>;

/**
 * `GET /api/invitations/:token` (no sign-in needed: the token is the secret): what the e-mailed
 * link offers. `hasAccount` says whether to offer sign-in or registration.
 */
export const InvitationPreviewSchema = z.object({
  className: z.string(),
  instructorName: z.string(),
  email: z.string(),
  status: InvitationStatusSchema,
  hasAccount: z.boolean(),
});
/** What an invitation link offers. */
export type InvitationPreview = z.infer<typeof InvitationPreviewSchema>;

/**
 * `POST /api/invitations/:token/accept` (signed in as the invited address): joins the class.
 * Accepting again is harmless.
 */
export const AcceptInvitationResultSchema = z.object({ classId: z.uuid(), className: z.string() });
/** The class joined. */
export type AcceptInvitationResult = z.infer<typeof AcceptInvitationResultSchema>;
