import { ChangeDetectionStrategy, Component } from '@angular/core';
import { ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { QuantityInput } from '../../../ui/quantity-input/quantity-input';
import { EditorSection } from './editor-section';
import { toControl } from './scenario-form';

/**
 * A vessel's plan shape as a table of level (above the floor) → plan area of the water surface,
 * for tapered tubs and odd shapes; the area changes in a straight line between two points.
 */
@Component({
  selector: 'tw-shape-table-fields',
  imports: [MatButtonModule, MatIconModule, QuantityInput, ReactiveFormsModule],
  template: `
    <fieldset [formGroup]="group()">
      <legend>Plan area by level</legend>
      <p class="note">
        One row per level, from the floor (level 0) up; between two rows the area changes in a
        straight line, and above the last row it stays the same.
      </p>
      <div formArrayName="points">
        @for (point of list('points').controls; track point; let i = $index) {
          <div class="row" [formGroupName]="i">
            <tw-quantity-input
              formControlName="level"
              label="Level"
              dimension="length"
              [system]="state.units()"
              [error]="at('points[' + i + '].level')"
              hint="Above the floor"
            />
            <tw-quantity-input
              formControlName="area"
              label="Plan area"
              dimension="area"
              [system]="state.units()"
              [error]="at('points[' + i + '].area')"
            />
            <button
              mat-button
              type="button"
              (click)="removePoint(i)"
              [disabled]="state.readOnly() || list('points').length <= 2"
            >
              <mat-icon>delete</mat-icon>Remove
            </button>
          </div>
        }
      </div>
      @if (at('points'); as message) {
        <p class="error" role="alert">{{ message }}</p>
      }
      <button mat-button type="button" (click)="addPoint()" [disabled]="state.readOnly()">
        <mat-icon>add</mat-icon>Add a level
      </button>
    </fieldset>
  `,
  styleUrl: './editor-fields.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ShapeTableFields extends EditorSection {
  /** Adds a row 10 cm above the last one, with the last row's area. */
  protected addPoint(): void {
    const rows = this.list('points');
    const last = rows.at(rows.length - 1)?.getRawValue() as
      { level?: number; area?: number } | undefined;
    rows.push(toControl({ level: (last?.level ?? 0) + 0.1, area: last?.area ?? 1 }));
  }

  protected removePoint(index: number): void {
    this.list('points').removeAt(index);
  }
}
