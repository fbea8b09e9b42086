import { HttpErrorResponse } from '@angular/common/http';
import {
  ChangeDetectionStrategy,
  Component,
  computed,
  effect,
  inject,
  input,
  signal,
} from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatSelectModule } from '@angular/material/select';
import { Router, RouterLink } from '@angular/router';
import type { MeasurementComparison } from '../../../../../shared/contracts/measurements';
import type { RunListItem } from '../../../../../shared/contracts/runs';
import { readApiError } from '../../../core/http/read-api-error';
import type { ChartSeriesSet } from '../../../ui/time-series-chart/chart-series';
import { TimeSeriesChart } from '../../../ui/time-series-chart/time-series-chart';
import { RunsApi } from '../../runs/runs-api';
import { UnitPreference } from '../../systems/unit-preference';
import { MeasurementsApi } from '../measurements-api';
import { FIGURE_NAMES, differenceText, figureText } from '../measurement-words';

/**
 * `/systems/:systemId/measurements/:measurementId/compare?run=`: a log over a run. The measured
 * level is shifted so its first complete cycle starts with the run's first steady cycle, and
 * drawn dashed over the simulated level; a table gives measured and simulated period, flood and
 * drain time and marks with their differences.
 */
@Component({
  selector: 'tw-measurement-compare',
  imports: [
    MatButtonModule,
    MatFormFieldModule,
    MatIconModule,
    MatSelectModule,
    RouterLink,
    TimeSeriesChart,
  ],
  templateUrl: './measurement-compare.html',
  styleUrl: './measurement-compare.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class MeasurementCompare {
  /** Route parameters. */
  readonly systemId = input.required<string>();
  readonly measurementId = input.required<string>();
  /** The run id (query parameter). */
  readonly run = input<string | undefined>(undefined);

  private readonly api = inject(MeasurementsApi);
  private readonly runs = inject(RunsApi);
  private readonly router = inject(Router);
  protected readonly units = inject(UnitPreference).system;
  protected readonly comparison = signal<MeasurementComparison | null>(null);
  protected readonly runList = signal<readonly RunListItem[]>([]);
  protected readonly bed = signal<string | undefined>(undefined);
  protected readonly error = signal<string | null>(null);

  protected readonly simulated = computed<ChartSeriesSet | null>(() => {
    const c = this.comparison();
    return c
      ? {
          t_s: c.simulatedSeries.t_s,
          lines: [{ id: 'level', label: `${c.bed} level`, values: c.simulatedSeries.level_m }],
        }
      : null;
  });
  protected readonly measured = computed<ChartSeriesSet | null>(() => {
    const c = this.comparison();
    const series = c?.measuredSeries;
    return c && series
      ? {
          t_s: series.t_s,
          lines: [{ id: 'level', label: `${c.bed} level`, values: series.level_m }],
        }
      : null;
  });
  protected readonly rows = computed(() =>
    (this.comparison()?.rows ?? []).map((row) => ({
      metric: row.metric,
      name: FIGURE_NAMES[row.metric],
      measured: figureText(row.measured, row.unit, this.units()),
      simulated: figureText(row.simulated, row.unit, this.units()),
      difference: differenceText(row, this.units()),
    })),
  );
  protected readonly offset = computed(() =>
    figureText(this.comparison()?.offsetS ?? null, 's', this.units()),
  );

  constructor() {
    effect(() => void this.loadRuns(this.systemId()));
    effect(() => {
      const run = this.run();
      if (run) void this.load(this.measurementId(), run, this.bed());
    });
  }

  private async loadRuns(systemId: string): Promise<void> {
    try {
      this.runList.set(
        (await this.runs.list(systemId, { pageSize: 20 })).items.filter(
          (r) => r.status === 'completed' || r.status === 'stopped',
        ),
      );
    } catch {
      this.runList.set([]);
    }
  }

  private async load(measurementId: string, runId: string, bed: string | undefined): Promise<void> {
    this.error.set(null);
    try {
      this.comparison.set(await this.api.compare(measurementId, runId, bed));
    } catch (error) {
      const body = error instanceof HttpErrorResponse ? readApiError(error.error) : null;
      this.error.set(body?.error.message ?? 'The comparison could not be loaded.');
    }
  }

  /** Switches to another run. */
  protected chooseRun(runId: string): void {
    void this.router.navigate([], { queryParams: { run: runId }, queryParamsHandling: 'merge' });
  }
}
