import { spawn } from 'node:child_process';
import { existsSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { DataDirInUseError, lockDataDir } from './lock';

describe('lockDataDir', () => {
  it('refuses a folder whose lock belongs to a live process, naming that process', async () => {
    const dir = join(mkdtempSync(join(tmpdir(), 'tw-lock-')), 'data');
    const child = spawn(process.execPath, ['-e', 'setTimeout(() => {}, 10000)']);
    try {
      writeFileSync(`${dir}.lock`, String(child.pid));
      expect(() => lockDataDir(dir)).toThrow(DataDirInUseError);
      expect(() => lockDataDir(dir)).toThrow(new RegExp(`in use by process ${child.pid}`));
    } finally {
      child.kill();
    }
  });

  it('takes over a stale lock left by a dead process and releases it on close', async () => {
    const dir = join(mkdtempSync(join(tmpdir(), 'tw-lock-')), 'data');
    const child = spawn(process.execPath, ['-e', '0']);
    await new Promise((resolve) => child.on('exit', resolve));
    writeFileSync(`${dir}.lock`, String(child.pid));
    const release = lockDataDir(dir);
    expect(existsSync(`${dir}.lock`)).toBe(true);
    release();
    expect(existsSync(`${dir}.lock`)).toBe(false);
  });
});
