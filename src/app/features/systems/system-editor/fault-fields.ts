import { ChangeDetectionStrategy, Component } from '@angular/core';
import { ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { EditorSection } from './editor-section';
import { newBlockedDrain, newWornPump } from './new-parts';
import { toControl } from './scenario-form';

/** The kinds of fault a what-if run can carry. */
type FaultKind = 'drain-blocked' | 'pump-worn';

/** What-if faults: a bed's drain partly blocked, or a worn pump giving less than its curve. */
@Component({
  selector: 'tw-fault-fields',
  imports: [
    MatButtonModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatSelectModule,
    ReactiveFormsModule,
  ],
  templateUrl: './fault-fields.html',
  styleUrl: './editor-fields.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class FaultFields extends EditorSection {
  /** Adds a half-blocked drain on the first bed, or a worn first pump when there is no bed. */
  protected addFault(): void {
    this.list('faults').push(
      toControl(this.newFault(this.state.bedIds()[0] ? 'drain-blocked' : 'pump-worn')),
    );
  }

  protected removeFault(index: number): void {
    this.list('faults').removeAt(index);
  }

  protected kindOf(index: number): string {
    return String(this.sub('faults', index).get('kind')?.value ?? '');
  }

  /** Rewrites fault `index` as a fresh fault of `kind` (the fields of the two kinds differ). */
  protected changeKind(index: number, kind: FaultKind): void {
    this.list('faults').setControl(index, toControl(this.newFault(kind)));
  }

  private newFault(kind: FaultKind) {
    return kind === 'drain-blocked'
      ? newBlockedDrain(this.state.bedIds()[0] ?? '')
      : newWornPump(this.state.pumpIds()[0] ?? '');
  }
}
