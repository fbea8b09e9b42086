import type { LevelExtremes } from './level-extremes';
import type { RunEvent } from './run-result';
import { RunningStatistics } from './running-statistics';

/** Cycle figures of one bed, accumulated as the run goes (constant memory). */
export interface BedCycleTally {
  readonly drain: 'bell-siphon' | 'standpipe';
  /** Completed cycles. */
  cycles: number;
  readonly periods: RunningStatistics;
  readonly floods: RunningStatistics;
  readonly drains: RunningStatistics;
  readonly highs: RunningStatistics;
  readonly lows: RunningStatistics;
  /** Times of the last priming and break (bell), or of the current flood's start (standpipe), s. */
  lastPrimeS: number;
  lastBreakS: number;
  floodStartS: number;
  /** Standpipe: time spent spilling in the current flood, its start and its highest level. */
  spillingS: number;
  spillStartS: number;
  floodHighM: number;
  /** Whether any spill has started yet. */
  spilled: boolean;
}

/**
 * Turns each bed's cycle events into running statistics as they happen. Bell siphon: a cycle is a
 * priming followed by its break; period = priming to priming, flood time = break to priming, drain
 * time = priming to break, high water at the priming, low water at the break (the events' exact
 * levels). Plain standpipe: a
 * cycle is a flood (spill-start to spill end, possibly several dips) followed by a drain that takes
 * the level below half the standpipe height; period = start of one flood to the next. Levels come
 * from the extremes tracker's window, which sees every state before its transition is applied.
 */
export class BedCycleRecorder {
  readonly tallies = new Map<string, BedCycleTally>();

  constructor(
    beds: readonly {
      id: string;
      index: number;
      drain: 'bell-siphon' | 'standpipe';
      standpipeHeightM: number;
    }[],
    private readonly extremes: readonly LevelExtremes[],
  ) {
    for (const bed of beds) this.tallies.set(bed.id, newTally(bed.drain));
    this.beds = new Map(beds.map((bed) => [bed.id, bed]));
  }

  private readonly beds: ReadonlyMap<string, { index: number; standpipeHeightM: number }>;

  /** Takes one reported event (called as the model reports it). */
  onEvent(event: RunEvent): void {
    const tally = this.tallies.get(event.where);
    const bed = this.beds.get(event.where);
    if (!tally || !bed) return;
    const window = this.extremes[bed.index] as LevelExtremes;
    if (tally.drain === 'bell-siphon') noteBellEvent(tally, event, window);
    else noteStandpipeEvent(tally, event, window, bed.standpipeHeightM);
  }
}

function newTally(drain: 'bell-siphon' | 'standpipe'): BedCycleTally {
  const stats = () => new RunningStatistics();
  return {
    drain,
    cycles: 0,
    periods: stats(),
    floods: stats(),
    drains: stats(),
    highs: stats(),
    lows: stats(),
    lastPrimeS: Number.NaN,
    lastBreakS: Number.NaN,
    floodStartS: Number.NaN,
    spillingS: 0,
    spillStartS: Number.NaN,
    floodHighM: -Infinity,
    spilled: false,
  };
}

function noteBellEvent(tally: BedCycleTally, event: RunEvent, window: LevelExtremes): void {
  if (event.kind === 'primed') {
    if (!Number.isNaN(tally.lastPrimeS)) tally.periods.add(event.t_s - tally.lastPrimeS);
    if (!Number.isNaN(tally.lastBreakS)) tally.floods.add(event.t_s - tally.lastBreakS);
    tally.lastPrimeS = event.t_s;
    tally.highs.add(event.values?.['levelM'] ?? window.windowMaxM);
  } else if (event.kind === 'siphon-break') {
    tally.cycles += 1;
    tally.drains.add(event.t_s - tally.lastPrimeS);
    tally.lastBreakS = event.t_s;
    tally.lows.add(event.values?.['levelM'] ?? window.windowMinM);
  }
}

function noteStandpipeEvent(
  tally: BedCycleTally,
  event: RunEvent,
  window: LevelExtremes,
  crestM: number,
): void {
  if (event.kind === 'spill-start') {
    if (tally.spilled) closeStandpipeDip(tally, event.t_s, window.windowMinM, crestM);
    if (Number.isNaN(tally.floodStartS)) tally.floodStartS = event.t_s;
    tally.spilled = true;
    tally.spillStartS = event.t_s;
    window.windowMinM = Infinity;
    window.windowMaxM = -Infinity;
  } else if (event.kind === 'spill-end') {
    tally.spillingS += event.t_s - tally.spillStartS;
    tally.floodHighM = Math.max(tally.floodHighM, window.windowMaxM);
    window.windowMinM = Infinity;
  }
}

/**
 * Closes the drain between two spills: if the level fell below half the crest it was a real
 * drain, so the flood before it completes a cycle and the next spill starts a new flood.
 */
function closeStandpipeDip(
  tally: BedCycleTally,
  nextStartS: number,
  lowM: number,
  crestM: number,
): void {
  if (!(lowM < 0.5 * crestM)) return;
  tally.cycles += 1;
  tally.floods.add(tally.spillingS);
  tally.highs.add(tally.floodHighM);
  tally.lows.add(lowM);
  tally.periods.add(nextStartS - tally.floodStartS);
  tally.floodStartS = Number.NaN;
  tally.spillingS = 0;
  tally.floodHighM = -Infinity;
}

/** Closes a standpipe bed's last drain when the run ends (the lowest level since its last spill end). */
export function closeOpenStandpipeDrain(
  tally: BedCycleTally,
  window: LevelExtremes,
  crestM: number,
  spilling: boolean,
): void {
  if (tally.drain !== 'standpipe' || !tally.spilled || spilling) return;
  const lowM = window.windowMinM;
  if (!(lowM < 0.5 * crestM)) return;
  tally.cycles += 1;
  tally.floods.add(tally.spillingS);
  tally.highs.add(tally.floodHighM);
  tally.lows.add(lowM);
  tally.spillingS = 0;
}
