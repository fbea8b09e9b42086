/**
 * A pid lock on a PGlite data folder. PGlite does not stop a second process from opening the same
 * folder, and rows that process commits are silently lost, so the server takes this lock first.
 */
import { closeSync, openSync, readFileSync, rmSync, writeSync } from 'node:fs';

/** Thrown when another live process holds the data folder. */
export class DataDirInUseError extends Error {
  readonly code = 'DATA_DIR_IN_USE';
  constructor(
    readonly dataDir: string,
    readonly pid: number,
  ) {
    super(
      `Data folder ${dataDir} is in use by process ${pid}. Stop that Tidewright server first, ` +
        `or set TIDEWRIGHT_DATA to another folder.`,
    );
  }
}

function isAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (error) {
    return (error as NodeJS.ErrnoException).code === 'EPERM';
  }
}

/** Takes `<dataDir>.lock` (removing a stale one left by a dead process); returns the release function. */
export function lockDataDir(dataDir: string): () => void {
  const lockPath = `${dataDir}.lock`;
  for (let attempt = 0; attempt < 2; attempt++) {
    try {
      const fd = openSync(lockPath, 'wx');
      writeSync(fd, String(process.pid));
      closeSync(fd);
      let released = false;
      const release = (): void => {
        if (released) return;
        released = true;
        process.off('exit', release);
        rmSync(lockPath, { force: true });
      };
      process.on('exit', release);
      return release;
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code !== 'EEXIST') throw error;
      const pid = Number.parseInt(readFileSync(lockPath, 'utf8').trim(), 10);
      if (Number.isFinite(pid) && (pid === process.pid || isAlive(pid))) {
        throw new DataDirInUseError(dataDir, pid);
      }
      rmSync(lockPath, { force: true });
    }
  }
  throw new Error(`Could not take the lock ${lockPath}; remove it if no server is running.`);
}
