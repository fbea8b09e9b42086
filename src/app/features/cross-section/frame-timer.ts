/** How many frame timings are kept (the latest ten seconds at 60 frames a second). */
const KEPT = 600;

/**
 * Times the cross-section's own work per animation frame (sampling and painting), keeping the
 * latest timings; `report()` publishes their summary as a `tw-cross-section-frames` performance
 * mark, so a browser test or a profiler can read it without a hook into the component.
 */
export class FrameTimer {
  private readonly durations = new Float64Array(KEPT);
  private count = 0;

  /** Call at the start of a frame's work; pass the result to `stop`. */
  start(): number {
    return performance.now();
  }

  /** Call at the end of a frame's work. */
  stop(startedMs: number): void {
    this.durations[this.count % KEPT] = performance.now() - startedMs;
    this.count += 1;
  }

  /** Forgets every timing. */
  reset(): void {
    this.count = 0;
  }

  /** Frames timed (at most the latest 600), their median and 95th percentile, ms. */
  summary(): { frames: number; medianMs: number; p95Ms: number } {
    const kept = Array.from(this.durations.subarray(0, Math.min(this.count, KEPT))).sort(
      (a, b) => a - b,
    );
    const at = (q: number) => kept[Math.min(kept.length - 1, Math.floor(q * kept.length))] ?? 0;
    return { frames: this.count, medianMs: at(0.5), p95Ms: at(0.95) };
  }

  /** Publishes the summary as a performance mark named `tw-cross-section-frames`. */
  report(): void {
    if (typeof performance.mark !== 'function') return;
    performance.mark('tw-cross-section-frames', { detail: this.summary() });
  }
}
