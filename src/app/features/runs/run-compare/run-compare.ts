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
} from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSlideToggleModule } from '@angular/material/slide-toggle';
import { RouterLink } from '@angular/router';
import type { CompareRow, RunComparison, RunSeries } from '../../../../../shared/contracts/runs';
import { readApiError } from '../../../core/http/read-api-error';
import { TimeSeriesChart } from '../../../ui/time-series-chart/time-series-chart';
import { UnitPreference } from '../../systems/unit-preference';
import { compareFigure, materiallyChanged, metricWords } from '../compare-words';
import { chartSet } from '../run-figures';
import { RunsApi } from '../runs-api';
import { durationWords, statusWords } from '../verdict-words';

/** One line of the differences table, ready to show. */
interface DifferenceRow {
  readonly group: string;
  readonly where: string;
  readonly metric: string;
  readonly a: string;
  readonly b: string;
  readonly delta: string;
  readonly changed: boolean;
}

/**
 * `/runs/compare?a=…&b=…`: two runs side by side: their levels and flows overlaid on the same
 * charts (run B dashed) and a table of every figure that differs, in the reader's units.
 */
@Component({
  selector: 'tw-run-compare',
  imports: [
    DatePipe,
    MatButtonModule,
    MatIconModule,
    MatProgressBarModule,
    MatSlideToggleModule,
    RouterLink,
    TimeSeriesChart,
  ],
  templateUrl: './run-compare.html',
  styleUrl: './run-compare.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RunCompare {
  /** Run A's id (query parameter). */
  readonly a = input.required<string>();
  /** Run B's id (query parameter). */
  readonly b = input.required<string>();

  private readonly api = inject(RunsApi);
  protected readonly units = inject(UnitPreference).system;
  protected readonly comparison = signal<RunComparison | null>(null);
  protected readonly seriesA = signal<RunSeries | null>(null);
  protected readonly seriesB = signal<RunSeries | null>(null);
  protected readonly loadError = signal<string | null>(null);
  protected readonly onlyChanged = signal(true);
  protected readonly cursorS = signal<number | null>(null);

  protected readonly levelsA = computed(() => this.chart(this.seriesA(), 'levels'));
  protected readonly levelsB = computed(() => this.chart(this.seriesB(), 'levels'));
  protected readonly flowsA = computed(() => this.chart(this.seriesA(), 'flows'));
  protected readonly flowsB = computed(() => this.chart(this.seriesB(), 'flows'));
  protected readonly differences = computed(() => {
    const comparison = this.comparison();
    if (!comparison) return [];
    const rows = [
      ...comparison.bedStates.map((s) => ({
        group: 'Bed',
        where: s.where,
        metric: 'behaviour',
        a: s.a ?? '–',
        b: s.b ?? '–',
        delta: '',
        changed: s.changed,
      })),
      ...this.rows('Bed', comparison.beds),
      ...this.rows('Vessel', comparison.vessels),
      ...this.rows('Pump', comparison.pumps),
      ...comparison.verdicts.map((v) => ({
        group: 'Check',
        where: '',
        metric: v.check,
        a: statusWords(v.a).label,
        b: statusWords(v.b).label,
        delta: '',
        changed: v.changed,
      })),
    ];
    return this.onlyChanged() ? rows.filter((r) => r.changed) : rows;
  });
  protected readonly statusWords = statusWords;
  protected readonly durationWords = durationWords;

  constructor() {
    effect(() => void this.load(this.a(), this.b()));
  }

  private rows(group: string, rows: readonly CompareRow[]): DifferenceRow[] {
    const system = this.units();
    return rows.map((row) => ({
      group,
      where: row.where,
      metric: metricWords(row.metric),
      a: compareFigure(row.a, row.unit, system),
      b: compareFigure(row.b, row.unit, system),
      delta: compareFigure(row.delta, row.unit, system, true),
      changed: materiallyChanged(row),
    }));
  }

  private chart(series: RunSeries | null, choice: 'levels' | 'flows') {
    return series ? chartSet(series, choice) : null;
  }

  private async load(a: string, b: string): Promise<void> {
    try {
      const [comparison, seriesA, seriesB] = await Promise.all([
        this.api.compare(a, b),
        this.api.series(a),
        this.api.series(b),
      ]);
      this.comparison.set(comparison);
      this.seriesA.set(seriesA);
      this.seriesB.set(seriesB);
    } catch (error: unknown) {
      if (!(error instanceof HttpErrorResponse)) throw error;
      this.loadError.set(
        readApiError(error.error)?.error.message ?? 'The runs could not be compared.',
      );
    }
  }
}
