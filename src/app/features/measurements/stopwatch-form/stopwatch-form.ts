import { HttpErrorResponse } from '@angular/common/http';
import {
  ChangeDetectionStrategy,
  Component,
  type OnInit,
  inject,
  input,
  output,
  signal,
} from '@angular/core';
import { FormArray, FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import type {
  CreateStopwatchRequest,
  Measurement,
} from '../../../../../shared/contracts/measurements';
import type { UnitSystem } from '../../../../../shared/scenario';
import { readApiError } from '../../../core/http/read-api-error';
import { QuantityInput } from '../../../ui/quantity-input/quantity-input';
import { MeasurementsApi } from '../measurements-api';

/** One timed cycle as typed: times as a stopwatch shows them, marks in SI (m) or empty. */
interface CycleControls {
  bed: FormControl<string>;
  fillTime: FormControl<string>;
  drainTime: FormControl<string>;
  highMark: FormControl<number | null>;
  lowMark: FormControl<number | null>;
}

/** A reading like "4:10", "1:02:03", "250" or "4.2 min". */
const READING = /^\s*(\d+(:\d{1,2}){0,2}(\.\d+)?|\d+(\.\d+)?\s*[a-z]+)\s*$/i;

/**
 * Type in cycles timed by hand: per bed, the fill time (from the siphon breaking to it starting
 * again), the drain time, and optionally the high and low marks read on a ruler. Each row is
 * one cycle; several rows of a bed are averaged.
 */
@Component({
  selector: 'tw-stopwatch-form',
  imports: [
    MatButtonModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatSelectModule,
    QuantityInput,
    ReactiveFormsModule,
  ],
  templateUrl: './stopwatch-form.html',
  styleUrl: './stopwatch-form.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StopwatchForm implements OnInit {
  /** The system the log belongs to. */
  readonly systemId = input.required<string>();
  /** The system's bed ids. */
  readonly beds = input.required<readonly string[]>();
  /** The reader's unit system. */
  readonly system = input<UnitSystem>('metric');
  /** Emitted with the stored log. */
  readonly saved = output<Measurement>();

  private readonly api = inject(MeasurementsApi);
  protected readonly name = new FormControl('Stopwatch log', {
    nonNullable: true,
    validators: [Validators.required],
  });
  protected readonly cycles = new FormArray<FormGroup<CycleControls>>([]);
  protected readonly busy = signal(false);
  protected readonly error = signal<string | null>(null);

  /** Starts with one empty row (the inputs are set by now). */
  ngOnInit(): void {
    this.addCycle();
  }

  /** Adds a row for one more timed cycle (same bed as the last row). */
  protected addCycle(): void {
    const last = this.cycles.at(this.cycles.length - 1) as FormGroup<CycleControls> | undefined;
    const reading = (): FormControl<string> =>
      new FormControl('', {
        nonNullable: true,
        validators: [Validators.required, Validators.pattern(READING)],
      });
    this.cycles.push(
      new FormGroup<CycleControls>({
        bed: new FormControl(last?.controls.bed.value ?? this.beds()[0] ?? '', {
          nonNullable: true,
          validators: [Validators.required],
        }),
        fillTime: reading(),
        drainTime: reading(),
        highMark: new FormControl<number | null>(null),
        lowMark: new FormControl<number | null>(null),
      }),
    );
  }

  /** Removes one row. */
  protected removeCycle(index: number): void {
    this.cycles.removeAt(index);
  }

  /** Stores the log; the server checks every reading and names the row at fault. */
  protected async save(): Promise<void> {
    if (this.cycles.invalid || this.name.invalid) {
      this.cycles.markAllAsTouched();
      return;
    }
    const request: CreateStopwatchRequest = {
      name: this.name.value,
      entries: this.cycles.getRawValue().map((c) => ({
        bed: c.bed,
        fillTime: c.fillTime.trim(),
        drainTime: c.drainTime.trim(),
        ...(c.highMark !== null ? { highMark: c.highMark } : {}),
        ...(c.lowMark !== null ? { lowMark: c.lowMark } : {}),
      })),
    };
    this.busy.set(true);
    this.error.set(null);
    try {
      this.saved.emit(await this.api.createStopwatch(this.systemId(), request));
      this.cycles.clear();
      this.addCycle();
    } catch (error) {
      const body = error instanceof HttpErrorResponse ? readApiError(error.error) : null;
      const fields = body?.error.fields?.map((f) => `${f.path}: ${f.message}`).join(' ') ?? '';
      this.error.set(
        body
          ? `${body.error.message} ${fields}`.trim()
          : 'The server could not be reached; try again.',
      );
    } finally {
      this.busy.set(false);
    }
  }
}
