/**
 * Reading the JSON columns of `lessons` and `lesson_answers` back through their schemas: stored
 * data is parsed like any outside data, and a row that no longer parses is a server bug (500).
 */
import { z } from 'zod';
import {
  LessonSimulationSchema,
  OutcomeSchema,
  PredictionSchema,
  QuestionSchema,
  type LessonSimulation,
  type MyAnswer,
  type Outcome,
  type Prediction,
  type Question,
} from '../../shared/contracts/classroom';
import { ScenarioDocumentSchema, type ScenarioDocument } from '../../shared/contracts/systems';
import type { AnswerRow, LessonRow } from './lesson-repository';

const QuestionsSchema = z.array(QuestionSchema);
const PredictionsSchema = z.array(PredictionSchema);

/** What `lesson_answers.results` holds once the student ran the lesson. */
export const StoredResultsSchema = z.object({
  simulation: LessonSimulationSchema,
  outcomes: z.array(OutcomeSchema),
});
/** What `lesson_answers.results` holds. */
export type StoredResults = { simulation: LessonSimulation; outcomes: Outcome[] };

/** A lesson row's questions. */
export function storedQuestions(row: Pick<LessonRow, 'id' | 'questions'>): Question[] {
  return parseStored(QuestionsSchema, row.questions, `lessons.questions of ${row.id}`);
}

/** A lesson row's scenario document (as written, units and all). */
export function storedScenario(row: Pick<LessonRow, 'id' | 'scenario'>): ScenarioDocument {
  return parseStored(ScenarioDocumentSchema, row.scenario, `lessons.scenario of ${row.id}`);
}

/** An answer row's predictions. */
export function storedPredictions(row: Pick<AnswerRow, 'id' | 'answers'>): Prediction[] {
  return parseStored(PredictionsSchema, row.answers, `lesson_answers.answers of ${row.id}`);
}

/** An answer row as its student sees it. */
export function toMyAnswer(row: AnswerRow): MyAnswer {
  const results =
    row.results === null
      ? null
      : parseStored(StoredResultsSchema, row.results, `lesson_answers.results of ${row.id}`);
  return {
    predictions: storedPredictions(row),
    submittedAt: row.submittedAt.toISOString(),
    ranAt: row.ranAt?.toISOString() ?? null,
    simulation: results?.simulation ?? null,
    outcomes: results?.outcomes ?? null,
  };
}

function parseStored<S extends z.ZodType>(schema: S, value: unknown, where: string): z.output<S> {
  const parsed = schema.safeParse(value);
  if (!parsed.success)
    throw new Error(`Stored ${where} does not match its schema: ${parsed.error.message}`);
  return parsed.data;
}
