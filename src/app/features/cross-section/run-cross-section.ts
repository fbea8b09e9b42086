import {
  ChangeDetectionStrategy,
  Component,
  effect,
  inject,
  input,
  model,
  signal,
} from '@angular/core';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import type { RunEvent, RunSeries } from '../../../../shared/contracts/runs';
import type { Scenario, UnitSystem } from '../../../../shared/scenario';
import { CrossSection } from './cross-section';
import { CrossSectionApi } from './cross-section-api';

/**
 * The cross-section of a stored run: loads the run's system snapshot and its series, then shows
 * the animation with the run's events, sharing the time cursor with the page.
 *
 * @example <tw-run-cross-section [runId]="run.id" [events]="run.events" [system]="units()" [(cursorS)]="cursor" />
 */
@Component({
  selector: 'tw-run-cross-section',
  imports: [CrossSection, MatProgressBarModule],
  template: `
    @if (loaded(); as data) {
      <tw-cross-section
        [scenario]="data.scenario"
        [series]="data.series"
        [events]="events()"
        [system]="system()"
        [(cursorS)]="cursorS"
      />
    } @else if (problem(); as message) {
      <p class="problem" role="alert">{{ message }}</p>
    } @else {
      <mat-progress-bar mode="indeterminate" aria-label="Loading the cross-section" />
    }
  `,
  styles: `
    :host {
      display: block;
    }
    .problem {
      color: var(--mat-sys-error);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RunCrossSection {
  /** The stored run to show. */
  readonly runId = input.required<string>();
  /** The run's events. */
  readonly events = input<readonly RunEvent[]>([]);
  /** The reader's unit system. */
  readonly system = input<UnitSystem>('metric');
  /** The page's shared time cursor, s. */
  readonly cursorS = model<number | null>(null);

  private readonly api = inject(CrossSectionApi);
  protected readonly loaded = signal<{ scenario: Scenario; series: RunSeries } | null>(null);
  protected readonly problem = signal<string | null>(null);

  constructor() {
    effect(() => void this.load(this.runId()));
  }

  private async load(runId: string): Promise<void> {
    this.loaded.set(null);
    this.problem.set(null);
    try {
      const scenario = await this.api.runScenario(runId);
      const series = await this.api.runSeries(runId, scenario);
      if (runId === this.runId()) this.loaded.set({ scenario, series });
    } catch (error: unknown) {
      this.problem.set(
        error instanceof Error
          ? `The cross-section could not be loaded: ${error.message}`
          : 'The cross-section could not be loaded.',
      );
    }
  }
}
