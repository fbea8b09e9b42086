import { execFile } from 'node:child_process';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { promisify } from 'node:util';
import { describe, expect, it } from 'vitest';
import { openDatabase } from './database';
import { DEMO_ACCOUNTS, seedDemo } from './seed';
import { users } from './schema';

const run = promisify(execFile);

describe('openDatabase on a PGlite data folder', () => {
  it('keeps what was stored across a restart and seeds the demo accounts only once', async () => {
    const dataDir = join(mkdtempSync(join(tmpdir(), 'tw-db-')), 'data');
    const first = await openDatabase({ kind: 'pglite', dataDir });
    expect(first.isNew).toBe(true);
    await seedDemo(first.db);
    await first.close();

    const second = await openDatabase({ kind: 'pglite', dataDir });
    try {
      expect(second.isNew).toBe(false);
      await seedDemo(second.db);
      const rows = await second.db.select({ email: users.email, role: users.role }).from(users);
      expect(rows).toHaveLength(DEMO_ACCOUNTS.length);
      expect(rows.find((r) => r.email === 'teacher@tidewright.test')?.role).toBe('instructor');
    } finally {
      await second.close();
    }
  }, 60_000);

  it('makes a second server on the same folder fail with a clear message instead of sharing it', async () => {
    const dataDir = join(mkdtempSync(join(tmpdir(), 'tw-db-')), 'data');
    const open = await openDatabase({ kind: 'pglite', dataDir });
    try {
      await expect(openDatabase({ kind: 'pglite', dataDir })).rejects.toThrow(/in use by process/);
      const child = run(process.execPath, ['--import', 'tsx', 'server/main.ts'], {
        env: { ...process.env, TIDEWRIGHT_DATA: dataDir, PORT: '0', LOG_LEVEL: 'silent' },
      });
      const failure = await child.then(
        () => null,
        (error: { code: number; stderr: string }) => error,
      );
      expect(failure?.code).toBe(1);
      expect(failure?.stderr).toContain(`in use by process ${process.pid}`);
      expect(failure?.stderr).not.toMatch(/\n\s+at /);
    } finally {
      await open.close();
    }
  }, 60_000);
});
