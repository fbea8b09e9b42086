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
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatIconModule } from '@angular/material/icon';
import { MatPaginatorModule, type PageEvent } from '@angular/material/paginator';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSortModule, type Sort } from '@angular/material/sort';
import { MatTableModule } from '@angular/material/table';
import { Router, RouterLink } from '@angular/router';
import type {
  RunList as RunPage,
  RunListItem,
  RunListQuery,
} from '../../../../../shared/contracts/runs';
import { readApiError } from '../../../core/http/read-api-error';
import { UnitPreference } from '../../systems/unit-preference';
import { type RunFigures, runFigures } from '../run-figures';
import { RunsApi } from '../runs-api';
import { ServerRunTracker } from '../server-run-tracker';
import { durationWords, levelWords, statusWords } from '../verdict-words';
import { runSortKey } from './run-sort-key';

/**
 * `/systems/:id/runs`: the stored runs of a system, sorted and paged by the server, with each
 * run's cycles, period and lowest tank level; start a new run, or pick two to compare.
 */
@Component({
  selector: 'tw-run-list',
  imports: [
    DatePipe,
    MatButtonModule,
    MatCheckboxModule,
    MatIconModule,
    MatPaginatorModule,
    MatProgressBarModule,
    MatSortModule,
    MatTableModule,
    RouterLink,
  ],
  templateUrl: './run-list.html',
  styleUrl: './run-list.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  providers: [ServerRunTracker],
})
export class RunList {
  /** The system id from the route. */
  readonly id = input.required<string>();

  private readonly api = inject(RunsApi);
  private readonly router = inject(Router);
  protected readonly units = inject(UnitPreference).system;
  protected readonly tracker = inject(ServerRunTracker);

  protected readonly columns = [
    'select',
    'createdAt',
    'durationS',
    'verdict',
    'cycles',
    'period',
    'lowest',
    'status',
  ];
  protected readonly page = signal<RunPage | null>(null);
  protected readonly sort = signal<RunListQuery['sort']>('-createdAt');
  protected readonly pageIndex = signal(0);
  protected readonly pageSize = signal(10);
  protected readonly figures = signal<ReadonlyMap<string, RunFigures>>(new Map());
  protected readonly selected = signal<readonly string[]>([]);
  protected readonly loadError = signal<string | null>(null);
  protected readonly loading = signal(true);
  protected readonly rows = computed(() => this.page()?.items ?? []);
  protected readonly canCompare = computed(() => this.selected().length === 2);
  protected readonly statusWords = statusWords;
  protected readonly durationWords = durationWords;

  constructor() {
    effect(() => void this.load(this.id(), this.sort(), this.pageIndex(), this.pageSize()));
  }

  protected lowestText(runId: string): string {
    const lowest = this.figures().get(runId)?.lowest ?? null;
    return lowest ? `${levelWords(lowest.levelM, this.units())} (${lowest.id})` : '–';
  }

  protected periodText(runId: string): string {
    const period = this.figures().get(runId)?.periodS ?? null;
    return period === null ? '–' : durationWords(period);
  }

  protected cyclesText(runId: string): string {
    const figures = this.figures().get(runId);
    return figures ? String(figures.cycles) : '–';
  }

  protected changeSort(sort: Sort): void {
    this.sort.set(runSortKey(sort));
    this.pageIndex.set(0);
  }

  protected changePage(event: PageEvent): void {
    this.pageSize.set(event.pageSize);
    this.pageIndex.set(event.pageIndex);
  }

  protected toggle(run: RunListItem, checked: boolean): void {
    const others = this.selected().filter((id) => id !== run.id);
    this.selected.set(checked ? [...others, run.id].slice(-2) : others);
  }

  protected isSelected(run: RunListItem): boolean {
    return this.selected().includes(run.id);
  }

  protected async compare(): Promise<void> {
    // Run A is the older of the two, so B − A reads as "what the change did".
    const byAge = this.rows()
      .filter((run) => this.selected().includes(run.id))
      .sort((x, y) => Date.parse(x.createdAt) - Date.parse(y.createdAt));
    const [a, b] = byAge.map((run) => run.id);
    if (a && b) await this.router.navigate(['/runs', 'compare'], { queryParams: { a, b } });
  }

  protected async runNow(): Promise<void> {
    const ended = await this.tracker.start(this.id());
    if (ended && ended.status !== 'cancelled') await this.router.navigate(['/runs', ended.id]);
    else await this.load(this.id(), this.sort(), this.pageIndex(), this.pageSize());
  }

  private async load(
    systemId: string,
    sort: RunListQuery['sort'],
    pageIndex: number,
    pageSize: number,
  ): Promise<void> {
    this.loading.set(true);
    try {
      const page = await this.api.list(systemId, { sort, page: pageIndex + 1, pageSize });
      this.page.set(page);
      this.loadError.set(null);
      await this.loadFigures(page.items);
    } catch (error: unknown) {
      if (!(error instanceof HttpErrorResponse)) throw error;
      this.loadError.set(
        readApiError(error.error)?.error.message ??
          'The runs could not be loaded. Reload the page to try again.',
      );
    } finally {
      this.loading.set(false);
    }
  }

  /** The list has no result bodies; each ended run's summary is read once for the figures. */
  private async loadFigures(items: readonly RunListItem[]): Promise<void> {
    const known = this.figures();
    const missing = items.filter((item) => item.finishedAt !== null && !known.has(item.id));
    const read = await Promise.all(
      missing.map(async (item) => [item.id, await this.api.get(item.id)] as const),
    );
    const next = new Map(known);
    for (const [id, run] of read) if (run.summary) next.set(id, runFigures(run.summary));
    this.figures.set(next);
  }
}
