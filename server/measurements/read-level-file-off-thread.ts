/**
 * Reads a level file: small files inline (a worker's start-up would cost more than the parse), files
 * above 256 KB in a worker thread, so a maximum-size upload (seconds of parsing) never stalls other
 * requests. A worker that takes longer than a minute is stopped.
 */
import { HttpError } from '../http/http-error';
import { readLevelFile, type LevelFileRequest, type LevelFileResult } from './read-level-file';
import { spawnTsWorker } from './spawn-ts-worker';

/** Files up to this size are read on the calling thread. */
export const INLINE_MAX_BYTES = 256 * 1024;
const TIME_LIMIT_MS = 60_000;

/** The result of `readLevelFile`, computed inline or in a worker by size. */
export function readLevelFileOffThread(request: LevelFileRequest): Promise<LevelFileResult> {
  if (request.bytes.length <= INLINE_MAX_BYTES) return Promise.resolve(readLevelFile(request));
  return new Promise((resolve, reject) => {
    const worker = spawnTsWorker(new URL('./level-file-worker.ts', import.meta.url));
    const timer = setTimeout(() => {
      void worker.terminate();
      reject(
        new HttpError(
          503,
          'FILE_READ_TIMEOUT',
          'Reading the file took too long; split it into smaller parts.',
        ),
      );
    }, TIME_LIMIT_MS);
    const finish = (): void => {
      clearTimeout(timer);
      void worker.terminate();
    };
    worker.once('message', (result: LevelFileResult) => {
      finish();
      resolve(result);
    });
    worker.once('error', (error) => {
      finish();
      reject(error);
    });
    worker.postMessage(request);
  });
}
