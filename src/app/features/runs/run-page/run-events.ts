import { ChangeDetectionStrategy, Component, computed, input, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import type { RunEvent } from '../../../../../shared/contracts/runs';
import { formatElapsed } from '../../../ui/time-series-chart/time-axis';

/** Events shown before "Show all". */
const FIRST_EVENTS = 25;

/** Event kinds in words. */
const KIND_WORDS: Readonly<Record<string, string>> = {
  'spill-start': 'starts spilling',
  primed: 'siphon starts',
  'siphon-break': 'siphon breaks',
  'spill-stall': 'stalls spilling',
  'siphon-lock': 'siphon locks on',
  'rim-overflow': 'spills over the rim',
  'overflow-start': 'overflow starts',
  'overflow-end': 'overflow stops',
  'below-min-level': 'below the fish-safe level',
  'pump-dry': 'pump runs dry',
  'pump-restart': 'pump restarts',
  'pump-off': 'pump off',
  'pump-on': 'pump on',
  'leak-start': 'leak starts',
  'back-siphon-start': 'back-siphoning starts',
  'back-siphon-end': 'back-siphoning ends',
};

/** The run's events in time order: when, where, what, and the engine's sentence with the numbers. */
@Component({
  selector: 'tw-run-events',
  imports: [MatButtonModule],
  template: `
    <table class="events">
      <thead>
        <tr>
          <th>Time</th>
          <th>Where</th>
          <th>What</th>
          <th>Detail</th>
        </tr>
      </thead>
      <tbody>
        @for (event of shown(); track $index) {
          <tr>
            <td class="num">{{ event.time }}</td>
            <td>{{ event.where }}</td>
            <td>{{ event.what }}</td>
            <td class="detail">{{ event.detail }}</td>
          </tr>
        } @empty {
          <tr>
            <td colspan="4">No events.</td>
          </tr>
        }
      </tbody>
    </table>
    @if (hidden() > 0) {
      <button mat-button type="button" (click)="expanded.set(true)">
        Show all {{ events().length }} events
      </button>
    }
  `,
  styles: `
    .events {
      width: 100%;
      border-collapse: collapse;
      font: var(--mat-sys-body-small);
    }
    th {
      text-align: left;
      color: var(--mat-sys-on-surface-variant);
      font-weight: 500;
    }
    th,
    td {
      padding: 0.3rem 0.5rem;
      border-bottom: 1px solid var(--mat-sys-outline-variant);
      vertical-align: top;
    }
    .num {
      white-space: nowrap;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RunEvents {
  /** The run's events. */
  readonly events = input.required<readonly RunEvent[]>();
  protected readonly expanded = signal(false);
  private readonly rows = computed(() =>
    this.events().map((event) => ({
      time: formatElapsed(event.t_s),
      where: event.where,
      what: KIND_WORDS[event.kind] ?? event.kind,
      detail: event.detail,
    })),
  );
  protected readonly shown = computed(() =>
    this.expanded() ? this.rows() : this.rows().slice(0, FIRST_EVENTS),
  );
  protected readonly hidden = computed(() => this.rows().length - this.shown().length);
}
