import { DatePipe } from '@angular/common';
import { HttpErrorResponse } from '@angular/common/http';
import {
  ChangeDetectionStrategy,
  Component,
  computed,
  effect,
  inject,
  input,
  signal,
  viewChild,
} from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatMenuModule } from '@angular/material/menu';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { Router, RouterLink } from '@angular/router';
import type { Run, RunListItem, RunSeries } from '../../../../../shared/contracts/runs';
import { readApiError } from '../../../core/http/read-api-error';
import { saveBlob } from '../../../ui/time-series-chart/save-blob';
import { TimeSeriesChart } from '../../../ui/time-series-chart/time-series-chart';
import { RunCrossSection } from '../../cross-section/run-cross-section';
import { UnitPreference } from '../../systems/unit-preference';
import { chartSet } from '../run-figures';
import { RunsApi } from '../runs-api';
import { ServerRunTracker } from '../server-run-tracker';
import { bedSentence, durationWords, levelWords, readVerdict, statusWords } from '../verdict-words';
import { RunEvents } from './run-events';
import { chartFileName } from './chart-file-name';

/**
 * `/runs/:id`: one stored run. Verdicts first in plain words with value, limit and source; then
 * the per-bed cycle table, charts of levels and flows, the event list, downloads and a way to
 * compare with another run of the same system. A run still going shows its progress.
 */
@Component({
  selector: 'tw-run-page',
  imports: [
    DatePipe,
    MatButtonModule,
    MatIconModule,
    MatMenuModule,
    MatProgressBarModule,
    RouterLink,
    RunCrossSection,
    RunEvents,
    TimeSeriesChart,
  ],
  templateUrl: './run-page.html',
  styleUrl: './run-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  providers: [ServerRunTracker],
})
export class RunPage {
  /** The run id from the route. */
  readonly id = input.required<string>();

  private readonly api = inject(RunsApi);
  private readonly router = inject(Router);
  protected readonly units = inject(UnitPreference).system;
  protected readonly tracker = inject(ServerRunTracker);

  protected readonly run = signal<Run | null>(null);
  protected readonly series = signal<RunSeries | null>(null);
  protected readonly siblings = signal<readonly RunListItem[]>([]);
  protected readonly loadError = signal<string | null>(null);
  protected readonly levelsChart = viewChild<TimeSeriesChart>('levels');
  protected readonly flowsChart = viewChild<TimeSeriesChart>('flows');
  protected readonly cursorS = signal<number | null>(null);

  protected readonly headline = computed(() => statusWords(this.run()?.verdict ?? null));
  protected readonly verdicts = computed(() => {
    const order = { fails: 0, warning: 1, ok: 2 } as const;
    return [...(this.run()?.verdicts ?? [])]
      .sort((a, b) => order[a.status] - order[b.status])
      .map((verdict) => ({ verdict, reading: readVerdict(verdict, this.units()) }));
  });
  protected readonly beds = computed(() =>
    (this.run()?.summary?.beds ?? []).map((bed) => ({
      bed,
      sentence: bedSentence(bed),
      period: bed.periodMean_s === null ? '–' : durationWords(bed.periodMean_s),
      flood: bed.floodMean_s === null ? '–' : durationWords(bed.floodMean_s),
      drain: bed.drainMean_s === null ? '–' : durationWords(bed.drainMean_s),
      high: levelWords(bed.highLevel_m, this.units()),
      low: levelWords(bed.lowLevel_m, this.units()),
    })),
  );
  protected readonly vessels = computed(() => {
    const bedIds = new Set((this.run()?.summary?.beds ?? []).map((b) => b.id));
    return (this.run()?.summary?.vessels ?? [])
      .filter((v) => !bedIds.has(v.id))
      .map((v) => ({
        id: v.id,
        lowest: levelWords(v.minLevel_m, this.units()),
        highest: levelWords(v.maxLevel_m, this.units()),
        at: v.minLevelAt_s === null ? '–' : durationWords(v.minLevelAt_s),
      }));
  });
  protected readonly levels = computed(() => {
    const series = this.series();
    return series ? chartSet(series, 'levels') : null;
  });
  protected readonly flows = computed(() => {
    const series = this.series();
    return series ? chartSet(series, 'flows') : null;
  });
  protected readonly others = computed(() =>
    this.siblings().filter((r) => r.id !== this.id() && r.finishedAt !== null),
  );
  protected readonly durationWords = durationWords;

  constructor() {
    effect(() => void this.load(this.id()));
  }

  protected async download(file: 'series.csv' | 'result.json'): Promise<void> {
    const { blob, fileName } = await this.api.download(this.id(), file);
    saveBlob(blob, fileName);
  }

  protected async exportChart(
    chart: TimeSeriesChart | undefined,
    name: string,
    format: 'svg' | 'png',
  ): Promise<void> {
    if (!chart) return;
    const blob =
      format === 'svg'
        ? new Blob([chart.svgMarkup()], { type: 'image/svg+xml' })
        : await chart.pngBlob();
    saveBlob(blob, chartFileName(this.id(), name, format));
  }

  protected async compareWith(other: string): Promise<void> {
    await this.router.navigate(['/runs', 'compare'], { queryParams: { a: this.id(), b: other } });
  }

  private async load(id: string): Promise<void> {
    try {
      let run = await this.api.get(id);
      this.run.set(run);
      if (run.status === 'queued' || run.status === 'running') {
        await this.tracker.follow({ id: run.id, status: run.status, progress: run.progress });
        run = await this.api.get(id);
        this.run.set(run);
      }
      if (run.sampleCount > 0) this.series.set(await this.api.series(id));
      this.siblings.set((await this.api.list(run.systemId, { pageSize: 50 })).items);
    } catch (error: unknown) {
      if (!(error instanceof HttpErrorResponse)) throw error;
      this.loadError.set(
        readApiError(error.error)?.error.message ?? 'The run could not be loaded.',
      );
    }
  }
}
