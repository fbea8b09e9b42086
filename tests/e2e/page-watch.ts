/** Records what a page does that a test may want to forbid: console errors and far requests. */
import type { Page } from '@playwright/test';

/** What a page logged and fetched while it was watched. */
export interface PageWatch {
  /** Console errors and uncaught exceptions, as text. */
  readonly errors: string[];
  /** Every URL the page requested that is not on this machine. */
  readonly farRequests: string[];
}

/** Hosts that count as this machine. */
const LOCAL_HOSTS = new Set(['localhost', '127.0.0.1', '[::1]']);

/**
 * Starts recording on `page`. `expectedFailures` lists paths whose failed-load console message is
 * an expected answer (e.g. the 401 of "who am I" while signed out), not an error.
 */
export function watchPage(page: Page, expectedFailures: readonly string[] = []): PageWatch {
  const watch: PageWatch = { errors: [], farRequests: [] };
  page.on('console', (message) => {
    if (message.type() !== 'error') return;
    const from = message.location().url;
    const expected = expectedFailures.some((path) => from.endsWith(path));
    if (!(expected && message.text().startsWith('Failed to load resource'))) {
      watch.errors.push(`${message.text()} (${from})`);
    }
  });
  page.on('pageerror', (error) => watch.errors.push(error.message));
  page.on('request', (request) => {
    const url = new URL(request.url());
    const local =
      url.protocol === 'data:' || url.protocol === 'blob:' || LOCAL_HOSTS.has(url.hostname);
    if (!local) watch.farRequests.push(request.url());
  });
  return watch;
}
