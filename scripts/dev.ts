/**
 * `npm run dev`: the API server under `tsx watch` (port 3000) and `ng serve` (port 4200, which
 * proxies `/api` to the API per proxy.conf.json), side by side with prefixed output. Ctrl-C or
 * SIGTERM stops both; if either exits on its own, the other is stopped too.
 */
import { type ChildProcess, spawn } from 'node:child_process';
import { join } from 'node:path';
import { createInterface } from 'node:readline';

const root = join(import.meta.dirname, '..');
const bin = (name: string): string => join(root, 'node_modules', '.bin', name);

/** Starts one program with its output lines prefixed by `label`. */
function start(label: string, command: string, args: readonly string[]): ChildProcess {
  const child = spawn(command, args, { cwd: root, stdio: ['ignore', 'pipe', 'pipe'] });
  for (const stream of [child.stdout, child.stderr]) {
    if (!stream) continue;
    const target = stream === child.stderr ? process.stderr : process.stdout;
    createInterface({ input: stream }).on('line', (line) => target.write(`[${label}] ${line}\n`));
  }
  return child;
}

const children = [
  start('api', bin('tsx'), ['watch', '--clear-screen=false', 'server/main.ts']),
  start('web', bin('ng'), ['serve']),
];

let stopping = false;
/** Sends `signal` to every child still running and exits once all have ended. */
function stopAll(signal: NodeJS.Signals, exitCode: number): void {
  if (stopping) return;
  stopping = true;
  const running = children.filter((child) => child.exitCode === null && child.signalCode === null);
  if (running.length === 0) process.exit(exitCode);
  let left = running.length;
  for (const child of running) {
    child.once('exit', () => {
      left -= 1;
      if (left === 0) process.exit(exitCode);
    });
    child.kill(signal);
  }
}

for (const signal of ['SIGINT', 'SIGTERM'] as const) process.on(signal, () => stopAll(signal, 0));
for (const child of children) {
  child.on('exit', (code) => stopAll('SIGTERM', code ?? 1));
}
