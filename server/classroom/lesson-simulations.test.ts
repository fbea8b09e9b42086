import { describe, expect, it } from 'vitest';
import { EXAMPLE_SCENARIO_FILE } from '../../shared/scenario/index';
import { HttpError } from '../http/http-error';
import type { RunJobOutcome } from '../runs/run-worker-messages';
import { LessonSimulations, type SubmitRun } from './lesson-simulations';

const completed: RunJobOutcome = {
  status: 'completed',
  error: null,
  result: null,
  series: null,
  sampleCount: 0,
  wallMs: 1,
};

/** A submit function that records each job and answers with the next outcome given. */
function recordingSubmit(outcomes: RunJobOutcome[]): {
  submit: SubmitRun;
  jobs: Parameters<SubmitRun>[0][];
} {
  const jobs: Parameters<SubmitRun>[0][] = [];
  const submit: SubmitRun = async (job) => {
    jobs.push(job);
    return outcomes.shift() ?? completed;
  };
  return { submit, jobs };
}

describe('LessonSimulations', () => {
  it('runs the normalised scenario for its own duration and output interval', async () => {
    const { submit, jobs } = recordingSubmit([completed]);
    const simulation = await new LessonSimulations(submit).get('lesson-1', EXAMPLE_SCENARIO_FILE);
    expect(simulation.durationS).toBe(6 * 3600);
    expect(jobs).toHaveLength(1);
    expect(jobs[0]?.options).toMatchObject({ durationS: 21_600, outputIntervalS: 5 });
    expect((jobs[0]?.scenario as { run: { duration: number } }).run.duration).toBe(21_600);
  });

  it('runs a lesson once however often and however concurrently it is asked for', async () => {
    const { submit, jobs } = recordingSubmit([]);
    const simulations = new LessonSimulations(submit);
    await Promise.all([
      simulations.get('a', EXAMPLE_SCENARIO_FILE),
      simulations.get('a', EXAMPLE_SCENARIO_FILE),
    ]);
    await simulations.get('a', EXAMPLE_SCENARIO_FILE);
    expect(jobs).toHaveLength(1);
  });

  it('runs a failed simulation again next time', async () => {
    const failed: RunJobOutcome = { ...completed, status: 'failed', error: 'time limit' };
    const { submit, jobs } = recordingSubmit([failed, completed]);
    const simulations = new LessonSimulations(submit);
    expect((await simulations.get('a', EXAMPLE_SCENARIO_FILE)).status).toBe('failed');
    expect((await simulations.get('a', EXAMPLE_SCENARIO_FILE)).status).toBe('completed');
    expect(jobs).toHaveLength(2);
  });

  it('keeps only the most recently used lessons', async () => {
    const { submit, jobs } = recordingSubmit([]);
    const simulations = new LessonSimulations(submit, 2);
    await simulations.get('a', EXAMPLE_SCENARIO_FILE);
    await simulations.get('b', EXAMPLE_SCENARIO_FILE);
    await simulations.get('a', EXAMPLE_SCENARIO_FILE);
    await simulations.get('c', EXAMPLE_SCENARIO_FILE);
    await simulations.get('a', EXAMPLE_SCENARIO_FILE);
    await simulations.get('b', EXAMPLE_SCENARIO_FILE);
    expect(jobs).toHaveLength(4);
  });

  it('answers 503 when the run queue is full, and 422 for a scenario that no longer parses', async () => {
    const full = new LessonSimulations(() => {
      throw new Error('The server already has 20 runs waiting; try again in a minute.');
    });
    await expect(full.get('a', EXAMPLE_SCENARIO_FILE)).rejects.toMatchObject({
      status: 503,
      code: 'RUN_QUEUE_FULL',
    });
    const invalid = new LessonSimulations(recordingSubmit([]).submit);
    const error: unknown = await invalid
      .get('b', { format: 'scenario/1' })
      .catch((e: unknown) => e);
    expect(error).toBeInstanceOf(HttpError);
    expect(error).toMatchObject({ status: 422, code: 'LESSON_SCENARIO_INVALID' });
  });
});
