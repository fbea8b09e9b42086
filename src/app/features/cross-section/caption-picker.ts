import type { UnitSystem } from '../../../../shared/scenario';
import type { CrossSectionEvent } from './cross-section-data';
import { eventCaption } from './event-caption';
import { lastAtOrBefore } from './last-at-or-before';

/** A caption: the events of one instant in words, and that instant. */
export interface Caption {
  /** Index of the instant among the run's event instants (stable for change checks). */
  readonly key: number;
  readonly timeS: number;
  readonly text: string;
  /** Where the last event of the instant happened (a vessel, bed or pump id). */
  readonly where: string;
}

/**
 * Finds the caption to show at a time: the events of the latest instant at or before it (several
 * events at one instant are joined), when that instant is recent enough.
 */
export class CaptionPicker {
  private readonly instants: number[] = [];
  private readonly texts: string[] = [];
  private readonly places: string[] = [];

  /** `events` in time order. */
  constructor(events: readonly CrossSectionEvent[], system: UnitSystem) {
    for (const event of events) {
      const text = eventCaption(event, system);
      const last = this.instants.length - 1;
      if (last >= 0 && this.instants[last] === event.t_s) {
        this.texts[last] = `${this.texts[last]}; ${text}`;
        this.places[last] = event.where;
      } else {
        this.instants.push(event.t_s);
        this.texts.push(text);
        this.places.push(event.where);
      }
    }
  }

  /** The event instants, ascending. */
  times(): readonly number[] {
    return this.instants;
  }

  /** The caption at `timeS` whose instant is at most `maxAgeS` old, else null. */
  at(timeS: number, maxAgeS: number): Caption | null {
    const key = lastAtOrBefore(this.instants, timeS);
    const instant = this.instants[key];
    if (key < 0 || instant === undefined || timeS - instant > maxAgeS) return null;
    return { key, timeS: instant, text: this.texts[key] ?? '', where: this.places[key] ?? '' };
  }
}
