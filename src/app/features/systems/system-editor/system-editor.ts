import { HttpErrorResponse } from '@angular/common/http';
import {
  ChangeDetectionStrategy,
  Component,
  DestroyRef,
  computed,
  effect,
  inject,
  input,
  signal,
} from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { FormControl, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { ErrorStateMatcher } from '@angular/material/core';
import { MatExpansionModule } from '@angular/material/expansion';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatTabsModule } from '@angular/material/tabs';
import { MatDialog } from '@angular/material/dialog';
import { MatSnackBar } from '@angular/material/snack-bar';
import { Router, RouterLink } from '@angular/router';
import { debounceTime, firstValueFrom, tap } from 'rxjs';
import type { FieldError } from '../../../../../shared/contracts/api-error';
import type { System } from '../../../../../shared/contracts/systems';
import { readApiError } from '../../../core/http/read-api-error';
import {
  SIMULATION_WORKER_FACTORY,
  SimulationRunner,
} from '../../../core/simulation/simulation-runner';
import { SafetyCautions } from '../../../ui/safety-cautions/safety-cautions';
import { saveBlob } from '../../../ui/time-series-chart/save-blob';
import { ServerRunTracker } from '../../runs/server-run-tracker';
import { ElevationDrawing } from '../elevation-drawing/elevation-drawing';
import { SystemsApi } from '../systems-api';
import { UnitToggle } from '../unit-toggle';
import { scenarioErrorStateMatcher } from './editor-section';
import { ControlFields } from './control-fields';
import { EditorState } from './editor-state';
import { EventsFields } from './events-fields';
import { FaultFields } from './fault-fields';
import { LiveVerdict } from './live-verdict';
import { PumpList } from './pump-list';
import { RunFields } from './run-fields';
import { ShareDialog, type ShareDialogData } from './share-dialog';
import { type DynamicGroup, documentFromForm, editableScenario, toControl } from './scenario-form';
import { VesselList } from './vessel-list';

/** Simulated time of the live check after each change, s. */
const LIVE_HORIZON_S = 3600;
/** Wall time the live check may take before it answers with what it has, ms. */
const LIVE_BUDGET_MS = 700;
/** Samples kept per channel by browser runs. */
const BROWSER_MAX_SAMPLES = 800;

/**
 * `/systems/:id`: the system editor. Forms per component bound to the shared scenario schema,
 * values in SI shown in the reader's units; a to-scale side elevation and a live verdict from the
 * engine in a web worker that follow every change; save with optimistic locking; run on the
 * server with progress and cancel.
 */
@Component({
  selector: 'tw-system-editor',
  imports: [
    ControlFields,
    ElevationDrawing,
    EventsFields,
    FaultFields,
    LiveVerdict,
    MatButtonModule,
    MatExpansionModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatProgressBarModule,
    MatTabsModule,
    PumpList,
    ReactiveFormsModule,
    RouterLink,
    RunFields,
    SafetyCautions,
    UnitToggle,
    VesselList,
  ],
  templateUrl: './system-editor.html',
  styleUrl: './system-editor.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  providers: [
    EditorState,
    ServerRunTracker,
    {
      provide: ErrorStateMatcher,
      useFactory: () => scenarioErrorStateMatcher(inject(EditorState)),
    },
  ],
})
export class SystemEditor {
  /** The system id from the route. */
  readonly id = input.required<string>();

