/**
 * The questions of a classroom lesson and students' predictions for them, set against the
 * simulated values. Numbers are SI: a period in seconds, a level in metres above the floor.
 * Part of the classroom contract (`classroom.ts` re-exports it).
 */
import { z } from 'zod';
import { BedSummarySchema } from './runs';

/** What a bed did over a run: the engine's bed states. */
export const BedRegimeSchema = BedSummarySchema.shape.state;
/** A bed's regime: `cycling`, `spill-stall`, `siphon-lock`, `flooded` or `idle`. */
export type BedRegime = z.infer<typeof BedRegimeSchema>;

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
