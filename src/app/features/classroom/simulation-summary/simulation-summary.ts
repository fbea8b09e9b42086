import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import type { LessonSimulation } from '../../../../../shared/contracts/classroom';
import type { UnitSystem } from '../../../../../shared/scenario';
import { TimeSeriesChart } from '../../../ui/time-series-chart/time-series-chart';
import type { ChartSeriesSet } from '../../../ui/time-series-chart/chart-series';
import { bedSentence, durationWords, readVerdict, statusWords } from '../../runs/verdict-words';

/**
 * What a lesson's system did: the overall verdict and each check in words, one sentence per bed,
 * and the water level of every vessel over the run.
 */
@Component({
  selector: 'tw-simulation-summary',
  imports: [MatIconModule, TimeSeriesChart],
  templateUrl: './simulation-summary.html',
  styleUrl: './simulation-summary.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SimulationSummary {
  /** The simulation to show. */
  readonly simulation = input.required<LessonSimulation>();
  /** The reader's unit system. */
  readonly system = input<UnitSystem>('metric');

  protected readonly status = computed(() => statusWords(this.simulation().verdict));
  protected readonly duration = computed(() => durationWords(this.simulation().durationS));
  protected readonly beds = computed(() =>
    this.simulation().beds.map((bed) => ({ id: bed.id, sentence: bedSentence(bed) })),
  );
  protected readonly verdicts = computed(() =>
    this.simulation().verdicts.map((verdict) => ({
      status: verdict.status,
      ...readVerdict(verdict, this.system()),
    })),
  );
  protected readonly levels = computed<ChartSeriesSet>(() => {
    const { t_s, channels } = this.simulation().levels;
    return { t_s, lines: channels.map((c) => ({ id: c.where, label: c.where, values: c.values })) };
  });
}
