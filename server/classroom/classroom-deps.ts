/** What the classroom services need from the app, built once per app from its context. */
import type { AppContext } from '../app-context';
import type { Database } from '../db/database';
import type { Mailer } from '../mail/mailer';
import type { RunPool } from '../runs/run-pool';
import { runPoolFor } from '../runs/run-pool-for';
import type { RunJobOutcome } from '../runs/run-worker-messages';
import { LessonSimulations, type SubmitRun } from './lesson-simulations';

/** The classroom's dependencies: no globals, everything passed in. */
export interface ClassroomDeps {
  db: Database;
  mailer: Mailer;
  /** Origin of the links in e-mails, without a trailing slash. */
  publicUrl: string;
  /** The current time; replaced in tests. */
  now: () => Date;
  /** Simulates lessons' systems (one simulation per lesson, shared by everyone who asks). */
  simulations: LessonSimulations;
}

/** The classroom's dependencies from an app context; runs go to the context's run pool. */
export function classroomDepsFor(ctx: AppContext): ClassroomDeps {
  return {
    db: ctx.db,
    mailer: ctx.mailer,
    publicUrl: ctx.auth.publicUrl,
    now: () => new Date(ctx.auth.now()),
    simulations: new LessonSimulations((job) => submitToPool(runPoolFor(ctx), job)),
  };
}

/** Runs a job on the pool and resolves with its outcome (rejects when the queue is full). */
function submitToPool(pool: RunPool, job: Parameters<SubmitRun>[0]): Promise<RunJobOutcome> {
  return new Promise((resolve, reject) => {
    try {
      pool.submit({ ...job, onEnd: async (outcome) => resolve(outcome) }).catch(reject);
    } catch (error: unknown) {
      reject(error);
    }
  });
}
