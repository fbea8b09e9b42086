import { Directive, inject, input } from '@angular/core';
import { type AbstractControl, FormArray, FormGroup } from '@angular/forms';
import type { ErrorStateMatcher } from '@angular/material/core';
import { formatIssuePath } from '../../../../../shared/scenario';
import { EditorState } from './editor-state';
import { type DynamicArray, type DynamicGroup, childArray } from './scenario-form';

/**
 * What every editor section has: the form group it edits, the scenario path of that group
 * ("vessels[1]", "pumps[0].outlets[2]"), the editor's shared state and the schema's message for
 * one of its fields.
 */
@Directive()
export abstract class EditorSection {
  /** The group this section edits. */
  readonly group = input.required<DynamicGroup>();
  /** The group's path in the scenario, as issue paths write it. */
  readonly path = input.required<string>();
  protected readonly state = inject(EditorState);

  /** The schema's message for `field` (a path relative to this group), or null. */
  protected at(field: string): string | null {
    const base = this.path();
    return this.state.issueAt(base ? `${base}.${field}` : field);
  }

  /** The group at `keys` below this section's group, e.g. `sub('drain', 'pipe')`. */
  protected sub(...keys: (string | number)[]): DynamicGroup {
    const child = this.group().get(keys);
    if (!(child instanceof FormGroup))
      throw new Error(`The scenario form has no group at "${keys.join('.')}".`);
    return child as DynamicGroup;
  }

  protected list(key: string): DynamicArray {
    return childArray(this.group(), key);
  }
}

/** The scenario path of a control in the editor's form, e.g. "vessels[1].drain.standpipe.height". */
export function scenarioPathOf(control: AbstractControl): string {
  const keys: (string | number)[] = [];
  let current: AbstractControl = control;
  while (current.parent) {
    const parent: FormGroup | FormArray = current.parent;
    const key =
      parent instanceof FormArray
        ? parent.controls.indexOf(current)
        : Object.entries(parent.controls).find(([, child]) => child === current)?.[0];
    if (key === undefined) break;
    keys.unshift(key);
    current = parent;
  }
  return formatIssuePath(keys);
}

/** Shows Material fields in error whenever the shared schema has a message for their path. */
export function scenarioErrorStateMatcher(state: EditorState): ErrorStateMatcher {
  return {
    isErrorState: (control) => (control ? state.issueAt(scenarioPathOf(control)) !== null : false),
  };
}
