import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { QuantityInput } from '../../../ui/quantity-input/quantity-input';
import { EditorSection } from './editor-section';
import { newOutlet } from './new-parts';
import { PipeFields } from './pipe-fields';
import { type CurvePoint, PumpCurveChart } from './pump-curve-chart';
import { toControl } from './scenario-form';

/**
 * One pump: where it sits, its curve as an editable table with its chart, power and check valve,
 * the main pipe up to the manifold and each outlet with its valve opening and pipe.
 */
@Component({
  selector: 'tw-pump-fields',
  imports: [
    MatButtonModule,
    MatCheckboxModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatSelectModule,
    PipeFields,
    PumpCurveChart,
    QuantityInput,
    ReactiveFormsModule,
  ],
  templateUrl: './pump-fields.html',
  styleUrl: './pump-fields.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PumpFields extends EditorSection {
  /** The pump's mean flow in the latest live run, m³/s, or null. */
  readonly dutyFlowM3PerS = input<number | null>(null);

  /** The curve points as the chart draws them; follows the document the form produces. */
  protected readonly curvePoints = computed<CurvePoint[]>(() => {
    this.state.document();
    const curve = this.group().get('curve')?.getRawValue() as unknown;
    if (!Array.isArray(curve)) return [];
    return curve.map((p: { flow?: unknown; head?: unknown }) => ({
      flow: Number(p.flow),
      head: Number(p.head),
    }));
  });

  protected hasCurveTable(): boolean {
    return this.group().contains('curve');
  }

  protected addCurvePoint(): void {
    const rows = this.list('curve');
    const last = rows.at(rows.length - 1)?.getRawValue() as
      { flow?: number; head?: number } | undefined;
    rows.push(toControl({ flow: (last?.flow ?? 0) + 1e-4, head: 0 }));
  }

  protected removeCurvePoint(index: number): void {
    this.list('curve').removeAt(index);
  }

  /** Replaces `maxHead`/`maxFlow` by five points of the same parabola, to edit as a table. */
  protected convertToTable(): void {
    const maxHead = Number(this.group().get('maxHead')?.value ?? 2);
    const maxFlow = Number(this.group().get('maxFlow')?.value ?? 5e-4);
    const points = [0, 0.25, 0.5, 0.75, 1].map((share) => ({
      flow: share * maxFlow,
      head: maxHead * (1 - share * share),
    }));
    this.group().removeControl('maxHead');
    this.group().removeControl('maxFlow');
    this.group().removeControl('curveKind');
    this.group().setControl('curve', toControl(points));
  }

  protected addOutlet(): void {
    const target = this.state.vesselIds().find((id) => id !== this.group().get('in')?.value) ?? '';
    this.list('outlets').push(toControl(newOutlet(target, 1.2)));
  }

  protected removeOutlet(index: number): void {
    this.list('outlets').removeAt(index);
  }
}
