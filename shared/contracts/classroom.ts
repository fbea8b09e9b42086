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
import { BedSummarySchema, RunStatusSchema, VerdictSchema, VesselSummarySchema } from './runs';
import { ScenarioDocumentSchema, VerdictStatusSchema } from './systems';

/** What a bed did over a run: the engine's bed states. */
export const BedRegimeSchema = BedSummarySchema.shape.state;
/** A bed's regime: `cycling`, `spill-stall`, `siphon-lock`, `flooded` or `idle`. */
export type BedRegime = z.infer<typeof BedRegimeSchema>;

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

/** The caller's part in a class. */
export const ClassRoleSchema = z.enum(['instructor', 'student']);
/** `instructor` (teaches it) or `student` (belongs to it). */
export type ClassRole = z.infer<typeof ClassRoleSchema>;

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

/** Where a student stands with a lesson. */
export const LessonProgressSchema = z.enum(['not-started', 'predicted', 'ran']);
/** `not-started`, `predicted` (answers saved) or `ran` (ran the system after predicting). */
export type LessonProgress = z.infer<typeof LessonProgressSchema>;

/** One lesson in a class or in the library. */
export const LessonListItemSchema = z.object({
  id: z.uuid(),
  title: z.string(),
  classId: z.uuid().nullable(),
  questionCount: z.number().int().nonnegative(),
  published: z.boolean(),
  revealed: z.boolean(),
  /** Instructor: students who answered. Student: null. */
  answerCount: z.number().int().nonnegative().nullable(),
  /** Student: their progress. Instructor: null. */
  myProgress: LessonProgressSchema.nullable(),
  updatedAt: z.iso.datetime({ offset: true }),
});
/** One lesson in a list. */
export type LessonListItem = z.infer<typeof LessonListItemSchema>;

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

const QuestionIdSchema = z
  .string()
  .regex(/^[a-z0-9][a-z0-9-]{0,39}$/, { error: 'Use 1–40 lower-case letters, digits and dashes.' });
const PromptSchema = z.string().trim().min(1, { error: 'Write the question.' }).max(500);
const ExplanationSchema = z.string().trim().max(2000).default('');
const TargetIdSchema = z
  .string()
  .min(1, { error: 'Choose which part of the system the question is about.' });

/** "Predict the cycle period of this bed": a number of seconds, right within ± `tolerance` (fraction). */
export const BedPeriodQuestionSchema = z.strictObject({
  kind: z.literal('bed-period'),
  id: QuestionIdSchema,
  prompt: PromptSchema,
  explanation: ExplanationSchema,
  bedId: TargetIdSchema,
  tolerance: z.number().min(0.01).max(1).default(0.2),
});

/** "What will this bed do: cycle, stall spilling, lock siphoning?": one of `choices`. */
export const BedRegimeQuestionSchema = z.strictObject({
  kind: z.literal('bed-regime'),
  id: QuestionIdSchema,
  prompt: PromptSchema,
  explanation: ExplanationSchema,
  bedId: TargetIdSchema,
  choices: z
    .array(BedRegimeSchema)
    .min(2, { error: 'Offer at least two choices.' })
    .refine((choices) => new Set(choices).size === choices.length, {
      error: 'Offer each choice once.',
    })
    .default(['cycling', 'spill-stall', 'siphon-lock']),
});

/** "How low will this vessel go?": a level in metres above its floor, right within ± `toleranceM`. */
export const VesselLowLevelQuestionSchema = z.strictObject({
  kind: z.literal('vessel-low-level'),
  id: QuestionIdSchema,
  prompt: PromptSchema,
  explanation: ExplanationSchema,
  vesselId: TargetIdSchema,
  toleranceM: z.number().positive().max(1).default(0.02),
});

/** A question of a lesson. */
export const QuestionSchema = z.discriminatedUnion('kind', [
  BedPeriodQuestionSchema,
  BedRegimeQuestionSchema,
  VesselLowLevelQuestionSchema,
]);
/** A question of a lesson. */
export type Question = z.infer<typeof QuestionSchema>;
/** A question as written in a request (defaults not yet filled). */
export type QuestionInput = z.input<typeof QuestionSchema>;

/** A lesson's questions: 1–10, ids unique. */
export const QuestionListSchema = z
  .array(QuestionSchema)
  .min(1, { error: 'Ask at least one question.' })
  .max(10, { error: 'Ask at most 10 questions.' })
  .superRefine((questions, ctx) => {
    const seen = new Set<string>();
    questions.forEach((question, index) => {
      if (seen.has(question.id))
        ctx.addIssue({
          code: 'custom',
          path: [index, 'id'],
          message: 'Each question needs its own id.',
        });
      seen.add(question.id);
    });
  });

