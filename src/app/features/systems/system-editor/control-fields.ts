import { ChangeDetectionStrategy, Component } from '@angular/core';
import { ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatSelectModule } from '@angular/material/select';
import { QuantityInput } from '../../../ui/quantity-input/quantity-input';
import { EditorSection } from './editor-section';
import { newFloatSwitch } from './new-parts';
import { toControl } from './scenario-form';

/**
 * Float switches: each stops one pump when the water in one vessel falls below a level and lets
 * it run again once the water is back above a higher level (levels above that vessel's floor).
 */
@Component({
  selector: 'tw-control-fields',
  imports: [
    MatButtonModule,
    MatFormFieldModule,
    MatIconModule,
    MatSelectModule,
    QuantityInput,
    ReactiveFormsModule,
  ],
  templateUrl: './control-fields.html',
  styleUrl: './editor-fields.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ControlFields extends EditorSection {
  /** Adds a low-water cut-off on the first pump, floating in the vessel that pump draws from. */
  protected addFloatSwitch(): void {
    const pump = this.list('pumps').at(0);
    const vesselId = String(pump?.get('in')?.value ?? this.state.vesselIds()[0] ?? 'tank');
    const vessel = this.list('vessels').controls.find((v) => v.get('id')?.value === vesselId);
    const heightM = Number(vessel?.get('height')?.value ?? 0.6);
    const intake = Number(pump?.get('intakeHeight')?.value);
    this.list('controls').push(
      toControl(
        newFloatSwitch(
          String(pump?.get('id')?.value ?? ''),
          vesselId,
          heightM,
          Number.isFinite(intake) ? intake : undefined,
        ),
      ),
    );
  }

  protected removeFloatSwitch(index: number): void {
    this.list('controls').removeAt(index);
  }
}