  private readonly api = inject(SystemsApi);
  private readonly router = inject(Router);
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);
  private readonly destroyRef = inject(DestroyRef);
  protected readonly state = inject(EditorState);
  protected readonly serverRun = inject(ServerRunTracker);
  protected readonly live = new SimulationRunner(inject(SIMULATION_WORKER_FACTORY));
  protected readonly whole = new SimulationRunner(inject(SIMULATION_WORKER_FACTORY));

  protected readonly system = signal<System | null>(null);
  protected readonly form = signal<DynamicGroup | null>(null);
  protected readonly name = new FormControl('', { nonNullable: true });
  protected readonly dirty = signal(false);
  protected readonly saving = signal(false);
  protected readonly stale = signal(false);
  protected readonly loadError = signal<string | null>(null);
  protected readonly saveError = signal<{ message: string; fields: readonly FieldError[] } | null>(
    null,
  );
  private readonly showWhole = signal(false);
  /** Edits of the name and the form so far; a save leaves `dirty` set if one came in meanwhile. */
  private edits = 0;

  protected readonly answer = computed(
    () => (this.showWhole() ? this.whole.done() : null) ?? this.live.done(),
  );
  protected readonly answerIsWhole = computed(() => this.showWhole() && this.whole.done() !== null);
  protected readonly busy = computed(
    () => this.live.status() === 'running' || this.whole.status() === 'running',
  );
  protected readonly progress = computed(() =>
    this.whole.status() === 'running' ? this.whole.progress() : this.live.progress(),
  );
  protected readonly fullDurationS = computed(() => this.state.scenario()?.run.duration ?? 0);
  protected readonly pumpFlows = computed(
    () => new Map((this.answer()?.result.summary.pumps ?? []).map((p) => [p.id, p.meanFlow_m3s])),
  );
  protected readonly canEdit = computed(() => this.system()?.access !== 'viewer');
  protected readonly canRun = computed(
    () => this.state.issues().length === 0 && !this.saving() && !this.serverRun.isActive(),
  );
  protected readonly canSave = computed(
    () => this.canEdit() && this.dirty() && this.state.issues().length === 0 && !this.saving(),
  );

  constructor() {
    this.destroyRef.onDestroy(() => {
      this.live.dispose();
      this.whole.dispose();
    });
    this.name.valueChanges.pipe(takeUntilDestroyed()).subscribe(() => this.noteEdit());
    effect(() => void this.load(this.id()));
    effect(() => {
      const scenario = this.state.scenario();
      if (!scenario) return;
      this.showWhole.set(false);
      this.whole.cancel();
      this.live.run({
        scenario,
        durationS: Math.min(LIVE_HORIZON_S, scenario.run.duration),
        budgetMs: LIVE_BUDGET_MS,
        maxSamples: BROWSER_MAX_SAMPLES,
      });
    });
  }

  protected runWholeHere(): void {
    const scenario = this.state.scenario();
    if (!scenario) return;
    this.showWhole.set(true);
    this.whole.run({
      scenario,
      durationS: scenario.run.duration,
      budgetMs: null,
      maxSamples: BROWSER_MAX_SAMPLES,
    });
  }

  protected cancelWhole(): void {
    this.whole.cancel();
    this.showWhole.set(false);
  }

  protected async save(): Promise<boolean> {
    const system = this.system();
    if (!system) return false;
    // A click may come before the debounced copy of the last keystroke: save what the form holds.
    this.commitEdits();
    if (this.state.issues().length > 0) return false;
    const editsSent = this.edits;
    this.saving.set(true);
    this.saveError.set(null);
    try {
      const saved = await this.api.update(system.id, {
        version: system.version,
        name: this.name.value.trim(),
        scenario: this.state.document(),
      });
      this.system.set(saved);
      this.dirty.set(this.edits !== editsSent);
      return true;
    } catch (error: unknown) {
      if (!(error instanceof HttpErrorResponse)) throw error;
      const body = readApiError(error.error);
      if (error.status === 409) this.stale.set(true);
      else
        this.saveError.set({
          message: body?.error.message ?? 'The system could not be saved. Try again in a moment.',
          fields: body?.error.fields ?? [],
        });
      return false;
    } finally {
      this.saving.set(false);
    }
  }

  protected async reload(): Promise<void> {
    this.stale.set(false);
    await this.load(this.id());
  }

  protected async runOnServer(): Promise<void> {
    const system = this.system();
    if (!system) return;
    if (this.dirty() && !(await this.save())) return;
    const ended = await this.serverRun.start(system.id);
    if (ended && ended.status !== 'cancelled') await this.router.navigate(['/runs', ended.id]);
  }

  protected async openShare(): Promise<void> {
    const system = this.system();
    if (!system) return;
    const ref = this.dialog.open<ShareDialog, ShareDialogData, string>(ShareDialog, {
      data: { systemId: system.id, systemName: system.name },
    });
    const done = await firstValueFrom(ref.afterClosed());
    if (done) this.snackBar.open(done, undefined, { duration: 4000 });
  }

  protected async exportScenario(): Promise<void> {
    const system = this.system();
    if (!system) return;
    const file = await this.api.exportScenario(system.id);
    saveBlob(file.blob, file.fileName);
  }

  private async load(id: string): Promise<void> {
    try {
      const system = await this.api.get(id);
      this.adopt(system);
    } catch (error: unknown) {
      if (!(error instanceof HttpErrorResponse)) throw error;
      this.loadError.set(
        readApiError(error.error)?.error.message ?? 'The system could not be loaded.',
      );
    }
  }

  private adopt(system: System): void {
    const form = toControl(editableScenario(system.scenario)) as DynamicGroup;
    this.system.set(system);
    this.name.setValue(system.name);
    this.state.readOnly.set(system.access === 'viewer');
    if (system.access === 'viewer') {
      form.disable();
      this.name.disable();
    }
    this.state.document.set(documentFromForm(form.getRawValue()));
    form.valueChanges
      .pipe(
        tap(() => this.noteEdit()),
        debounceTime(120),
        takeUntilDestroyed(this.destroyRef),
      )
      .subscribe(() => this.commitEdits());
    this.form.set(form);
    this.dirty.set(false);
  }

  private noteEdit(): void {
    this.edits++;
    this.dirty.set(true);
  }

  /** Copies the form's values into the document now (the live check follows it). */
  private commitEdits(): void {
    const form = this.form();
    if (form) this.state.document.set(documentFromForm(form.getRawValue()));
  }
}
