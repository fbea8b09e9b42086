import { DatePipe, PercentPipe } from '@angular/common';
import {
  ChangeDetectionStrategy,
  Component,
  DestroyRef,
  computed,
  effect,
  inject,
  input,
  signal,
  viewChild,
} from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { Router, RouterLink } from '@angular/router';
import type {
  BedInflowWindow,
  StartSweepRequest,
  Sweep,
} from '../../../../shared/contracts/sweeps';
import { type Scenario, parseScenario } from '../../../../shared/scenario';
import { SystemsApi } from '../systems/systems-api';
import { UnitPreference } from '../systems/unit-preference';
import { InflowMargins } from './inflow-margins';
import { problemWords } from './problem-words';
import { RegimeMap } from './regime-map';
import { SweepForm } from './sweep-form';
import { type CycleMetric, METRIC_NAMES } from './sweep-map-model';
import { WindowApi } from './window-api';

/** How often a running sweep's progress is read, ms. */
const POLL_MS = 500;

/**
 * `/systems/:id/window`: the operating window. Each bell-siphon bed's inflow margin (solved
 * directly), a sweep of one or two parameters run on the server with progress and cancel, and the
 * map of regimes and cycle times; clicking a cell opens its full run.
 */
@Component({
  selector: 'tw-window-page',
  imports: [
    DatePipe,
    PercentPipe,
    InflowMargins,
    MatButtonModule,
    MatButtonToggleModule,
    MatIconModule,
    MatProgressBarModule,
    RegimeMap,
    RouterLink,
    SweepForm,
  ],
  templateUrl: './window-page.html',
  styleUrl: './window-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class WindowPage {
  /** The system id from the route. */
  readonly id = input.required<string>();

  private readonly api = inject(WindowApi);
  private readonly systems = inject(SystemsApi);
  private readonly router = inject(Router);
  protected readonly units = inject(UnitPreference).system;
  private readonly form = viewChild(SweepForm);

  protected readonly name = signal('');
  protected readonly scenario = signal<Scenario | null>(null);
  protected readonly windows = signal<readonly BedInflowWindow[]>([]);
  protected readonly sweeps = signal<readonly Sweep[]>([]);
  protected readonly sweep = signal<Sweep | null>(null);
  protected readonly problem = signal<string | null>(null);
  protected readonly opening = signal(false);
  protected readonly metric = signal<CycleMetric>('periodS');
  protected readonly metrics = Object.entries(METRIC_NAMES).map(([value, label]) => ({
    value: value as CycleMetric,
    label,
  }));
  protected readonly running = computed(() => {
    const status = this.sweep()?.status;
    return status === 'queued' || status === 'running';
  });
  private timer: ReturnType<typeof setTimeout> | undefined;

  constructor() {
    inject(DestroyRef).onDestroy(() => clearTimeout(this.timer));
    effect(() => void this.load(this.id()));
    effect(() => {
      if (this.scenario() && this.form()) queueMicrotask(() => this.form()?.reset());
    });
  }

  private async load(systemId: string): Promise<void> {
    try {
      const system = await this.systems.get(systemId);
      this.name.set(system.name);
      const parsed = parseScenario(system.scenario);
      if (parsed.success) this.scenario.set(parsed.scenario);
      else
        this.problem.set(
          'The system has scenario problems to fix in the editor before a sweep can run.',
        );
      const [windows, list] = await Promise.all([
        this.api.inflowWindows(systemId).catch(() => ({ beds: [] })),
        this.api.list(systemId),
      ]);
      this.windows.set(windows.beds);
      this.sweeps.set(list.items);
      const latest = list.items[0];
      if (latest) await this.show(latest.id);
    } catch (error) {
      this.problem.set(problemWords(error, 'The system could not be loaded.'));
    }
  }

  /** Shows a sweep: its cells when it has ended, its progress while it runs. */
  protected async show(sweepId: string): Promise<void> {
    clearTimeout(this.timer);
    const head = await this.api.get(sweepId, false);
    this.sweep.set(head);
    if (head.status === 'queued' || head.status === 'running')
      this.timer = setTimeout(() => void this.poll(sweepId), POLL_MS);
    else this.sweep.set(await this.api.get(sweepId));
  }

  private async poll(sweepId: string): Promise<void> {
    try {
      await this.show(sweepId);
      if (!this.running()) this.sweeps.set((await this.api.list(this.id())).items);
    } catch (error) {
      this.problem.set(problemWords(error, 'Lost track of the sweep; reload the page.'));
    }
  }

  protected async start(request: StartSweepRequest): Promise<void> {
    this.problem.set(null);
    try {
      const sweep = await this.api.start(this.id(), request);
      this.sweeps.update((list) => [sweep, ...list]);
      await this.show(sweep.id);
    } catch (error) {
      this.problem.set(problemWords(error, 'The sweep could not start.'));
    }
  }

  protected async cancel(): Promise<void> {
    const current = this.sweep();
    if (!current) return;
    await this.api.cancel(current.id);
    await this.show(current.id);
  }

  /** Opens the full run of a cell (stored on first opening) on the run page. */
  protected async openCell(index: number): Promise<void> {
    const current = this.sweep();
    if (!current || this.opening()) return;
    this.opening.set(true);
    try {
      const runId = await this.api.openCell(current.id, index);
      await this.router.navigate(['/runs', runId]);
    } catch (error) {
      this.problem.set(problemWords(error, 'That cell could not be opened.'));
    } finally {
      this.opening.set(false);
    }
  }

  protected axesWords(sweep: Sweep): string {
    return sweep.parameters.axes.map((a) => `${a.label} (${a.steps})`).join(' × ');
  }
}
