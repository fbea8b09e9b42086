import { ChangeDetectionStrategy, Component } from '@angular/core';
import { ReactiveFormsModule } from '@angular/forms';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { QuantityInput } from '../../../ui/quantity-input/quantity-input';
import { EditorSection } from './editor-section';
import { newBellSiphonDrain, newStandpipeDrain } from './new-parts';
import { PipeFields } from './pipe-fields';
import { toControl } from './scenario-form';

/**
 * A bed's media and drain: the drain type (bell siphon or plain standpipe), where it drains to,
 * the standpipe, the bell and its intake, the drain pipe and its outlet elevation.
 */
@Component({
  selector: 'tw-bed-drain-fields',
  imports: [
    MatFormFieldModule,
    MatInputModule,
    MatSelectModule,
    PipeFields,
    QuantityInput,
    ReactiveFormsModule,
  ],
  templateUrl: './bed-drain-fields.html',
  styleUrl: './editor-fields.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BedDrainFields extends EditorSection {
  protected drainType(): string {
    return String(this.group().get(['drain', 'type'])?.value ?? 'bell-siphon');
  }

  protected changeDrainType(type: 'bell-siphon' | 'standpipe'): void {
    const drain = this.sub('drain');
    const to = String(drain.get('to')?.value ?? '');
    const outlet = Number(drain.get('outletElevation')?.value ?? 0);
    const fresh =
      type === 'bell-siphon' ? newBellSiphonDrain(to, outlet) : newStandpipeDrain(to, outlet);
    // Keep what both drain types share: the standpipe and the pipe as typed.
    const kept = {
      ...fresh,
      standpipe: drain.get('standpipe')?.getRawValue() ?? fresh.standpipe,
      pipe: drain.get('pipe')?.getRawValue() ?? fresh.pipe,
    };
    this.group().setControl('drain', toControl(kept));
  }
}
