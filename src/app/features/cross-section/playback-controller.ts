import { signal } from '@angular/core';
import { lastAtOrBefore } from './last-at-or-before';

/** Animation frames: the browser's requestAnimationFrame, or a fake a spec drives by hand. */
export interface FrameScheduler {
  request(callback: (nowMs: number) => void): number;
  cancel(handle: number): void;
  now(): number;
}

/** The browser's frame scheduler. */
export const BROWSER_FRAMES: FrameScheduler = {
  request: (callback) => requestAnimationFrame(callback),
  cancel: (handle) => cancelAnimationFrame(handle),
  now: () => performance.now(),
};

/** Playback speeds offered, simulated seconds per wall-clock second. */
export const PLAYBACK_SPEEDS: readonly number[] = [1, 2, 5, 10, 30, 60, 120, 300, 600];

/** How often (ms) the slower read-outs (text, tables) follow the playing time. */
const COARSE_INTERVAL_MS = 100;
/** A frame gap longer than this (a hidden tab) counts as this long, so time does not leap. */
const LONGEST_FRAME_S = 0.1;

/**
 * The time of an animation and its play/pause/speed state. The current time is a plain number
 * advanced once per frame (no change detection per frame); `onFrame` draws it. `coarseTimeS`
 * follows at most ten times a second and on every seek, for text and tables.
 */
export class PlaybackController {
  /** Whether time is running. */
  readonly playing = signal(false);
  /** Simulated seconds per wall second. */
  readonly speed = signal(60);
  /** The current time, updated at most every 100 ms while playing and at once on a seek. */
  readonly coarseTimeS = signal(0);
  private timeS = 0;
  private startS = 0;
  private endS = 0;
  private handle: number | null = null;
  private lastFrameMs = 0;
  private lastCoarseMs = 0;

  constructor(
    private readonly frames: FrameScheduler,
    private readonly onFrame: (timeS: number, wallStepS: number) => void,
  ) {}

  /** The current time, s. */
  get time(): number {
    return this.timeS;
  }

  /** The time span that can be played, s; the time is clamped into it. */
  setRange(startS: number, endS: number): void {
    this.startS = startS;
    this.endS = Math.max(startS, endS);
    this.seek(this.timeS);
  }

  /** Starts playing (from the start again when at the end). */
  play(): void {
    if (this.playing()) return;
    if (this.timeS >= this.endS) this.seek(this.startS);
    this.playing.set(true);
    this.lastFrameMs = this.frames.now();
    this.handle = this.frames.request((now) => this.tick(now));
  }

  /** Stops at the current time. */
  pause(): void {
    if (this.handle !== null) this.frames.cancel(this.handle);
    this.handle = null;
    this.playing.set(false);
    this.coarseTimeS.set(this.timeS);
  }

  /** Plays when paused, pauses when playing. */
  toggle(): void {
    if (this.playing()) this.pause();
    else this.play();
  }

  /** Moves to `timeS` (clamped) and draws it at once. */
  seek(timeS: number): void {
    this.timeS = Math.min(this.endS, Math.max(this.startS, timeS));
    this.coarseTimeS.set(this.timeS);
    this.onFrame(this.timeS, 0);
  }

  /** Sets the speed to the nearest offered one. */
  setSpeed(speed: number): void {
    const nearest = PLAYBACK_SPEEDS.reduce((best, s) =>
      Math.abs(Math.log(s / speed)) < Math.abs(Math.log(best / speed)) ? s : best,
    );
    this.speed.set(nearest);
  }

  /** One offered speed up (+1) or down (−1). */
  stepSpeed(by: 1 | -1): void {
    const index = PLAYBACK_SPEEDS.indexOf(this.speed());
    const next = Math.min(PLAYBACK_SPEEDS.length - 1, Math.max(0, index + by));
    this.speed.set(PLAYBACK_SPEEDS[next] ?? this.speed());
  }

  /**
   * Pauses and moves to the next (+1) or previous (−1) of the ascending `times`; returns the index
   * moved to, or -1 when there is none that way.
   */
  stepTo(times: readonly number[], by: 1 | -1): number {
    this.pause();
    const epsilonS = 1e-6;
    const index =
      by > 0
        ? lastAtOrBefore(times, this.timeS + epsilonS) + 1
        : lastAtOrBefore(times, this.timeS - epsilonS);
    const target = times[index];
    if (index < 0 || target === undefined) return -1;
    this.seek(target);
    return index;
  }

  /** Stops the frame loop for good. */
  dispose(): void {
    this.pause();
  }

  private tick(nowMs: number): void {
    const wallStepS = Math.min(LONGEST_FRAME_S, Math.max(0, (nowMs - this.lastFrameMs) / 1000));
    this.lastFrameMs = nowMs;
    this.timeS = Math.min(this.endS, this.timeS + wallStepS * this.speed());
    this.onFrame(this.timeS, wallStepS);
    if (this.timeS >= this.endS) {
      this.pause();
      return;
    }
    if (nowMs - this.lastCoarseMs >= COARSE_INTERVAL_MS) {
      this.lastCoarseMs = nowMs;
      this.coarseTimeS.set(this.timeS);
    }
    this.handle = this.frames.request((now) => this.tick(now));
  }
}
