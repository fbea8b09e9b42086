import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import type { UnitSystem } from '../../../../shared/scenario';
import { UnitPreference } from './unit-preference';

/** The metric / US customary switch; the choice is saved on the reader's profile. */
@Component({
  selector: 'tw-unit-toggle',
  imports: [MatButtonToggleModule],
  template: `
    <mat-button-toggle-group
      hideSingleSelectionIndicator
      aria-label="Units"
      [value]="units.system()"
      [disabled]="saving()"
      (change)="choose($event.value)"
    >
      <mat-button-toggle value="metric">Metric</mat-button-toggle>
      <mat-button-toggle value="us">US customary</mat-button-toggle>
    </mat-button-toggle-group>
  `,
  styles: `
    :host {
      display: inline-block;
    }
    mat-button-toggle-group {
      --mat-button-toggle-height: 32px;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class UnitToggle {
  protected readonly units = inject(UnitPreference);
  protected readonly saving = signal(false);

  protected async choose(system: UnitSystem): Promise<void> {
    this.saving.set(true);
    try {
      await this.units.choose(system);
    } finally {
      this.saving.set(false);
    }
  }
}
