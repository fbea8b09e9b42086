import {
  ChangeDetectionStrategy,
  Component,
  computed,
  effect,
  forwardRef,
  input,
  signal,
  viewChild,
} from '@angular/core';
import { type ControlValueAccessor, NG_VALUE_ACCESSOR } from '@angular/forms';
import type { ErrorStateMatcher } from '@angular/material/core';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInput, MatInputModule } from '@angular/material/input';
import {
  type Dimension,
  type UnitSystem,
  fromDisplay,
  parseQuantity,
  toDisplay,
} from '../../../../shared/scenario';
import { readTypedQuantity } from './read-typed-quantity';

/** Significant digits shown for a stored value; the value itself keeps every digit until retyped. */
const EDIT_DIGITS = 4;

/**
 * A Material text field for one physical quantity. The form control holds the value in SI
 * (degrees Celsius for temperature) or null; the field shows it in the unit `system` uses for
 * `dimension` (e.g. a diameter in mm or in). People type a number in that unit, or a number with
 * any unit of the right kind ("1 in", "300 L/h"); the control receives the SI value. A stored value
 * is only rewritten when someone types in the field, so showing it never rounds it.
 *
 * @example <tw-quantity-input formControlName="height" label="Standpipe height" dimension="length" [system]="units()" />
 */
@Component({
  selector: 'tw-quantity-input',
  imports: [MatFormFieldModule, MatInputModule],
  templateUrl: './quantity-input.html',
  styleUrl: './quantity-input.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  providers: [
    { provide: NG_VALUE_ACCESSOR, useExisting: forwardRef(() => QuantityInput), multi: true },
  ],
})
export class QuantityInput implements ControlValueAccessor {
  /** The field's label, e.g. "Standpipe height". */
  readonly label = input.required<string>();
  /** What kind of quantity the field holds; sets the unit shown. */
  readonly dimension = input.required<Dimension>();
  /** The reader's unit system. */
  readonly system = input<UnitSystem>('metric');
  /** A problem found elsewhere (e.g. by the scenario schema) to show under the field. */
  readonly error = input<string | null>(null);
  /** A short hint under the field when there is no error. */
  readonly hint = input('');
  /**
   * A unit to show instead of the system's (a mathjs unit without an offset, e.g. "h" for a run
   * that lasts hours), or null.
   */
  readonly unit = input<string | null>(null);

  private readonly valueSi = signal<number | null>(null);
  private readonly draft = signal<string | null>(null);
  private readonly typingError = signal<string | null>(null);
  protected readonly disabled = signal(false);
  private onChange: (value: number | null) => void = () => undefined;
  private onTouched: () => void = () => undefined;

  /** The unit label after the number ("mm", "gal/min"), empty for plain numbers. */
  protected readonly unitLabel = computed(
    () => this.unit() ?? toDisplay(1, this.dimension(), this.system()).label,
  );
  /** The mathjs unit bare numbers are read and shown in. */
  private readonly displayUnit = computed(
    () => this.unit() ?? toDisplay(1, this.dimension(), this.system()).unit,
  );
  /** What the field shows: what is being typed, else the stored value in display units. */
  protected readonly text = computed(() => this.draft() ?? this.displayText());
  /** The message under the field: a typing problem first, then the outside error. */
  protected readonly shownError = computed(() => this.typingError() ?? this.error());
  /** Puts the inner input into Material's error look whenever there is a message. */
  protected readonly errorState: ErrorStateMatcher = {
    isErrorState: () => this.shownError() !== null,
  };

  /** The current value in SI, as the form control holds it. */
  readonly value = this.valueSi.asReadonly();

  private readonly inner = viewChild.required(MatInput);

  constructor() {
    // MatInput re-reads its error state by itself only when it has a form control of its own.
    effect(() => {
      this.shownError();
      this.inner().updateErrorState();
    });
  }

  writeValue(value: unknown): void {
    this.draft.set(null);
    this.typingError.set(null);
    if (typeof value === 'number' && Number.isFinite(value)) this.valueSi.set(value);
    else if (typeof value === 'string' && value.trim() !== '') {
      const parsed = parseQuantity(value, this.dimension(), '');
      this.valueSi.set(parsed.success ? parsed.value : null);
    } else this.valueSi.set(null);
  }

  registerOnChange(fn: (value: number | null) => void): void {
    this.onChange = fn;
  }

  registerOnTouched(fn: () => void): void {
    this.onTouched = fn;
  }

  setDisabledState(isDisabled: boolean): void {
    this.disabled.set(isDisabled);
  }

  protected readTyping(event: Event): void {
    const text = (event.target as HTMLInputElement).value;
    this.draft.set(text);
    const reading = readTypedQuantity(text, this.dimension(), this.displayUnit());
    this.typingError.set(reading.success ? null : reading.message);
    if (!reading.success) return;
    this.valueSi.set(reading.valueSi);
    this.onChange(reading.valueSi);
  }

  protected finishTyping(): void {
    if (this.typingError() === null) this.draft.set(null);
    this.onTouched();
  }

  private displayText(): string {
    const si = this.valueSi();
    if (si === null) return '';
    const unit = this.unit();
    const shown =
      unit === null
        ? toDisplay(si, this.dimension(), this.system()).value
        : si / fromDisplay(1, unit, this.dimension());
    return String(Number(shown.toPrecision(EDIT_DIGITS)));
  }
}
