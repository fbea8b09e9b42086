/**
 * A run worker for the pool's own tests: speaks the run-worker protocol but, instead of the
 * engine, follows a script in `scenario` ({mode, ms}): `finish` after ms with progress steps,
 * `honour-stop` runs until the stop flag is set, `ignore-stop` busy-loops for ms ignoring it,
 * `crash` exits the thread.
 */
import { parentPort } from 'node:worker_threads';
import type { RunJobMessage, RunJobOutcome, RunWorkerMessage } from './run-worker-messages';

const port = parentPort;
if (!port) throw new Error('scripted-run-worker.ts must be started as a worker thread.');
const send = (message: RunWorkerMessage): void => port.postMessage(message);

const outcome = (status: RunJobOutcome['status'], error: string | null): RunJobOutcome => ({
  status,
  error,
  result: null,
  series: null,
  sampleCount: 0,
  wallMs: 0,
});

function busyWait(ms: number, stop: () => boolean): boolean {
  const end = Date.now() + ms;
  while (Date.now() < end) if (stop()) return true;
  return false;
}

port.on('message', (job: RunJobMessage) => {
  const script = job.scenario as { mode: string; ms: number };
  const flag = new Int32Array(job.stopFlag);
  const stopped = (): boolean => Atomics.load(flag, 0) !== 0;
  if (script.mode === 'crash') process.exit(3);
  if (script.mode === 'ignore-stop') {
    busyWait(script.ms, () => false);
    send({ type: 'done', jobId: job.jobId, outcome: outcome('completed', null) });
    return;
  }
  const steps = 4;
  for (let i = 1; i <= steps; i += 1) {
    const ms = script.mode === 'honour-stop' ? 60_000 : script.ms / steps;
    if (busyWait(ms, stopped)) {
      send({ type: 'done', jobId: job.jobId, outcome: outcome('cancelled', 'stopped by flag') });
      return;
    }
    send({ type: 'progress', jobId: job.jobId, fraction: i / steps });
  }
  send({ type: 'done', jobId: job.jobId, outcome: outcome('completed', null) });
});

send({ type: 'ready' });
