import type { CrossSectionEvent } from './cross-section-data';
import { lastAtOrBefore } from './last-at-or-before';
import type { SeriesReader } from './series-reader';

/** The phase of one bed as the drawing names it. */
export type BedPhase = 'filling' | 'spilling' | 'priming' | 'siphoning' | 'break';

/** The series' phase codes in order: 0 filling, 1 spilling, 2 priming, 3 siphoning, 4 break. */
export const PHASE_BY_CODE: readonly BedPhase[] = [
  'filling',
  'spilling',
  'priming',
  'siphoning',
  'break',
];

/**
 * Priming and break are instants in the model; the drawing keeps naming them for this long
 * (simulated seconds) after they happen, while the bell's air is carried out or let in.
 */
export const PRIMING_SHOWN_S = 8;
export const BREAK_SHOWN_S = 6;

/** A bed's phase at one time, and how long ago (s) it began (Infinity when unknown). */
export interface BedPhaseReading {
  readonly phase: BedPhase;
  readonly sinceS: number;
}

/** The code an event leaves the bed in; events that do not change the phase are absent. */
const CODE_AFTER_EVENT: Readonly<Record<string, number>> = {
  'spill-start': 1,
  'spill-end': 0,
  primed: 3,
  'siphon-break': 0,
};

/**
 * One bed's phase over a run. The phase channel (`phase:<bed>`) is the base, held from the last
 * sample; the bed's own events, exact in time, correct it between samples (a thinned series can
 * skip a whole spill); priming and break are shown for a few seconds after their event.
 */
export class BedPhaseTrack {
  private readonly changeTimes: number[] = [];
  private readonly changeCodes: number[] = [];
  private readonly primedTimes: number[] = [];
  private readonly breakTimes: number[] = [];
  private readonly channelId: string;

  constructor(
    readonly bedId: string,
    private readonly reader: SeriesReader,
    events: readonly CrossSectionEvent[],
  ) {
    this.channelId = `phase:${bedId}`;
    for (const event of events) {
      if (event.where !== bedId) continue;
      const code = CODE_AFTER_EVENT[event.kind];
      if (code === undefined) continue;
      this.changeTimes.push(event.t_s);
      this.changeCodes.push(code);
      if (event.kind === 'primed') this.primedTimes.push(event.t_s);
      if (event.kind === 'siphon-break') this.breakTimes.push(event.t_s);
    }
  }

  /** The bed's phase at `timeS`. */
  phaseAt(timeS: number): BedPhaseReading {
    const sampleIndex = this.reader.indexAt(timeS);
    const sampleTimeS =
      sampleIndex < 0 ? Number.NEGATIVE_INFINITY : (this.reader.sampleTimes()[sampleIndex] ?? 0);
    let code = this.reader.heldAt(this.channelId, timeS);
    let sinceS = Number.POSITIVE_INFINITY;
    const change = lastAtOrBefore(this.changeTimes, timeS);
    if (change >= 0) {
      const changeS = this.changeTimes[change] as number;
      sinceS = timeS - changeS;
      if (changeS >= sampleTimeS || Number.isNaN(code)) code = this.changeCodes[change] as number;
    }
    if (Number.isNaN(code)) code = 0;
    const primed = lastAtOrBefore(this.primedTimes, timeS);
    const sincePrimed = primed < 0 ? Infinity : timeS - (this.primedTimes[primed] as number);
    if (code === 3 && sincePrimed < PRIMING_SHOWN_S)
      return { phase: 'priming', sinceS: sincePrimed };
    const broke = lastAtOrBefore(this.breakTimes, timeS);
    const sinceBreak = broke < 0 ? Infinity : timeS - (this.breakTimes[broke] as number);
    if (code === 0 && sinceBreak < BREAK_SHOWN_S) return { phase: 'break', sinceS: sinceBreak };
    return { phase: PHASE_BY_CODE[Math.round(code)] ?? 'filling', sinceS };
  }
}
