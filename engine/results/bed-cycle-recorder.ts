import type { TrajectoryObserver } from '../integrator/hybrid-system';
import type { RunEvent } from './run-result';
import type { LevelExtremes } from './level-extremes';

/** Per-bed marks of each flood: when it started and peaked, and the cycle's high and low water. */
export interface BedCycleMarks {
  /** Times of spill-start events, s. */
  spillStartsS: number[];
  /** Highest level of each flood (spill-start to priming or spill end), m. */
  highsM: number[];
  /** Lowest level between consecutive spill-starts, m. */
  lowsM: number[];
}

/**
 * Turns the event log into per-cycle highs and lows: at a spill-start the lowest level since the
 * previous one closes that cycle's low water; at a priming or a spill end the highest level since
 * the spill-start is the flood's high water. Levels come from the extremes tracker's window, which
 * must observe the trajectory before this recorder does.
 */
export class BedCycleRecorder implements TrajectoryObserver {
  readonly marks = new Map<string, BedCycleMarks>();
  private seenEvents = 0;

  constructor(
    private readonly events: readonly RunEvent[],
    private readonly bedIndex: ReadonlyMap<string, number>,
    private readonly extremes: readonly LevelExtremes[],
  ) {
    for (const id of bedIndex.keys())
      this.marks.set(id, { spillStartsS: [], highsM: [], lowsM: [] });
  }

  onSegment(): void {}

  beforeTransition(): void {}

  afterTransition(): void {
    for (; this.seenEvents < this.events.length; this.seenEvents += 1) {
      const event = this.events[this.seenEvents] as RunEvent;
      const marks = this.marks.get(event.where);
      const index = this.bedIndex.get(event.where);
      if (!marks || index === undefined) continue;
      const window = this.extremes[index] as LevelExtremes;
      if (event.kind === 'spill-start') {
        if (marks.spillStartsS.length > 0) marks.lowsM.push(window.windowMinM);
        marks.spillStartsS.push(event.t_s);
        window.windowMinM = Infinity;
        window.windowMaxM = -Infinity;
      } else if (
        (event.kind === 'primed' || event.kind === 'spill-end') &&
        marks.highsM.length < marks.spillStartsS.length
      ) {
        marks.highsM.push(window.windowMaxM);
      }
    }
  }
}
