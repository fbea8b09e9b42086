import type { CrossSectionEvent } from './cross-section-data';
import { lastAtOrBefore } from './last-at-or-before';

/** What a pump is doing: delivering, stopped, or wanting to run with its intake out of water. */
export type PumpState = 'on' | 'off' | 'dry';

const STATE_AFTER_EVENT: Readonly<Record<string, PumpState>> = {
  'pump-on': 'on',
  'pump-restart': 'on',
  'pump-off': 'off',
  'pump-dry': 'dry',
};

/**
 * One pump's state over a run, replayed from its events in order (a start that finds too little
 * water logs `pump-on` then `pump-dry` at the same instant, and the later one wins).
 */
export class PumpStateTrack {
  private readonly times: number[] = [];
  private readonly states: PumpState[] = [];

  constructor(
    readonly pumpId: string,
    private readonly initial: PumpState,
    events: readonly CrossSectionEvent[],
  ) {
    for (const event of events) {
      const state = event.where === pumpId ? STATE_AFTER_EVENT[event.kind] : undefined;
      if (state === undefined) continue;
      this.times.push(event.t_s);
      this.states.push(state);
    }
  }

  /** The state at `timeS`: the last switch at or before it, else the initial state. */
  stateAt(timeS: number): PumpState {
    const found = lastAtOrBefore(this.times, timeS);
    return found < 0 ? this.initial : (this.states[found] as PumpState);
  }
}
