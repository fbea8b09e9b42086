import { ChangeDetectionStrategy, Component, computed } from '@angular/core';
import { ReactiveFormsModule } from '@angular/forms';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { QuantityInput } from '../../../ui/quantity-input/quantity-input';
import { EditorSection } from './editor-section';
import { toControl } from './scenario-form';

/**
 * The fields every vessel has: id, plan shape (box or cylinder), floor elevation, height,
 * starting level, fish-safe minimum and an optional overflow opening.
 */
@Component({
  selector: 'tw-vessel-fields',
  imports: [
    MatCheckboxModule,
    MatFormFieldModule,
    MatInputModule,
    MatSelectModule,
    QuantityInput,
    ReactiveFormsModule,
  ],
  templateUrl: './vessel-fields.html',
  styleUrl: './editor-fields.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class VesselFields extends EditorSection {
  protected readonly isBed = computed(() => this.group().get('kind')?.value === 'bed');

  protected shapeType(): string {
    return String(this.group().get(['shape', 'type'])?.value ?? 'box');
  }

  protected hasOverflow(): boolean {
    return this.group().contains('overflow');
  }

  protected changeShape(type: 'box' | 'cylinder'): void {
    const length = Number(
      this.group().get(['shape', 'length'])?.value ??
        this.group().get(['shape', 'diameter'])?.value ??
        1,
    );
    const shape =
      type === 'box' ? { type, length, width: length * 0.6 } : { type, diameter: length };
    this.group().setControl('shape', toControl(shape));
  }

  protected toggleOverflow(wanted: boolean): void {
    if (!wanted) {
      this.group().removeControl('overflow');
      return;
    }
    const floor = Number(this.group().get('floorElevation')?.value ?? 0);
    const height = Number(this.group().get('height')?.value ?? 0.5);
    this.group().setControl(
      'overflow',
      toControl({ elevation: floor + height * 0.9, diameter: 0.04, to: 'out' }),
    );
  }
}
