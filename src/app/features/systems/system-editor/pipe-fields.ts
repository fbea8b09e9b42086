import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { ReactiveFormsModule } from '@angular/forms';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { QuantityInput } from '../../../ui/quantity-input/quantity-input';
import { EditorSection } from './editor-section';

/** Fitting kinds in the order shown, with their labels. */
const FITTINGS = [
  { key: 'elbow90', label: '90° elbows' },
  { key: 'elbow45', label: '45° elbows' },
  { key: 'teeRun', label: 'Tees (run)' },
  { key: 'teeBranch', label: 'Tees (branch)' },
  { key: 'ballValve', label: 'Ball valves' },
] as const;

/** One pipe run: length, bore, material and fitting counts. */
@Component({
  selector: 'tw-pipe-fields',
  imports: [
    MatFormFieldModule,
    MatInputModule,
    MatSelectModule,
    QuantityInput,
    ReactiveFormsModule,
  ],
  template: `
    <fieldset class="pipe" [formGroup]="group()">
      <legend>{{ legend() }}</legend>
      <div class="row">
        <tw-quantity-input
          formControlName="length"
          label="Length"
          dimension="length"
          [system]="state.units()"
          [error]="at('length')"
        />
        <tw-quantity-input
          formControlName="innerDiameter"
          label="Bore (inner diameter)"
          dimension="diameter"
          [system]="state.units()"
          [error]="at('innerDiameter')"
        />
        <mat-form-field subscriptSizing="dynamic">
          <mat-label>Material</mat-label>
          <mat-select formControlName="material">
            <mat-option [value]="null">PVC (default)</mat-option>
            <mat-option value="pvc">PVC</mat-option>
            <mat-option value="pe">PE</mat-option>
            <mat-option value="steel">Steel</mat-option>
            <mat-option value="copper">Copper</mat-option>
          </mat-select>
        </mat-form-field>
      </div>
      <div class="row fittings" formGroupName="fittings">
        @for (fitting of fittings; track fitting.key) {
          <mat-form-field subscriptSizing="dynamic" class="count">
            <mat-label>{{ fitting.label }}</mat-label>
            <input
              matInput
              class="num"
              type="number"
              min="0"
              step="1"
              [formControlName]="fitting.key"
            />
            @if (at('fittings.' + fitting.key); as message) {
              <mat-error>{{ message }}</mat-error>
            }
          </mat-form-field>
        }
      </div>
    </fieldset>
  `,
  styleUrl: './editor-fields.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PipeFields extends EditorSection {
  /** What the pipe is, e.g. "Drain pipe". */
  readonly legend = input('Pipe');
  protected readonly fittings = FITTINGS;
}
