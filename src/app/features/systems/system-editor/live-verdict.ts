import { ChangeDetectionStrategy, Component, computed, input, output } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import type { Scenario, UnitSystem } from '../../../../../shared/scenario';
import type { SimulationDone } from '../../../core/simulation/simulation-messages';
import {
  bedSentence,
  durationWords,
  levelWords,
  readVerdict,
  statusWords,
} from '../../runs/verdict-words';
import type { VerdictStatus } from '../../../../../shared/contracts/systems';

const STATUS_RANK: Readonly<Record<VerdictStatus, number>> = { ok: 0, warning: 1, fails: 2 };

/**
 * The editor's live answer: the engine's verdicts on the system as typed, run in the browser on
 * a short horizon after every change: how each bed behaves, how low each tank falls, and any
 * check that needs attention, with how much simulated time they cover.
 */
@Component({
  selector: 'tw-live-verdict',
  imports: [MatButtonModule, MatIconModule, MatProgressBarModule],
  templateUrl: './live-verdict.html',
  styleUrl: './live-verdict.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LiveVerdict {
  /** The answer to show, or null before the first one. */
  readonly answer = input.required<SimulationDone | null>();
  /** True while a newer answer is being computed. */
  readonly busy = input(false);
  /** Progress of the computation, 0..1. */
  readonly progress = input(0);
  /** Why the engine failed, or null. */
  readonly crash = input<string | null>(null);
  /** How many schema problems block a run. */
  readonly issueCount = input(0);
  /** The scenario the answer is about (for the fish-safe minimum levels). */
  readonly scenario = input<Scenario | null>(null);
  /** The reader's units. */
  readonly system = input<UnitSystem>('metric');
  /** True when `answer` covers the whole run duration (not a short live check). */
  readonly whole = input(false);
  /** True while the whole duration is being simulated (it can then be cancelled). */
  readonly wholeBusy = input(false);
  /** The whole run's simulated duration, s. */
  readonly fullDurationS = input(0);
  /** Asks for the whole duration to be simulated in the browser. */
  readonly runWhole = output<void>();
  /** Asks to stop that whole-duration run. */
  readonly cancelWhole = output<void>();

  protected readonly headline = computed(() => {
    const verdicts = this.answer()?.result.verdicts ?? [];
    if (verdicts.length === 0) return statusWords(null);
    const worst = verdicts.reduce<VerdictStatus>(
      (w, v) => (STATUS_RANK[v.status] > STATUS_RANK[w] ? v.status : w),
      'ok',
    );
    return statusWords(worst);
  });
  protected readonly beds = computed(() =>
    (this.answer()?.result.summary.beds ?? []).map((bed) => ({
      id: bed.id,
      text: bedSentence(bed),
    })),
  );
  protected readonly lowLevels = computed(() => {
    const answer = this.answer();
    const scenario = this.scenario();
    if (!answer || !scenario) return [];
    return scenario.vessels
      .filter((vessel) => vessel.kind !== 'bed')
      .flatMap((vessel) => {
        const summary = answer.result.summary.vessels.find((v) => v.id === vessel.id);
        if (!summary) return [];
        const below = vessel.minLevel !== undefined && summary.minLevel_m < vessel.minLevel;
        return [
          {
            id: vessel.id,
            lowest: levelWords(summary.minLevel_m, this.system()),
            minimum:
              vessel.minLevel === undefined ? null : levelWords(vessel.minLevel, this.system()),
            below,
          },
        ];
      });
  });
  protected readonly concerns = computed(() =>
    (this.answer()?.result.verdicts ?? [])
      .filter((v) => v.status !== 'ok')
      .map((v) => ({ status: v.status, reading: readVerdict(v, this.system()) })),
  );
  protected readonly coverage = computed(() => {
    const answer = this.answer();
    if (!answer) return '';
    const span = durationWords(answer.reachedS);
    const seconds = (answer.wallMs / 1000).toFixed(2);
    const early = answer.stoppedByBudget ? ', stopped early to stay quick' : '';
    const scope = this.whole() ? 'Whole run:' : 'Live check of the first';
    return `${scope} ${span} simulated in ${seconds} s${early}.`;
  });
  protected readonly fullDuration = computed(() => durationWords(this.fullDurationS()));
}
