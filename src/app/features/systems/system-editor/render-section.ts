import { provideHttpClient } from '@angular/common/http';
import { provideHttpClientTesting } from '@angular/common/http/testing';
import type { HarnessLoader } from '@angular/cdk/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { type Type, inject } from '@angular/core';
import { type ComponentFixture, TestBed } from '@angular/core/testing';
import { ErrorStateMatcher } from '@angular/material/core';
import { formatIssuePath } from '../../../../../shared/scenario';
import { EXAMPLE_TWO_BED_SCENARIO } from '../example-two-bed-scenario';
import { type EditorSection, scenarioErrorStateMatcher } from './editor-section';
import { EditorState } from './editor-state';
import { type DynamicGroup, documentFromForm, editableScenario, toControl } from './scenario-form';

/** One editor section rendered for a spec, with the form and state it edits. */
export interface RenderedSection<T> {
  fixture: ComponentFixture<T>;
  root: HTMLElement;
  form: DynamicGroup;
  state: EditorState;
  loader: HarnessLoader;
  /** Types `text` into the `index`-th field labelled `label`, as a person does, and settles. */
  type(label: string, text: string, index?: number): Promise<void>;
  /** The message under the `index`-th field labelled `label`, or null. */
  errorOf(label: string, index?: number): string | null;
  /** Clicks the `index`-th button whose text ends with `text`, and settles. */
  click(text: string, index?: number): Promise<void>;
}

/**
 * For specs: renders `section` over the form of a scenario file (the two-bed example unless
 * `file` is given), editing the group at `keys` (the whole scenario by default). The document
 * follows every edit at once, as the editor's does after its debounce.
 */
export async function renderSection<T extends EditorSection>(
  section: Type<T>,
  options: { file?: unknown; keys?: (string | number)[] } = {},
): Promise<RenderedSection<T>> {
  TestBed.configureTestingModule({
    providers: [
      EditorState,
      provideHttpClient(),
      provideHttpClientTesting(),
      {
        provide: ErrorStateMatcher,
        useFactory: () => scenarioErrorStateMatcher(inject(EditorState)),
      },
    ],
  });
  const state = TestBed.inject(EditorState);
  const form = toControl(
    editableScenario(options.file ?? EXAMPLE_TWO_BED_SCENARIO),
  ) as DynamicGroup;
  const commit = () => state.document.set(documentFromForm(form.getRawValue()));
  commit();
  form.valueChanges.subscribe(commit);
  const keys = options.keys ?? [];
  const fixture = TestBed.createComponent(section);
  fixture.componentRef.setInput('group', keys.length === 0 ? form : form.get(keys));
  fixture.componentRef.setInput('path', formatIssuePath(keys));
  await fixture.whenStable();
  const root = fixture.nativeElement as HTMLElement;
  const field = (label: string, index: number) => {
    const found = [...root.querySelectorAll('mat-form-field')].filter(
      (candidate) => candidate.querySelector('mat-label')?.textContent?.trim() === label,
    )[index];
    if (!found) throw new Error(`No field labelled "${label}" (number ${index + 1}).`);
    return found;
  };
  return {
    fixture,
    root,
    form,
    state,
    loader: TestbedHarnessEnvironment.loader(fixture),
    async type(label, text, index = 0) {
      const input = field(label, index).querySelector('input');
      if (!input) throw new Error(`The field "${label}" has no input.`);
      input.value = text;
      input.dispatchEvent(new Event('input'));
      input.dispatchEvent(new Event('blur'));
      await fixture.whenStable();
    },
    errorOf(label, index = 0) {
      return field(label, index).querySelector('mat-error')?.textContent?.trim() ?? null;
    },
    async click(text, index = 0) {
      const button = [...root.querySelectorAll<HTMLButtonElement>('button')].filter((candidate) =>
        candidate.textContent?.trim().endsWith(text),
      )[index];
      if (!button) throw new Error(`No button "${text}" (number ${index + 1}).`);
      button.click();
      await fixture.whenStable();
    },
  };
}
