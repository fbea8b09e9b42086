import { ChangeDetectionStrategy, Component } from '@angular/core';
import { ReactiveFormsModule } from '@angular/forms';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatSelectModule } from '@angular/material/select';
import { QuantityInput } from '../../../ui/quantity-input/quantity-input';
import { EditorSection } from './editor-section';
import { LossCoefficientFields } from './loss-coefficient-fields';

/**
 * Water temperature and how to run: simulated duration, output spacing, friction model and the
 * fittings' loss coefficients.
 */
@Component({
  selector: 'tw-run-fields',
  imports: [
    LossCoefficientFields,
    MatFormFieldModule,
    MatSelectModule,
    QuantityInput,
    ReactiveFormsModule,
  ],
  template: `
    <div [formGroup]="group()">
      <div class="row" formGroupName="water">
        <tw-quantity-input
          formControlName="temperature"
          label="Water temperature"
          dimension="temperature"
          [system]="state.units()"
          [error]="at('water.temperature')"
          hint="Empty: 20 °C"
        />
      </div>
      <div class="row" formGroupName="run">
        <tw-quantity-input
          formControlName="duration"
          unit="h"
          label="Simulated time"
          dimension="time"
          [system]="state.units()"
          [error]="at('run.duration')"
          hint="e.g. 6 h; empty: 6 h"
        />
        <tw-quantity-input
          formControlName="outputInterval"
          label="Sample every"
          dimension="time"
          [system]="state.units()"
          [error]="at('run.outputInterval')"
          hint="Empty: 5 s"
        />
        <mat-form-field subscriptSizing="dynamic">
          <mat-label>Pipe friction</mat-label>
          <mat-select formControlName="friction">
            <mat-option [value]="null">Darcy–Weisbach (default)</mat-option>
            <mat-option value="darcy-weisbach">Darcy–Weisbach</mat-option>
            <mat-option value="hazen-williams">Hazen–Williams</mat-option>
          </mat-select>
        </mat-form-field>
      </div>
    </div>
    <tw-loss-coefficient-fields [group]="group()" [path]="path()" />
  `,
  styleUrl: './editor-fields.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RunFields extends EditorSection {}
