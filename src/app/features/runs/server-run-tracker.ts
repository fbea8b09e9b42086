import { HttpErrorResponse } from '@angular/common/http';
import { DestroyRef, Injectable, inject, signal } from '@angular/core';
import type { RunStatus } from '../../../../shared/contracts/runs';
import { readApiError } from '../../core/http/read-api-error';
import { RunsApi } from './runs-api';

/** A run on the server as the page follows it. */
export interface TrackedRun {
  readonly id: string;
  readonly status: RunStatus;
  readonly progress: number;
}

/** How often a running run is asked for its progress, ms. */
const POLL_MS = 400;
const ENDED: readonly RunStatus[] = ['completed', 'stopped', 'failed', 'cancelled'];

/**
 * Starts a run on the server and follows it: the run answers at once (202), then its progress is
 * polled until it ends, so the page can show a progress bar and offer to cancel. Provide it in
 * the component that shows the progress.
 */
@Injectable()
export class ServerRunTracker {
  private readonly api = inject(RunsApi);
  private readonly current = signal<TrackedRun | null>(null);
  private readonly failure = signal<string | null>(null);
  private timer: ReturnType<typeof setTimeout> | null = null;
  private finish: ((run: TrackedRun | null) => void) | null = null;

  /** The run being followed (kept after it ends), or null. */
  readonly run = this.current.asReadonly();
  /** Why starting or following the run failed, or null. */
  readonly error = this.failure.asReadonly();

  constructor() {
    inject(DestroyRef).onDestroy(() => this.stopPolling());
  }

  /** True while a run is queued or running. */
  isActive(): boolean {
    const run = this.current();
    return run !== null && !ENDED.includes(run.status);
  }

  /** Starts a run of the system's saved scenario; resolves with the ended run (null on failure). */
  async start(systemId: string): Promise<TrackedRun | null> {
    this.failure.set(null);
    try {
      const started = await this.api.start(systemId, { async: true });
      const first = started.kind === 'ended' ? started.run : started.started;
      this.current.set({ id: first.id, status: first.status, progress: first.progress });
    } catch (error: unknown) {
      this.failure.set(describe(error));
      return null;
    }
    if (!this.isActive()) return this.current();
    return new Promise((resolve) => {
      this.finish = resolve;
      this.schedulePoll();
    });
  }

  /** Follows a run someone already started until it ends; resolves with the ended run. */
  follow(run: TrackedRun): Promise<TrackedRun | null> {
    this.failure.set(null);
    this.current.set(run);
    if (!this.isActive()) return Promise.resolve(run);
    return new Promise((resolve) => {
      this.finish = resolve;
      this.schedulePoll();
    });
  }

  /** Asks the server to cancel the followed run. */
  async cancel(): Promise<void> {
    const run = this.current();
    if (!run || !this.isActive()) return;
    try {
      const cancelled = await this.api.cancel(run.id);
      this.update({ id: cancelled.id, status: cancelled.status, progress: cancelled.progress });
    } catch (error: unknown) {
      this.failure.set(describe(error));
    }
  }

  private schedulePoll(): void {
    this.timer = setTimeout(() => void this.poll(), POLL_MS);
  }

  private async poll(): Promise<void> {
    const run = this.current();
    if (!run) return;
    try {
      const latest = await this.api.get(run.id);
      this.update({ id: latest.id, status: latest.status, progress: latest.progress });
    } catch (error: unknown) {
      this.failure.set(describe(error));
      this.end(null);
      return;
    }
    if (this.isActive()) this.schedulePoll();
  }

  private update(run: TrackedRun): void {
    this.current.set(run);
    if (!ENDED.includes(run.status)) return;
    this.stopPolling();
    this.end(run);
  }

  private end(run: TrackedRun | null): void {
    const finish = this.finish;
    this.finish = null;
    finish?.(run);
  }

  private stopPolling(): void {
    if (this.timer !== null) clearTimeout(this.timer);
    this.timer = null;
  }
}

function describe(error: unknown): string {
  if (!(error instanceof HttpErrorResponse))
    return error instanceof Error ? error.message : String(error);
  return (
    readApiError(error.error)?.error.message ??
    'The server could not run the system. Try again in a moment.'
  );
}
