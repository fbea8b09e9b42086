import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import type { AbstractControl } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { EditorSection } from './editor-section';
import { freshId, newPump } from './new-parts';
import { PumpFields } from './pump-fields';
import { type DynamicGroup, toControl } from './scenario-form';

/** The scenario's pumps, each with its fields and its duty flow from the latest run, with add. */
@Component({
  selector: 'tw-pump-list',
  imports: [MatButtonModule, MatIconModule, PumpFields],
  template: `
    @for (entry of entries(); track entry.control) {
      <h3 class="part-title">{{ entry.id }}</h3>
      <tw-pump-fields
        [group]="entry.control"
        [path]="'pumps[' + entry.index + ']'"
        [dutyFlowM3PerS]="dutyFlows().get(entry.id) ?? null"
      />
    }
    @if (!state.readOnly()) {
      <button mat-stroked-button type="button" (click)="add()">
        <mat-icon>add</mat-icon>Add a pump
      </button>
    }
  `,
  styles: `
    :host {
      display: block;
    }
    .part-title {
      margin: 1rem 0 0.5rem;
      font: var(--mat-sys-title-medium);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PumpList extends EditorSection {
  /** Each pump's mean flow in the latest run by pump id, m³/s. */
  readonly dutyFlows = input<ReadonlyMap<string, number>>(new Map());

  /** The pump groups with their index and id, re-read whenever the document changes. */
  protected readonly entries = computed(() => {
    this.state.document();
    return this.list('pumps').controls.map((control: AbstractControl, index: number) => ({
      control: control as DynamicGroup,
      index,
      id: String(control.get('id')?.value ?? ''),
    }));
  });

  /** Adds a pump in the first tank or sump, feeding the first other vessel. */
  protected add(): void {
    const vessels = this.state.vesselIds();
    const source = vessels.find((id) => !id.startsWith('bed')) ?? vessels[0] ?? 'tank';
    const target = vessels.find((id) => id !== source) ?? source;
    this.list('pumps').push(
      toControl(newPump(freshId('pump', this.state.pumpIds()), source, target)),
    );
  }
}
