import { ChangeDetectionStrategy, Component, computed } from '@angular/core';
import { ReactiveFormsModule } from '@angular/forms';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { QuantityInput } from '../../../ui/quantity-input/quantity-input';
import { EditorSection } from './editor-section';
import { newAreaTable } from './new-parts';
import { toControl } from './scenario-form';
import { ShapeTableFields } from './shape-table-fields';

/**
 * The fields every vessel has: id, plan shape (box, cylinder or level-to-area table), floor
 * elevation, height,
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
    ShapeTableFields,
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

  /** Replaces the plan shape by one of `type` with about the same floor area. */
  protected changeShape(type: 'box' | 'cylinder' | 'table'): void {
    const areaM2 = this.floorAreaM2();
    const shape =
      type === 'table'
        ? newAreaTable(areaM2, Number(this.group().get('height')?.value ?? 0.5))
        : type === 'box'
          ? { type, length: Math.sqrt(areaM2 / 0.6), width: Math.sqrt(areaM2 * 0.6) }
          : { type, diameter: Math.sqrt((4 * areaM2) / Math.PI) };
    this.group().setControl('shape', toControl(shape));
  }

  /** The plan area at the floor of the shape as typed, m² (1 m² when it cannot be read). */
  private floorAreaM2(): number {
    const shape = this.sub('shape').getRawValue() as Record<string, unknown>;
    const number = (key: string) => (typeof shape[key] === 'number' ? shape[key] : NaN);
    const firstRow: unknown = Array.isArray(shape['points']) ? shape['points'][0] : undefined;
    const area =
      shape['type'] === 'box'
        ? number('length') * number('width')
        : shape['type'] === 'cylinder'
          ? (Math.PI * number('diameter') ** 2) / 4
          : Number((firstRow as { area?: unknown } | undefined)?.area);
    return Number.isFinite(area) && area > 0 ? area : 1;
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
