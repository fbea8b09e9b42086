/**
 * Simulations of lessons' systems. A lesson's scenario never changes after it is created and the
 * engine is deterministic, so one simulation per lesson serves its report, its answer key and
 * every student's run; the newest `capacity` lessons are kept in memory.
 */
import { randomUUID } from 'node:crypto';
import type { LessonSimulation } from '../../shared/contracts/classroom';
import { parseScenario } from '../../shared/scenario/index';
import { HttpError } from '../http/http-error';
import type { RunJobOptions, RunJobOutcome } from '../runs/run-worker-messages';
import { toLessonSimulation } from './to-lesson-simulation';

/** Runs one normalised scenario off the event loop (the run pool's `submit`). */
export type SubmitRun = (job: {
  id: string;
  scenario: unknown;
  options: RunJobOptions;
}) => Promise<RunJobOutcome>;

/** Most samples a lesson run may record (a 24 h run at a 1 s interval fits). */
const MAX_SAMPLES = 100_000;

/** A per-app cache of lesson simulations in front of the run pool. */
export class LessonSimulations {
  private readonly cache = new Map<string, Promise<LessonSimulation>>();

  constructor(
    private readonly submit: SubmitRun,
    private readonly capacity = 64,
  ) {}

  /** The simulation of `lessonId`'s scenario document, run once and then remembered. */
  get(lessonId: string, scenarioDocument: unknown): Promise<LessonSimulation> {
    const cached = this.cache.get(lessonId);
    if (cached) {
      this.cache.delete(lessonId);
      this.cache.set(lessonId, cached);
      return cached;
    }
    const running = this.run(scenarioDocument);
    this.cache.set(lessonId, running);
    while (this.cache.size > this.capacity) this.cache.delete(this.cache.keys().next().value ?? '');
    running.then(
      (simulation) => {
        if (simulation.status === 'failed' || simulation.status === 'cancelled')
          this.cache.delete(lessonId);
      },
      () => this.cache.delete(lessonId),
    );
    return running;
  }

  /** Forgets a lesson (deleted lessons). */
  forget(lessonId: string): void {
    this.cache.delete(lessonId);
  }

  private async run(scenarioDocument: unknown): Promise<LessonSimulation> {
    const parsed = parseScenario(scenarioDocument);
    if (!parsed.success) {
      const first = parsed.issues[0];
      throw new HttpError(
        422,
        'LESSON_SCENARIO_INVALID',
        `The lesson's system is no longer valid (${first?.path}: ${first?.message}); duplicate the lesson from a valid system.`,
      );
    }
    const { run } = parsed.scenario;
    const options: RunJobOptions = {
      durationS: run.duration,
      outputIntervalS: run.outputInterval,
      maxSamples: MAX_SAMPLES,
    };
    let outcome: RunJobOutcome;
    try {
      outcome = await this.submit({ id: randomUUID(), scenario: parsed.scenario, options });
    } catch (error: unknown) {
      const message = error instanceof Error ? error.message : 'The server is busy.';
      throw new HttpError(503, 'RUN_QUEUE_FULL', message, undefined, { 'Retry-After': '30' });
    }
    return toLessonSimulation(outcome, run.duration);
  }
}
