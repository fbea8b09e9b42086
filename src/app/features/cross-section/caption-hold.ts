import { signal } from '@angular/core';
import type { Caption, CaptionPicker } from './caption-picker';

/** A caption stays up at least this long (wall ms) before a newer event replaces it. */
const CAPTION_HOLD_MS = 2500;
/** An event is captioned while it is at most this many wall seconds old. */
const CAPTION_WALL_S = 4;

/**
 * The caption on screen while playing: the latest event, kept up long enough to read (a newer
 * one waits until the current one has shown for 2.5 s), dropped once it is 4 wall seconds old;
 * a seek or step shows the caption at the new time at once.
 */
export class CaptionHold {
  /** The caption to show, or null. */
  readonly caption = signal<Caption | null>(null);
  private shownAtMs = 0;

  /** Picks the caption at `timeS`, playing at `speed`, `nowMs` on the wall clock. */
  update(
    picker: CaptionPicker,
    timeS: number,
    speed: number,
    nowMs: number,
    jumped: boolean,
  ): void {
    const next = picker.at(timeS, Math.max(1, speed * CAPTION_WALL_S));
    const current = this.caption();
    if (next?.key === current?.key) return;
    if (!jumped && current !== null && nowMs - this.shownAtMs < CAPTION_HOLD_MS) return;
    this.shownAtMs = nowMs;
    this.caption.set(next);
  }
}
