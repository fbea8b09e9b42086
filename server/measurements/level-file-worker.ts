/** A worker thread that reads one large level file off the server's event loop. */
import { parentPort } from 'node:worker_threads';
import { readLevelFile, type LevelFileRequest } from './read-level-file';

const port = parentPort;
if (!port) throw new Error('level-file-worker.ts must be started as a worker thread.');

port.once('message', (request: LevelFileRequest) => {
  port.postMessage(readLevelFile(request));
});