const TitleSchema = z.string().trim().min(1, { error: 'Give the lesson a title.' }).max(200);
const IntroductionSchema = z.string().trim().max(5000);

/**
 * `POST /api/lessons` (instructor or admin): a lesson in the library (no `classId`) or in a class
 * the caller teaches. The system is a scenario document, or `systemId` (a system the caller may
 * read) whose scenario is copied: later edits to the system do not change the lesson.
 */
export const CreateLessonRequestSchema = z
  .strictObject({
    title: TitleSchema,
    introduction: IntroductionSchema.default(''),
    scenario: ScenarioDocumentSchema.optional(),
    systemId: z.uuid().optional(),
    questions: QuestionListSchema,
    classId: z.uuid().nullable().default(null),
  })
  .refine((value) => (value.scenario === undefined) !== (value.systemId === undefined), {
    error: 'Give either a scenario or a systemId.',
    path: ['scenario'],
  });
/** A lesson to create. */
export type CreateLessonRequest = z.input<typeof CreateLessonRequestSchema>;

/**
 * `PATCH /api/lessons/:id` (its owner). Publishing shows a class lesson to the students;
 * revealing shows them the simulated answers and explanations. Questions cannot change once a
 * student answered (409 `LESSON_HAS_ANSWERS`).
 */
export const UpdateLessonRequestSchema = z.strictObject({
  title: TitleSchema.optional(),
  introduction: IntroductionSchema.optional(),
  questions: QuestionListSchema.optional(),
  published: z.boolean().optional(),
  revealed: z.boolean().optional(),
});
/** A change to a lesson. */
export type UpdateLessonRequest = z.input<typeof UpdateLessonRequestSchema>;

/**
 * `POST /api/lessons/:id/duplicate` (its owner): a copy into the library (`classId` null, the
 * default) or into a class the caller teaches; the copy is unpublished, unrevealed, unanswered.
 */
export const DuplicateLessonRequestSchema = z.strictObject({
  classId: z.uuid().nullable().default(null),
  title: TitleSchema.optional(),
});
/** Where to copy a lesson. */
export type DuplicateLessonRequest = z.input<typeof DuplicateLessonRequestSchema>;

/** A predicted number (SI: seconds for a period, metres for a level). */
export const NumberPredictionSchema = z.strictObject({
  questionId: z.string(),
  value: z.number().finite().nonnegative(),
});
/** A predicted regime. */
export const ChoicePredictionSchema = z.strictObject({
  questionId: z.string(),
  choice: BedRegimeSchema,
});
/** One prediction: a number or a choice, matching its question's kind. */
export const PredictionSchema = z.union([NumberPredictionSchema, ChoicePredictionSchema]);
/** One prediction. */
export type Prediction = z.infer<typeof PredictionSchema>;

/**
 * `PUT /api/lessons/:id/answer` (a student of the lesson's class): one prediction per question.
 * Allowed until the student runs the lesson (then 409 `ANSWER_LOCKED`).
 */
export const AnswerRequestSchema = z.strictObject({
  predictions: z.array(PredictionSchema).max(10),
});
/** A student's predictions. */
export type AnswerRequest = z.infer<typeof AnswerRequestSchema>;

/** The simulated answer to one question: a number (SI) or a regime; null when the run gave none. */
export const SimulatedValueSchema = z.union([z.number(), BedRegimeSchema]).nullable();
/** The simulated answer to one question. */
export type SimulatedValue = z.infer<typeof SimulatedValueSchema>;

/** One question's prediction set against the simulated value. */
export const OutcomeSchema = z.object({
  questionId: z.string(),
  predicted: z.union([z.number(), BedRegimeSchema]).nullable(),
  simulated: SimulatedValueSchema,
  /** Whether the prediction is right (within the question's tolerance for numbers); null without both. */
  correct: z.boolean().nullable(),
  /** predicted − simulated for numbers; null otherwise. */
  difference: z.number().nullable(),
});
/** One outcome. */
export type Outcome = z.infer<typeof OutcomeSchema>;

/** A level channel of a lesson run, downsampled for a chart: metres above the vessel floor. */
export const LevelChannelSchema = z.object({
  where: z.string(),
  values: z.array(z.number().nullable()),
});
/** One level channel. */
export type LevelChannel = z.infer<typeof LevelChannelSchema>;

