import { ChangeDetectionStrategy, Component } from '@angular/core';
import { ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { SCENARIO_DEFAULTS } from '../../../../../shared/scenario';
import { EditorSection } from './editor-section';

type LossKey = keyof typeof SCENARIO_DEFAULTS.lossCoefficients;

/** Each minor loss the run uses, with its label, in the order shown. */
const LOSSES: readonly { key: LossKey; label: string }[] = [
  { key: 'elbow90', label: '90° elbow' },
  { key: 'elbow45', label: '45° elbow' },
  { key: 'teeRun', label: 'Tee (run)' },
  { key: 'teeBranch', label: 'Tee (branch)' },
  { key: 'ballValve', label: 'Ball valve, open' },
  { key: 'entrance', label: 'Pipe entrance' },
  { key: 'exit', label: 'Pipe exit' },
  { key: 'bellReturn', label: 'Turn inside the bell' },
];

/**
 * The minor-loss coefficients K (head lost = K·v²/2g) every pipe of the run uses: each field
 * empty for the usual value, shown beside it, or a number to override it.
 */
@Component({
  selector: 'tw-loss-coefficient-fields',
  imports: [
    MatButtonModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    ReactiveFormsModule,
  ],
  template: `
    <fieldset [formGroup]="group()">
      <legend>Loss coefficients (K per fitting)</legend>
      <p class="note">
        Each K times the velocity head v²/2g is the head a fitting loses. Leave a field empty for
        the usual value; type a number to use your own, e.g. from the fitting maker's sheet.
      </p>
      <div class="row" formGroupName="lossCoefficients">
        @for (loss of losses; track loss.key) {
          <mat-form-field subscriptSizing="dynamic">
            <mat-label>{{ loss.label }}</mat-label>
            <input
              matInput
              class="num"
              type="number"
              min="0"
              step="0.05"
              [formControlName]="loss.key"
              [placeholder]="loss.usual"
            />
            <mat-hint>Empty: {{ loss.usual }}</mat-hint>
            @if (at('lossCoefficients.' + loss.key); as message) {
              <mat-error>{{ message }}</mat-error>
            }
          </mat-form-field>
        }
      </div>
      <button
        mat-button
        type="button"
        (click)="useUsualValues()"
        [disabled]="state.readOnly() || !overridden()"
      >
        <mat-icon>restart_alt</mat-icon>Use the usual values
      </button>
    </fieldset>
  `,
  styleUrl: './editor-fields.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LossCoefficientFields extends EditorSection {
  /** The losses with the usual value of each, as text. */
  protected readonly losses = LOSSES.map((loss) => ({
    ...loss,
    usual: String(SCENARIO_DEFAULTS.lossCoefficients[loss.key]),
  }));

  /** True when any coefficient has a value of its own. */
  protected overridden(): boolean {
    this.state.document();
    const values = this.sub('lossCoefficients').getRawValue() as Record<string, unknown>;
    return Object.values(values).some((value) => value !== null && value !== '');
  }

  /** Empties every override, so the run uses the usual values again. */
  protected useUsualValues(): void {
    this.sub('lossCoefficients').patchValue(
      Object.fromEntries(LOSSES.map(({ key }) => [key, null])),
    );
  }
}
