import { ChangeDetectionStrategy, Component, computed, input, output } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { formatClock } from './format-clock';
import { PLAYBACK_SPEEDS } from './playback-controller';

/** Event kinds whose ticks stand taller on the scrub bar. */
const MAIN_KINDS = new Set([
  'primed',
  'spill-stall',
  'siphon-lock',
  'pump-dry',
  'rim-overflow',
  'below-min-level',
]);

/** Width of the tick strip in its own user units (it stretches to the bar). */
const STRIP_WIDTH = 1000;

/**
 * Play/pause, the time, a scrub bar over the run with a tick at every event, step to the
 * previous/next event, and the speed. Shows what it is given and says what the reader asked for.
 */
@Component({
  selector: 'tw-playback-bar',
  imports: [MatButtonModule, MatIconModule],
  templateUrl: './playback-bar.html',
  styleUrl: './playback-bar.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PlaybackBar {
  /** Whether time is running. */
  readonly playing = input.required<boolean>();
  /** Simulated seconds per wall second. */
  readonly speed = input.required<number>();
  /** The current time, s. */
  readonly timeS = input.required<number>();
  /** The span of the run, s. */
  readonly startS = input(0);
  readonly endS = input.required<number>();
  /** Every event as its time and kind. */
  readonly events = input<readonly { readonly t_s: number; readonly kind: string }[]>([]);

  /** Asked to play or pause. */
  readonly togglePlay = output<void>();
  /** Asked to move to a time, s. */
  readonly seek = output<number>();
  /** Asked to step to the next (+1) or previous (−1) event. */
  readonly step = output<1 | -1>();
  /** Asked for another speed. */
  readonly speedChange = output<number>();

  protected readonly speeds = PLAYBACK_SPEEDS;
  protected readonly stripWidth = STRIP_WIDTH;
  protected readonly clock = computed(() => formatClock(this.timeS(), true));
  protected readonly endClock = computed(() => formatClock(this.endS()));
  protected readonly ticks = computed(() => {
    const span = Math.max(this.endS() - this.startS(), 1e-9);
    const x = (t: number) => (((t - this.startS()) / span) * STRIP_WIDTH).toFixed(1);
    let minor = '';
    let major = '';
    for (const event of this.events()) {
      if (MAIN_KINDS.has(event.kind)) major += `M${x(event.t_s)},0V12`;
      else minor += `M${x(event.t_s)},6V12`;
    }
    return { minor, major };
  });

  protected readInput(event: Event): void {
    const value = (event.target as HTMLInputElement).valueAsNumber;
    if (Number.isFinite(value)) this.seek.emit(value);
  }

  protected readSpeed(event: Event): void {
    this.speedChange.emit(Number((event.target as HTMLSelectElement).value));
  }
}
