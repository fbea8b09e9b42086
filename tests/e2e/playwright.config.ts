/**
 * Browser tests against the built app served by the real server on port 3100, in the system
 * Chromium (never a downloaded browser). Run `npm run build` first: the server serves dist/.
 */
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { defineConfig } from '@playwright/test';

const repoRoot = resolve(import.meta.dirname, '../..');
const dataDir = join(tmpdir(), 'tidewright-e2e-data');

export default defineConfig({
  testDir: '.',
  testMatch: '**/*.e2e.ts',
  outputDir: join(repoRoot, 'test-results'),
  workers: 1,
  fullyParallel: false,
  forbidOnly: !!process.env['CI'],
  reporter: [['list']],
  timeout: 30_000,
  use: {
    baseURL: 'http://localhost:3100',
    headless: true,
    screenshot: 'only-on-failure',
    launchOptions: {
      executablePath: '/usr/bin/chromium',
      args: [
        '--no-sandbox',
        '--disable-gpu',
        '--disable-quic',
        '--no-first-run',
        '--disable-background-networking',
        '--disable-component-update',
        '--disable-sync',
      ],
    },
  },
  projects: [{ name: 'chromium', use: { browserName: 'chromium' } }],
  webServer: {
    // `exec` lets SIGTERM reach the server, which then closes its database and releases the lock.
    command: `rm -rf ${dataDir} && TIDEWRIGHT_DATA=${dataDir} PORT=3100 exec node --import tsx server/main.ts`,
    cwd: repoRoot,
    url: 'http://localhost:3100/api/health',
    reuseExistingServer: false,
    timeout: 60_000,
    stdout: 'ignore',
    stderr: 'pipe',
    gracefulShutdown: { signal: 'SIGTERM', timeout: 5_000 },
  },
});
