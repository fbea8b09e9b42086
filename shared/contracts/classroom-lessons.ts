/**
 * Classroom lessons: creating, changing and copying them, a lesson as its owner or a student
 * sees it, the simulation of its system, a student's own answer, and the instructor's report.
 * Part of the classroom contract (`classroom.ts` re-exports it).
 */
import { z } from 'zod';
import { BedSummarySchema, RunStatusSchema, VerdictSchema, VesselSummarySchema } from './runs';
import { ScenarioDocumentSchema, VerdictStatusSchema } from './systems';
import {
  OutcomeSchema,
  PredictionSchema,
  QuestionListSchema,
  QuestionSchema,
  SimulatedValueSchema,
} from './classroom-questions';

/** The caller's part in a class. */
export const ClassRoleSchema = z.enum(['instructor', 'student']);
/** `instructor` (teaches it) or `student` (belongs to it). */
export type ClassRole = z.infer<typeof ClassRoleSchema>;

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
