import {
  ChangeDetectionStrategy,
  Component,
  DestroyRef,
  computed,
  effect,
  inject,
  input,
  signal,
  untracked,
} from '@angular/core';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { type UnitSystem, parseScenario } from '../../../../../shared/scenario';
import {
  SIMULATION_WORKER_FACTORY,
  SimulationRunner,
} from '../../../core/simulation/simulation-runner';
import { CrossSection } from '../../cross-section/cross-section';

/** Samples per channel kept from the browser run: fine enough for a smooth animation. */
const ANIMATION_MAX_SAMPLES = 20000;

/**
 * A lesson's system, animated in cross-section. The stored run keeps only coarse levels, so this
 * simulates the lesson's scenario again in a worker (same duration) and shows a progress bar
 * until the fine series is ready.
 */
@Component({
  selector: 'tw-lesson-animation',
  imports: [CrossSection, MatProgressBarModule],
  templateUrl: './lesson-animation.html',
  styleUrl: './lesson-animation.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LessonAnimation {
  /** The lesson's scenario as stored (a scenario file document). */
  readonly scenarioFile = input.required<unknown>();
  /** Simulated seconds to cover (the server run's duration). */
  readonly durationS = input.required<number>();
  /** Units for the cross-section's readouts. */
  readonly system = input<UnitSystem>('metric');

  protected readonly runner = new SimulationRunner(inject(SIMULATION_WORKER_FACTORY));
  protected readonly cursorS = signal<number | null>(null);
  protected readonly scenario = computed(() => {
    const parsed = parseScenario(this.scenarioFile());
    return parsed.success ? parsed.scenario : null;
  });
  protected readonly percent = computed(() => Math.round(this.runner.progress() * 100));

  constructor() {
    inject(DestroyRef).onDestroy(() => this.runner.dispose());
    effect(() => {
      const scenario = this.scenario();
      const durationS = this.durationS();
      if (!scenario || !(durationS > 0)) return;
      untracked(() =>
        this.runner.run({
          scenario,
          durationS,
          budgetMs: null,
          maxSamples: ANIMATION_MAX_SAMPLES,
        }),
      );
    });
  }
}
