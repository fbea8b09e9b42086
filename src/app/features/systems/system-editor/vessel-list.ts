import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import type { AbstractControl } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatExpansionModule } from '@angular/material/expansion';
import { MatIconModule } from '@angular/material/icon';
import { BedDrainFields } from './bed-drain-fields';
import { EditorSection } from './editor-section';
import { freshId, newBed, newTank } from './new-parts';
import { type DynamicGroup, toControl } from './scenario-form';
import { VesselFields } from './vessel-fields';

/** The scenario's vessels of one sort (tanks and sumps, or beds), each in a panel, with add and remove. */
@Component({
  selector: 'tw-vessel-list',
  imports: [BedDrainFields, MatButtonModule, MatExpansionModule, MatIconModule, VesselFields],
  template: `
    <mat-accordion multi>
      @for (entry of entries(); track entry.control; let first = $first) {
        <mat-expansion-panel [expanded]="first">
          <mat-expansion-panel-header>
            <mat-panel-title>{{ entry.id || '(no id)' }}</mat-panel-title>
            <mat-panel-description>{{ entry.kind }}</mat-panel-description>
          </mat-expansion-panel-header>
          <tw-vessel-fields [group]="entry.control" [path]="'vessels[' + entry.index + ']'" />
          @if (beds()) {
            <tw-bed-drain-fields [group]="entry.control" [path]="'vessels[' + entry.index + ']'" />
          }
          @if (!state.readOnly()) {
            <button mat-button type="button" class="remove" (click)="remove(entry.index)">
              <mat-icon>delete</mat-icon>Remove {{ entry.id }}
            </button>
          }
        </mat-expansion-panel>
      }
    </mat-accordion>
    @if (!state.readOnly()) {
      <button mat-stroked-button type="button" class="add" (click)="add()">
        <mat-icon>add</mat-icon>{{ beds() ? 'Add a bed' : 'Add a tank or sump' }}
      </button>
    }
  `,
  styles: `
    :host {
      display: block;
    }
    .add {
      margin-top: 0.75rem;
    }
    .remove {
      margin-top: 0.25rem;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class VesselList extends EditorSection {
  /** True to list beds, false for tanks and sumps. */
  readonly beds = input(false);

  /** The vessels this list shows, with their index in the scenario's vessel list. */
  protected readonly entries = computed(() => {
    this.state.document();
    return this.list('vessels')
      .controls.map((control: AbstractControl, index: number) => ({
        control: control as DynamicGroup,
        index,
        id: String(control.get('id')?.value ?? ''),
        kind: String(control.get('kind')?.value ?? ''),
      }))
      .filter((entry) => (entry.kind === 'bed') === this.beds());
  });

  protected add(): void {
    const ids = this.state.vesselIds();
    if (this.beds()) {
      const target = ids.find((id) => !id.startsWith('bed')) ?? ids[0] ?? 'tank';
      this.list('vessels').push(toControl(newBed(freshId('bed', ids), target)));
    } else {
      this.list('vessels').push(toControl(newTank(freshId('sump', ids), 'sump')));
    }
  }

  protected remove(index: number): void {
    this.list('vessels').removeAt(index);
  }
}
