import { HttpErrorResponse } from '@angular/common/http';
import {
  ChangeDetectionStrategy,
  Component,
  computed,
  inject,
  input,
  output,
  signal,
} from '@angular/core';
import { FormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import type {
  Calibration,
  CalibrationParameterKey,
  Measurement,
} from '../../../../../shared/contracts/measurements';
import type { UnitSystem } from '../../../../../shared/scenario';
import { readApiError } from '../../../core/http/read-api-error';
import { MeasurementsApi } from '../measurements-api';
import {
  COEFFICIENT_NAMES,
  FIGURE_NAMES,
  coefficientText,
  figureText,
  fitSentence,
} from '../measurement-words';

/**
 * Fit the model to measurements: choose the logs and the coefficients, run the fit on the server
 * (it simulates the system dozens of times), read the fitted values with their standard errors
 * and the residuals before and after, then keep the values on the system or not.
 */
@Component({
  selector: 'tw-calibration-panel',
  imports: [FormsModule, MatButtonModule, MatCheckboxModule, MatIconModule, MatProgressBarModule],
  templateUrl: './calibration-panel.html',
  styleUrl: './calibration-panel.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CalibrationPanel {
  /** The system to calibrate. */
  readonly systemId = input.required<string>();
  /** Its measurements. */
  readonly measurements = input.required<readonly Measurement[]>();
  /** The reader's unit system. */
  readonly system = input<UnitSystem>('metric');
  /** Emitted after a fit is stored or its values are kept. */
  readonly changed = output<void>();

  private readonly api = inject(MeasurementsApi);
  protected readonly chosen = signal<ReadonlySet<string>>(new Set());
  protected readonly fit = signal<Record<CalibrationParameterKey, boolean>>({
    primingCoefficient: true,
    dischargeLossMultiplier: true,
    flowScale: false,
  });
  protected readonly busy = signal(false);
  protected readonly error = signal<string | null>(null);
  protected readonly result = signal<Calibration | null>(null);
  protected readonly names = COEFFICIENT_NAMES;
  protected readonly keys = Object.keys(COEFFICIENT_NAMES) as CalibrationParameterKey[];

  protected readonly parameters = computed(() =>
    (this.result()?.parameters ?? []).map((p) => ({
      ...p,
      name: COEFFICIENT_NAMES[p.key],
      initialText: coefficientText(p.initial, null),
      fittedText: coefficientText(p.fitted, p.standardError),
      change: `${p.fitted >= p.initial ? '+' : '−'}${Math.abs((p.fitted / p.initial - 1) * 100).toFixed(1)} %`,
    })),
  );
  protected readonly residuals = computed(() => {
    const names = new Map(this.measurements().map((m) => [m.id, m.name]));
    return (this.result()?.fit.residuals ?? []).map((r, index) => ({
      index,
      source: names.get(r.measurementId) ?? '…',
      bed: r.bed,
      figure: FIGURE_NAMES[r.metric],
      measured: figureText(r.measured, r.unit, this.system()),
      sigma: figureText(r.sigma, r.unit, this.system()),
      before: figureText(r.before, r.unit, this.system()),
      after: figureText(r.after, r.unit, this.system()),
      normalised:
        r.normalised === null
          ? '–'
          : (Math.abs(r.normalised) < 0.005 ? 0 : r.normalised).toFixed(2),
      fitted: r.fitted,
    }));
  });
  protected readonly sentence = computed(() => {
    const fit = this.result()?.fit;
    return fit ? fitSentence(fit) : '';
  });

  /** Ticks or unticks one measurement. */
  protected toggleMeasurement(id: string, on: boolean): void {
    const next = new Set(this.chosen());
    if (on) next.add(id);
    else next.delete(id);
    this.chosen.set(next);
  }

  /** Ticks or unticks one coefficient. */
  protected toggleCoefficient(key: CalibrationParameterKey, on: boolean): void {
    this.fit.set({ ...this.fit(), [key]: on });
  }

  /** Runs the fit on the server and shows it. */
  protected async runFit(): Promise<void> {
    await this.act(async () => {
      this.result.set(null);
      this.result.set(
        await this.api.calibrate(this.systemId(), {
          measurementIds: [...this.chosen()],
          fit: this.fit(),
        }),
      );
      this.changed.emit();
    });
  }

  /** Keeps the shown fit's values on the system. */
  protected async keep(): Promise<void> {
    const shown = this.result();
    if (!shown) return;
    await this.act(async () => {
      await this.api.apply(shown.id);
      this.result.set({ ...shown, applied: true });
      this.changed.emit();
    });
  }

  private async act(action: () => Promise<void>): Promise<void> {
    this.busy.set(true);
    this.error.set(null);
    try {
      await action();
    } catch (error) {
      const body = error instanceof HttpErrorResponse ? readApiError(error.error) : null;
      this.error.set(body?.error.message ?? 'The server could not be reached; try again.');
    } finally {
      this.busy.set(false);
    }
  }
}
