/** Starts a worker thread on a TypeScript entry. */
import { Worker } from 'node:worker_threads';

/**
 * A worker running `entry` (a .ts file URL) through tsx's API: Node 20 does not apply `--import`
 * hooks to a worker's own entry file, so a tiny eval bootstrap imports tsx and then the entry.
 * Works under `node --import tsx`, tsx and vitest alike.
 */
export function spawnTsWorker(entry: URL): Worker {
  const api = import.meta.resolve('tsx/esm/api');
  const code = `import(${JSON.stringify(api)}).then((m) => m.tsImport(${JSON.stringify(entry.href)}, ${JSON.stringify(entry.href)}));`;
  return new Worker(code, { eval: true, execArgv: [] });
}
