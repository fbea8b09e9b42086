import { afterEach, describe, expect, it } from 'vitest';
import { RunPool, RunQueueFullError, defaultRunPoolOptions, type RunPoolOptions } from './run-pool';
import type { RunJobOutcome } from './run-worker-messages';

const SCRIPTED = new URL('./scripted-run-worker.ts', import.meta.url);
const options = (overrides: Partial<RunPoolOptions> = {}): RunPoolOptions => ({
  ...defaultRunPoolOptions(2),
  size: 1,
  timeLimitMs: 10_000,
  graceMs: 300,
  ...overrides,
});
const jobOptions = { durationS: 60, outputIntervalS: 5, maxSamples: 100 };

/** Submits a scripted job; returns its id, the outcome it stores, and the settle promise. */
function submit(pool: RunPool, id: string, script: { mode: string; ms: number }) {
  let stored: RunJobOutcome | undefined;
  const ended = pool.submit({
    id,
    scenario: script,
    options: jobOptions,
    onEnd: async (outcome) => {
      stored = outcome;
    },
  });
  return { ended, outcome: () => stored };
}

/**
 * Waits for `check` to hold. The default covers a worker thread's start through tsx: about 1-2 s
 * on the idle 2-core test machine and up to 5 s with both cores busy.
 */
async function until(check: () => boolean, timeoutMs = 20_000): Promise<void> {
  const end = Date.now() + timeoutMs;
  while (!check()) {
    if (Date.now() > end) throw new Error('condition not met in time');
    await new Promise((r) => setTimeout(r, 10));
  }
}

describe('RunPool', () => {
  let pool: RunPool | undefined;
  afterEach(async () => {
    await pool?.close();
  });

  it('runs a job in a worker thread, reports its progress, and stores its outcome before settling', async () => {
    pool = new RunPool(options(), SCRIPTED);
    const job = submit(pool, 'a', { mode: 'finish', ms: 800 });
    expect(pool.status('a')).toEqual({ state: 'queued', progress: 0 });
    await until(() => (pool?.status('a')?.progress ?? 0) > 0);
    expect(pool.status('a')?.state).toBe('running');
    await job.ended;
    expect(job.outcome()?.status).toBe('completed');
    expect(pool.status('a')).toBeUndefined();
  });

  it('queues jobs beyond its size and runs them when a worker frees up', async () => {
    pool = new RunPool(options(), SCRIPTED);
    const first = submit(pool, 'first', { mode: 'finish', ms: 300 });
    const second = submit(pool, 'second', { mode: 'finish', ms: 10 });
    await until(() => pool?.status('first')?.state === 'running');
    expect(pool.status('second')?.state).toBe('queued');
    await Promise.all([first.ended, second.ended]);
    expect([first.outcome()?.status, second.outcome()?.status]).toEqual(['completed', 'completed']);
  });

  it('cancels a queued job at once and a running one through the shared stop flag', async () => {
    // The worker's own answer to the flag must come before the pool's kill, even when a loaded
    // machine keeps the worker thread waiting for a core; cancel returns as soon as it answers.
    pool = new RunPool(options({ graceMs: 10_000 }), SCRIPTED);
    const running = submit(pool, 'running', { mode: 'honour-stop', ms: 0 });
    const queued = submit(pool, 'queued', { mode: 'finish', ms: 10 });
    await until(() => pool?.status('running')?.state === 'running');
    expect(await pool.cancel('queued')).toBe(true);
    expect(queued.outcome()).toMatchObject({
      status: 'cancelled',
      error: 'Cancelled before it started.',
    });
    expect(await pool.cancel('running')).toBe(true);
    expect(running.outcome()).toMatchObject({ status: 'cancelled', error: 'stopped by flag' });
    expect(await pool.cancel('running')).toBe(false);
  });

  it('terminates a worker that ignores a cancel after the grace period, then keeps working', async () => {
    pool = new RunPool(options(), SCRIPTED);
    const stuck = submit(pool, 'stuck', { mode: 'ignore-stop', ms: 20_000 });
    await until(() => pool?.status('stuck')?.state === 'running');
    await pool.cancel('stuck');
    expect(stuck.outcome()).toMatchObject({ status: 'cancelled' });
    expect(stuck.outcome()?.error).toMatch(/did not stop in time/);
    const next = submit(pool, 'next', { mode: 'finish', ms: 10 });
    await next.ended;
    expect(next.outcome()?.status).toBe('completed');
  });

  it('fails a run that passes the time limit, with a message that says what to do', async () => {
    pool = new RunPool(options({ timeLimitMs: 400, graceMs: 200 }), SCRIPTED);
    const slow = submit(pool, 'slow', { mode: 'ignore-stop', ms: 20_000 });
    await slow.ended;
    expect(slow.outcome()?.status).toBe('failed');
    expect(slow.outcome()?.error).toMatch(/time limit.*shorten the duration/);
  });

  it('fails the job of a worker that crashes and replaces the worker', async () => {
    pool = new RunPool(options(), SCRIPTED);
    const crash = submit(pool, 'crash', { mode: 'crash', ms: 0 });
    await crash.ended;
    expect(crash.outcome()?.status).toBe('failed');
    expect(crash.outcome()?.error).toMatch(/worker stopped unexpectedly/);
    const next = submit(pool, 'after', { mode: 'finish', ms: 10 });
    await next.ended;
    expect(next.outcome()?.status).toBe('completed');
  });

  it('refuses a job when the queue is full', async () => {
    pool = new RunPool(options({ maxQueued: 1 }), SCRIPTED);
    submit(pool, 'one', { mode: 'honour-stop', ms: 0 });
    await until(() => pool?.status('one')?.state === 'running');
    submit(pool, 'two', { mode: 'finish', ms: 10 });
    expect(() => submit(pool as RunPool, 'three', { mode: 'finish', ms: 10 })).toThrow(
      RunQueueFullError,
    );
  });

  it('ends every job as failed when closed', async () => {
    pool = new RunPool(options(), SCRIPTED);
    const running = submit(pool, 'r', { mode: 'honour-stop', ms: 0 });
    const queued = submit(pool, 'q', { mode: 'finish', ms: 10 });
    await until(() => pool?.status('r')?.state === 'running');
    await pool.close();
    expect(running.outcome()?.error).toMatch(/server stopped/);
    expect(queued.outcome()?.error).toMatch(/server stopped/);
    pool = undefined;
  });
});
