import { provideHttpClient } from '@angular/common/http';
import { provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { EXAMPLE_TWO_BED_SCENARIO } from '../example-two-bed-scenario';
import { EditorState } from './editor-state';
import { documentFromForm, editableScenario } from './scenario-form';

function setUp(mutate: (document: Record<string, unknown>) => void = () => undefined) {
  TestBed.configureTestingModule({
    providers: [EditorState, provideHttpClient(), provideHttpClientTesting()],
  });
  const state = TestBed.inject(EditorState);
  const document = documentFromForm(editableScenario(EXAMPLE_TWO_BED_SCENARIO));
  mutate(document);
  state.document.set(document);
  return state;
}

/** The first bed's standpipe group of a document built from the example. */
function standpipe(document: Record<string, unknown>): Record<string, unknown> {
  const vessels = document['vessels'] as Record<string, Record<string, Record<string, unknown>>>[];
  return vessels[1]!['drain']!['standpipe'] as Record<string, unknown>;
}

describe('EditorState', () => {
  it('has a normalised scenario and no issues for a valid document', () => {
    const state = setUp();
    expect(state.issues()).toEqual([]);
    expect(state.scenario()?.vessels.map((v) => v.id)).toEqual(['tank', 'bed-a', 'bed-b']);
    expect(state.vesselIds()).toEqual(['tank', 'bed-a', 'bed-b']);
    expect(state.bedIds()).toEqual(['bed-a', 'bed-b']);
    expect(state.pumpIds()).toEqual(['pump']);
  });

  it('names the field of a broken rule and still draws what was typed', () => {
    const state = setUp((document) => {
      standpipe(document)['height'] = 0.5;
    });
    expect(state.scenario()).toBeNull();
    expect(state.issueAt('vessels[1].drain.standpipe.height')).toMatch(/standpipe/i);
    const drawn = state.drawable()?.vessels[1];
    expect(drawn?.kind === 'bed' ? drawn.drain.standpipe.height : null).toBe(0.5);
  });

  it('reports a quantity of the wrong kind at its path', () => {
    const state = setUp((document) => {
      standpipe(document)['height'] = '3 h';
    });
    expect(state.issueAt('vessels[1].drain.standpipe.height')).toContain('Expected a length');
    expect(state.drawable()).toBeNull();
  });
});
