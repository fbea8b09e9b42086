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
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatMenuModule } from '@angular/material/menu';
import { Router, RouterLink } from '@angular/router';
import type {
  Calibration,
  Measurement,
  SystemCalibration,
} from '../../../../../shared/contracts/measurements';
import type { RunListItem } from '../../../../../shared/contracts/runs';
import type { System } from '../../../../../shared/contracts/systems';
import { parseScenario } from '../../../../../shared/scenario';
import { readApiError } from '../../../core/http/read-api-error';
import { confirmAction } from '../../../ui/confirm-dialog/confirm-dialog';
import { RunsApi } from '../../runs/runs-api';
import { SystemsApi } from '../../systems/systems-api';
import { UnitPreference } from '../../systems/unit-preference';
import { CalibrationPanel } from '../calibration-panel/calibration-panel';
import { CsvUpload } from '../csv-upload/csv-upload';
import { MeasurementsApi } from '../measurements-api';
import { calibrationLines, coefficientText, COEFFICIENT_NAMES } from '../measurement-words';
import { StopwatchForm } from '../stopwatch-form/stopwatch-form';

/**
 * `/systems/:systemId/measurements`: the levels logged on the real system. Upload a CSV or type a
 * stopwatch log, compare a log with a run, fit the model's coefficients, and keep the fitted values
 * on the system (or go back to the scenario's own).
 */
@Component({
  selector: 'tw-measurements-page',
  imports: [
    DatePipe,
    MatButtonModule,
    MatIconModule,
    MatMenuModule,
    RouterLink,
    CsvUpload,
    StopwatchForm,
    CalibrationPanel,
  ],
  templateUrl: './measurements-page.html',
  styleUrl: './measurements-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class MeasurementsPage {
  /** The system id from the route. */
  readonly systemId = input.required<string>();

  private readonly api = inject(MeasurementsApi);
  private readonly systems = inject(SystemsApi);
  private readonly runs = inject(RunsApi);
  private readonly dialog = inject(MatDialog);
  private readonly router = inject(Router);
  protected readonly units = inject(UnitPreference).system;

  protected readonly systemRow = signal<System | null>(null);
  protected readonly measurements = signal<readonly Measurement[]>([]);
  protected readonly calibrations = signal<readonly Calibration[]>([]);
  protected readonly current = signal<SystemCalibration | null>(null);
  protected readonly runList = signal<readonly RunListItem[]>([]);
  protected readonly error = signal<string | null>(null);

  protected readonly canWrite = computed(() => {
    const access = this.systemRow()?.access;
    return access === 'owner' || access === 'editor';
  });
  private readonly vesselList = computed(() => {
    const parsed = parseScenario(this.systemRow()?.scenario ?? {});
    return parsed.success ? parsed.scenario.vessels : [];
  });
  protected readonly vessels = computed(() => {
    const all = this.vesselList();
    return [...all.filter((v) => v.kind === 'bed'), ...all.filter((v) => v.kind !== 'bed')].map(
      (v) => v.id,
    );
  });
  protected readonly beds = computed(() =>
    this.vesselList()
      .filter((v) => v.kind === 'bed')
      .map((v) => v.id),
  );
  protected readonly currentLines = computed(() => {
    const current = this.current();
    return current ? calibrationLines(current) : [];
  });
  protected readonly completedRuns = computed(() =>
    this.runList().filter((r) => r.status === 'completed' || r.status === 'stopped'),
  );
  protected readonly history = computed(() =>
    this.calibrations().map((c) => ({
      calibration: c,
      values: c.parameters
        .map(
          (p) =>
            `${COEFFICIENT_NAMES[p.key]} (${p.target}) ${coefficientText(p.fitted, p.standardError)}`,
        )
        .join('; '),
    })),
  );

  constructor() {
    effect(() => void this.load(this.systemId()));
  }

  private async load(systemId: string): Promise<void> {
    try {
      const [system, measurements, calibrations, current, runs] = await Promise.all([
        this.systems.get(systemId),
        this.api.list(systemId),
        this.api.calibrations(systemId),
        this.api.current(systemId),
        this.runs.list(systemId, { pageSize: 20 }),
      ]);
      this.systemRow.set(system);
      this.measurements.set(measurements.items);
      this.calibrations.set(calibrations.items);
      this.current.set(current.calibration);
      this.runList.set(runs.items);
    } catch (error) {
      this.error.set(this.message(error, 'This system could not be loaded.'));
    }
  }

  private message(error: unknown, fallback: string): string {
    const body = error instanceof HttpErrorResponse ? readApiError(error.error) : null;
    return body?.error.message ?? fallback;
  }

  /** A new log was stored: list it first. */
  protected added(measurement: Measurement): void {
    this.measurements.set([measurement, ...this.measurements()]);
  }

  /** Reloads fits and the kept values after the calibration panel changed them. */
  protected async calibrationChanged(): Promise<void> {
    const systemId = this.systemId();
    const [calibrations, current] = await Promise.all([
      this.api.calibrations(systemId),
      this.api.current(systemId),
    ]);
    this.calibrations.set(calibrations.items);
    this.current.set(current.calibration);
  }

  /** Opens the overlay of a log on a run. */
  protected compare(measurement: Measurement, run: RunListItem): void {
    void this.router.navigate(
      ['/systems', this.systemId(), 'measurements', measurement.id, 'compare'],
      { queryParams: { run: run.id } },
    );
  }

  /** Where a log's original file downloads from. */
  protected originalUrl(measurement: Measurement): string {
    return this.api.originalUrl(measurement.id);
  }

  /** Deletes a log after asking. */
  protected async remove(measurement: Measurement): Promise<void> {
    const ok = await confirmAction(this.dialog, {
      title: 'Delete this log?',
      message: `"${measurement.name}" and its original file will be gone. Fits already made keep their numbers.`,
      confirmLabel: 'Delete log',
      destructive: true,
    });
    if (!ok) return;
    try {
      await this.api.remove(measurement.id);
      this.measurements.set(this.measurements().filter((m) => m.id !== measurement.id));
    } catch (error) {
      this.error.set(this.message(error, 'The log could not be deleted.'));
    }
  }

  /** Keeps an earlier fit's values. */
  protected async keep(calibration: Calibration): Promise<void> {
    try {
      await this.api.apply(calibration.id);
      await this.calibrationChanged();
    } catch (error) {
      this.error.set(this.message(error, 'The values could not be kept.'));
    }
  }

  /** Goes back to the scenario's own coefficients after asking. */
  protected async clear(): Promise<void> {
    const ok = await confirmAction(this.dialog, {
      title: 'Use the scenario’s own coefficients?',
      message:
        'Later runs will no longer use the calibrated values. The fits stay in the list and can be kept again.',
      confirmLabel: 'Stop using them',
    });
    if (!ok) return;
    await this.api.clear(this.systemId());
    await this.calibrationChanged();
  }
}
