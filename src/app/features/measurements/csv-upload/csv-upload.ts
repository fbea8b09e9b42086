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
import { FormControl, FormGroup, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import {
  LengthUnitSchema,
  PressureUnitSchema,
  type CsvPreview,
  type Measurement,
} from '../../../../../shared/contracts/measurements';
import type { UnitSystem } from '../../../../../shared/scenario';
import { readApiError } from '../../../core/http/read-api-error';
import { QuantityInput } from '../../../ui/quantity-input/quantity-input';
import {
  blankCsvOptionsForm,
  csvOptionsFormFrom,
  csvOptionsFromForm,
  type CsvOptionsForm,
} from '../csv-options';
import { MeasurementsApi, type CsvSource } from '../measurements-api';
import { figureText } from '../measurement-words';

type OptionsControls = { [K in keyof CsvOptionsForm]: FormControl<CsvOptionsForm[K]> };

function optionsGroup(): FormGroup<OptionsControls> {
  const blank = blankCsvOptionsForm();
  const controls = Object.fromEntries(
    Object.entries(blank).map(([key, value]) => [
      key,
      new FormControl(value, { nonNullable: true }),
    ]),
  );
  return new FormGroup(controls as unknown as OptionsControls);
}

/** Time formats offered, with an example of each. */
const TIME_FORMATS = [
  { value: 'auto', label: 'Detect from the values' },
  { value: 'iso', label: 'ISO 8601 (2024-05-31 14:03:22)' },
  { value: 'dmy', label: 'Day first (31/05/2024 14:03)' },
  { value: 'mdy', label: 'Month first (05/31/2024 2:03 PM)' },
  { value: 'ymd', label: 'Year first (2024/05/31 14:03)' },
  { value: 'epoch-s', label: 'Unix seconds' },
  { value: 'epoch-ms', label: 'Unix milliseconds' },
  { value: 'elapsed-s', label: 'Seconds since the start' },
] as const;

/**
 * Upload a level log: choose a file (or paste text), check the columns and options the server
 * guessed, preview the parsed rows and the rejected ones with their reasons, then save. Nothing is
 * stored until "Save measurement".
 */
@Component({
  selector: 'tw-csv-upload',
  imports: [
    MatButtonModule,
    MatCheckboxModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatProgressBarModule,
    MatSelectModule,
    QuantityInput,
    ReactiveFormsModule,
  ],
  templateUrl: './csv-upload.html',
  styleUrl: './csv-upload.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CsvUpload {
  /** The system the log belongs to. */
  readonly systemId = input.required<string>();
  /** Vessel ids of the system (beds first). */
  readonly vessels = input.required<readonly string[]>();
  /** The reader's unit system. */
  readonly system = input<UnitSystem>('metric');
  /** Emitted with the stored measurement. */
  readonly saved = output<Measurement>();

  private readonly api = inject(MeasurementsApi);
  protected readonly form = optionsGroup();
  protected readonly source = signal<CsvSource | null>(null);
  protected readonly preview = signal<CsvPreview | null>(null);
  protected readonly busy = signal(false);
  protected readonly error = signal<string | null>(null);
  protected readonly pasting = signal(false);
  protected readonly pasted = new FormControl('', { nonNullable: true });
  protected readonly timeFormats = TIME_FORMATS;
  protected readonly lengthUnits = LengthUnitSchema.options;
  protected readonly pressureUnits = PressureUnitSchema.options;
  protected readonly timeZones = Intl.supportedValuesOf('timeZone');
  protected readonly levelKind = signal<CsvOptionsForm['levelKind']>('level');
  protected readonly reference = signal<CsvOptionsForm['reference']>('gauge');
  protected readonly bedMode = signal<CsvOptionsForm['bedMode']>('fixed');

  protected readonly sourceName = computed(() => {
    const source = this.source();
    return source === null ? null : source.kind === 'file' ? source.file.name : source.fileName;
  });
  protected readonly rows = computed(() =>
    (this.preview()?.rows ?? [])
      .slice(0, 20)
      .map((r) => ({ ...r, level: figureText(r.level_m, 'm', this.system()) })),
  );
  protected readonly rejected = computed(() => (this.preview()?.rejected ?? []).slice(0, 20));

  constructor() {
    this.form.controls.levelKind.valueChanges.subscribe((v) => this.levelKind.set(v));
    this.form.controls.reference.valueChanges.subscribe((v) => this.reference.set(v));
    this.form.controls.bedMode.valueChanges.subscribe((v) => this.bedMode.set(v));
  }

  /** Takes the chosen file and asks the server to read it with guessed options. */
  protected async chooseFile(files: FileList | null): Promise<void> {
    const file = files?.item(0);
    if (!file) return;
    this.source.set({ kind: 'file', file });
    await this.load(true);
  }

  /** Takes the pasted text as the file. */
  protected async usePasted(): Promise<void> {
    const text = this.pasted.value;
    if (!text.trim()) return;
    this.source.set({ kind: 'text', text, fileName: 'pasted.csv' });
    await this.load(true);
  }

  /** Reads the file again with the options as they are in the form. */
  protected async refreshPreview(): Promise<void> {
    await this.load(false);
  }

  private async load(guess: boolean): Promise<void> {
    const source = this.source();
    if (!source) return;
    await this.run(async () => {
      const options = guess ? undefined : csvOptionsFromForm(this.form.getRawValue());
      const preview = await this.api.preview(this.systemId(), source, options);
      if (guess) this.adoptOptions(preview, source);
      this.preview.set(preview);
    });
  }

  private adoptOptions(preview: CsvPreview, source: CsvSource): void {
    const base = { ...blankCsvOptionsForm(), mountingHeightM: 0.5, bed: this.vessels()[0] ?? '' };
    const form = csvOptionsFormFrom(preview.options, base);
    const name = source.kind === 'file' ? source.file.name : source.fileName;
    this.form.setValue({ ...form, name: name.replace(/\.[^.]*$/, '') });
  }

  /** Stores the log with the options in the form. */
  protected async save(): Promise<void> {
    const source = this.source();
    if (!source) return;
    await this.run(async () => {
      const measurement = await this.api.create(
        this.systemId(),
        source,
        csvOptionsFromForm(this.form.getRawValue()),
      );
      this.saved.emit(measurement);
      this.source.set(null);
      this.preview.set(null);
    });
  }

  private async run(action: () => Promise<void>): Promise<void> {
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
