import type { StepSegment } from './step-segment';

/**
 * Step sizes to restart with after transitions. After an event the integration restarts with the
 * step it had before the event, but no longer than the first step that was accepted after the
 * same event last time: the new mode's own time scale (e.g. the small steps a weir needs just
 * after it starts to spill), learnt as the run goes, so a restart is rarely rejected.
 */
export class RestartStepMemory {
  private readonly learnedS: Float64Array;
  private pending: number[] = [];

  constructor(eventCount: number) {
    this.learnedS = new Float64Array(eventCount);
  }

  /** The restart step after the transition fired by `fired`, given the step before the event. */
  restartStepS(fired: readonly number[], previousStepS: number): number {
    let stepS = previousStepS;
    for (const index of fired) {
      const learned = this.learnedS[index] as number;
      if (learned > 0) stepS = Math.min(stepS, learned);
    }
    this.pending = fired.slice();
    return stepS;
  }

  /** Notes the first step accepted after a restart (unless it was cut short by a time limit). */
  noteAccepted(segment: StepSegment, limitS: number): void {
    if (this.pending.length === 0) return;
    if (segment.t1S < limitS) {
      for (const index of this.pending) this.learnedS[index] = segment.t1S - segment.t0S;
    }
    this.pending = [];
  }
}