/** The most samples a lesson run keeps per level channel. */
export const LESSON_LEVEL_MAX_POINTS = 400;

/** What simulating a lesson's system gave: status, verdicts, per-bed and per-vessel figures, levels. */
export const LessonSimulationSchema = z.object({
  status: RunStatusSchema,
  error: z.string().nullable(),
  durationS: z.number(),
  verdict: VerdictStatusSchema.nullable(),
  verdicts: z.array(VerdictSchema),
  beds: z.array(BedSummarySchema),
  vessels: z.array(VesselSummarySchema),
  levels: z.object({ t_s: z.array(z.number()), channels: z.array(LevelChannelSchema) }),
});
/** A simulation of a lesson's system. */
export type LessonSimulation = z.infer<typeof LessonSimulationSchema>;

/** The answer key: each question's simulated value (and the explanation written for it). */
export const AnswerKeyItemSchema = z.object({
  questionId: z.string(),
  simulated: SimulatedValueSchema,
  explanation: z.string(),
});
/** One entry of the answer key. */
export type AnswerKeyItem = z.infer<typeof AnswerKeyItemSchema>;

/** The caller's own answer to a lesson: predictions, and once run, the simulation and outcomes. */
export const MyAnswerSchema = z.object({
  predictions: z.array(PredictionSchema),
  submittedAt: z.iso.datetime({ offset: true }),
  ranAt: z.iso.datetime({ offset: true }).nullable(),
  simulation: LessonSimulationSchema.nullable(),
  outcomes: z.array(OutcomeSchema).nullable(),
});
/** A student's own answer. */
export type MyAnswer = z.infer<typeof MyAnswerSchema>;

/**
 * `GET /api/lessons/:id`. The owner gets everything (`myRole` `instructor`, `myAnswer` null);
 * a student gets the lesson with explanations blanked until it is revealed, their own answer,
 * and `answerKey` once revealed.
 */
export const LessonSchema = z.object({
  id: z.uuid(),
  title: z.string(),
  introduction: z.string(),
  classId: z.uuid().nullable(),
  className: z.string().nullable(),
  scenario: ScenarioDocumentSchema,
  questions: z.array(QuestionSchema),
  published: z.boolean(),
  revealed: z.boolean(),
  myRole: ClassRoleSchema,
  myAnswer: MyAnswerSchema.nullable(),
  answerKey: z.array(AnswerKeyItemSchema).nullable(),
  createdAt: z.iso.datetime({ offset: true }),
  updatedAt: z.iso.datetime({ offset: true }),
});
/** A lesson. */
export type Lesson = z.infer<typeof LessonSchema>;

/** `GET /api/lessons`: the caller's library (lessons in no class), newest first. */
export const LessonListSchema = z.object({ items: z.array(LessonListItemSchema) });
/** The caller's lesson library. */
export type LessonList = z.infer<typeof LessonListSchema>;

/** One student's row of a lesson report. */
export const StudentAnswerSchema = z.object({
  userId: z.uuid(),
  name: z.string(),
  predictions: z.array(PredictionSchema),
  outcomes: z.array(OutcomeSchema),
  submittedAt: z.iso.datetime({ offset: true }),
  ranAt: z.iso.datetime({ offset: true }).nullable(),
});
/** One student's answer as the instructor sees it. */
export type StudentAnswer = z.infer<typeof StudentAnswerSchema>;

/** Per question: how many answered and the share right (null before anyone answered). */
export const QuestionStatsSchema = z.object({
  questionId: z.string(),
  answered: z.number().int().nonnegative(),
  correct: z.number().int().nonnegative(),
  correctShare: z.number().min(0).max(1).nullable(),
});
/** Per-question figures. */
export type QuestionStats = z.infer<typeof QuestionStatsSchema>;

/**
 * `GET /api/lessons/:id/report` (its owner): the simulation of the lesson's system, the answer
 * key, every student's predictions against it, and per-question figures.
 */
export const LessonReportSchema = z.object({
  lessonId: z.uuid(),
  rosterSize: z.number().int().nonnegative(),
  simulation: LessonSimulationSchema,
  answerKey: z.array(AnswerKeyItemSchema),
  answers: z.array(StudentAnswerSchema),
  stats: z.array(QuestionStatsSchema),
});
/** A lesson's report. */
export type LessonReport = z.infer<typeof LessonReportSchema>;
