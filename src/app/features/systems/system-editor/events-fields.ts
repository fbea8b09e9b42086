import { ChangeDetectionStrategy, Component } from '@angular/core';
import { ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatSelectModule } from '@angular/material/select';
import { QuantityInput } from '../../../ui/quantity-input/quantity-input';
import { EditorSection } from './editor-section';
import { newLeak, newPowerCut } from './new-parts';
import { toControl } from './scenario-form';

/** Marks a schedule entry that switches every pump's power rather than one pump. */
const ALL_PUMPS = '__power__';

/** What-if events of a run: leaks (from a vessel, from a time) and the pump schedule. */
@Component({
  selector: 'tw-events-fields',
  imports: [
    MatButtonModule,
    MatFormFieldModule,
    MatIconModule,
    MatSelectModule,
    QuantityInput,
    ReactiveFormsModule,
  ],
  templateUrl: './events-fields.html',
  styleUrl: './editor-fields.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class EventsFields extends EditorSection {
  protected readonly allPumps = ALL_PUMPS;

  protected addLeak(): void {
    this.list('leaks').push(toControl(newLeak(this.state.vesselIds()[0] ?? 'tank')));
  }

  protected removeLeak(index: number): void {
    this.list('leaks').removeAt(index);
  }

  protected addScheduleEntry(): void {
    this.list('schedule').push(toControl(newPowerCut()));
  }

  protected removeScheduleEntry(index: number): void {
    this.list('schedule').removeAt(index);
  }

  /** The pump an entry switches, or the all-pumps marker for a power entry. */
  protected switchedBy(index: number): string {
    const entry = this.sub('schedule', index);
    return entry.contains('power') ? ALL_PUMPS : String(entry.get('pump')?.value ?? '');
  }

  protected entryState(index: number): string {
    const entry = this.sub('schedule', index);
    return String(entry.get('power')?.value ?? entry.get('state')?.value ?? 'off');
  }

  /** Rewrites entry `index` as a power switch or a one-pump switch, keeping its time and state. */
  protected retarget(index: number, target: string, state: string): void {
    const at = this.sub('schedule', index).get('at')?.value ?? 0;
    const entry = target === ALL_PUMPS ? { at, power: state } : { at, pump: target, state };
    this.list('schedule').setControl(index, toControl(entry));
  }
}
