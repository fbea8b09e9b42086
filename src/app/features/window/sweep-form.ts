import { ChangeDetectionStrategy, Component, computed, input, output, signal } from '@angular/core';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import {
  SWEEP_MAX_STEPS,
  SweepParameterSchema,
  type StartSweepRequest,
  type SweepAxisRequest,
  type SweepParameter,
} from '../../../../shared/contracts/sweeps';
import type { Scenario, UnitSystem } from '../../../../shared/scenario';
import { PARAMETER_NAMES, axisUnits } from './axis-units';
import { currentValue, suggestedRange, targetOptions } from './sweep-targets';

type AxisForm = FormGroup<{
  parameter: FormControl<SweepParameter>;
  target: FormControl<string>;
  outlet: FormControl<number>;
  from: FormControl<number>;
  to: FormControl<number>;
  steps: FormControl<number>;
}>;

function axisForm(parameter: SweepParameter, steps: number): AxisForm {
  const number = (value: number) =>
    new FormControl(value, { nonNullable: true, validators: [Validators.required] });
  return new FormGroup({
    parameter: new FormControl(parameter, { nonNullable: true }),
    target: new FormControl('', { nonNullable: true, validators: [Validators.required] }),
    outlet: new FormControl(0, { nonNullable: true }),
    from: number(0),
    to: number(1),
    steps: new FormControl(steps, {
      nonNullable: true,
      validators: [Validators.required, Validators.min(2), Validators.max(SWEEP_MAX_STEPS)],
    }),
  });
}

/**
 * The sweep's set-up: one or two parameters, each with the part it belongs to, its range in the
 * reader's units and its steps; the bed the map shows; each cell's simulated time.
 */
@Component({
  selector: 'tw-sweep-form',
  imports: [
    MatButtonModule,
    MatCheckboxModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatSelectModule,
    ReactiveFormsModule,
  ],
  templateUrl: './sweep-form.html',
  styleUrl: './sweep-form.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SweepForm {
  /** The system's normalised scenario. */
  readonly scenario = input.required<Scenario>();
  readonly system = input<UnitSystem>('metric');
  /** True while a sweep runs: the form cannot start another. */
  readonly busy = input(false);
  /** Asks to start a sweep. */
  readonly startSweep = output<StartSweepRequest>();

  protected readonly parameters = SweepParameterSchema.options.map((p) => ({
    value: p,
    label: PARAMETER_NAMES[p],
  }));
  protected readonly axes: [AxisForm, AxisForm] = [
    axisForm('pump-flow-scale', 10),
    axisForm('standpipe-height', 10),
  ];
  protected readonly twoAxes = signal(true);
  protected readonly bedId = new FormControl('', { nonNullable: true });
  protected readonly hours = new FormControl(2, {
    nonNullable: true,
    validators: [Validators.min(0.05), Validators.max(24)],
  });
  protected readonly beds = computed(() =>
    this.scenario()
      .vessels.filter((v) => v.kind === 'bed')
      .map((v) => v.id),
  );
  private readonly revision = signal(0);
  protected readonly cells = computed(() => {
    this.revision();
    return (
      this.axes[0].controls.steps.value * (this.twoAxes() ? this.axes[1].controls.steps.value : 1)
    );
  });

  /** Fills targets and ranges from the scenario (call once it is known). */
  reset(): void {
    this.axes.forEach((_, k) => this.chooseParameter(k));
    this.bedId.setValue(this.beds()[0] ?? '');
  }

  protected targets(k: number) {
    this.revision();
    return targetOptions(
      this.scenario(),
      this.axes[k]?.controls.parameter.value ?? 'pump-flow-scale',
    );
  }

  protected unitLabel(k: number): string {
    const axis = this.axes[k];
    return axis ? axisUnits(axis.controls.parameter.value, this.system()).label : '';
  }

  /** A new parameter: the first part it fits and a range round its current value. */
  protected chooseParameter(k: number): void {
    const axis = this.axes[k];
    if (!axis) return;
    const first = targetOptions(this.scenario(), axis.controls.parameter.value)[0];
    axis.controls.target.setValue(first?.id ?? '');
    axis.controls.outlet.setValue(0);
    this.chooseTarget(k);
  }

  /** A new part: a range round its current value, in the reader's units. */
  protected chooseTarget(k: number): void {
    const axis = this.axes[k];
    if (!axis) return;
    const { parameter, target, outlet } = axis.getRawValue();
    const range = suggestedRange(
      parameter,
      currentValue(this.scenario(), parameter, target, outlet),
    );
    const { scale } = axisUnits(parameter, this.system());
    const show = (si: number) => Number((scale.offset + scale.factor * si).toPrecision(3));
    axis.patchValue({ from: show(range.from), to: show(range.to) });
    this.revision.update((n) => n + 1);
  }

  protected outlets(k: number): number[] {
    const axis = this.axes[k];
    const option = this.targets(k).find((t) => t.id === axis?.controls.target.value);
    return Array.from({ length: option?.outlets ?? 0 }, (_, i) => i);
  }

  protected stepsChanged(): void {
    this.revision.update((n) => n + 1);
  }

  protected submit(): void {
    const used = this.twoAxes() ? this.axes : [this.axes[0]];
    if (used.some((a) => a.invalid) || this.hours.invalid) return;
    const axes = used.map((axis): SweepAxisRequest => {
      const { parameter, target, outlet, from, to, steps } = axis.getRawValue();
      const units = axisUnits(parameter, this.system());
      return {
        parameter,
        target,
        ...(parameter === 'valve-opening' && { outlet }),
        from: units.toRequest(from),
        to: units.toRequest(to),
        steps,
      };
    });
    this.startSweep.emit({ axes, bedId: this.bedId.value, duration: `${this.hours.value} h` });
  }
}
