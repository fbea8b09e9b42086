import { parseScenario } from '../../../../../shared/scenario';
import { EXAMPLE_TWO_BED_SCENARIO } from '../example-two-bed-scenario';
import { documentFromForm, editableScenario, toControl } from './scenario-form';
import type { DynamicGroup } from './scenario-form';

describe('the scenario form', () => {
  it('reads every quantity into SI so fields can show it in any unit', () => {
    const editable = editableScenario(EXAMPLE_TWO_BED_SCENARIO);
    const form = toControl(editable) as DynamicGroup;
    expect(form.get(['vessels', 1, 'drain', 'standpipe', 'outerDiameter'])?.value).toBeCloseTo(
      0.0334,
      12,
    );
    expect(form.get(['pumps', 0, 'curve', 1, 'flow'])?.value).toBeCloseTo(1200 / 3.6e6, 15);
    expect(form.get(['water', 'temperature'])?.value).toBe(24);
  });

  it('offers the optional fields it shows as empty controls', () => {
    const form = toControl(editableScenario(EXAMPLE_TWO_BED_SCENARIO)) as DynamicGroup;
    expect(form.get(['vessels', 1, 'drain', 'bell', 'slotCount'])?.value).toBeNull();
    expect(form.get(['vessels', 2, 'media', 'porosity'])?.value).toBeNull();
    expect(form.get(['pumps', 0, 'outlets', 0, 'pipe', 'fittings', 'teeRun'])?.value).toBe(0);
  });

  it('offers empty loss-coefficient overrides and empty lists of float switches and faults', () => {
    const form = toControl(editableScenario(EXAMPLE_TWO_BED_SCENARIO)) as DynamicGroup;
    expect(form.get(['lossCoefficients', 'elbow90'])?.value).toBeNull();
    expect(form.get(['lossCoefficients', 'bellReturn'])?.value).toBeNull();
    expect(form.get('controls')?.value).toEqual([]);
    expect(form.get('faults')?.value).toEqual([]);
    expect(documentFromForm(form.getRawValue())['lossCoefficients']).toEqual({});
  });

  it('gives back a document the shared schema accepts, leaving empty fields to their defaults', () => {
    const form = toControl(editableScenario(EXAMPLE_TWO_BED_SCENARIO)) as DynamicGroup;
    const document = documentFromForm(form.getRawValue());
    const parsed = parseScenario(document);
    expect(parsed.success).toBe(true);
    if (!parsed.success) return;
    const bed = parsed.scenario.vessels[2];
    // bed-b's porosity was left out, so the schema's expanded-clay default applies.
    expect(bed?.kind === 'bed' ? bed.media.porosity : null).toBe(0.42);
    expect(JSON.stringify(document)).not.toContain('null');
  });

  it('keeps a document the schema refuses as it is, so the form can fix it', () => {
    const broken = {
      ...EXAMPLE_TWO_BED_SCENARIO,
      vessels: [{ id: 'tank', kind: 'tank', height: '2 h' }],
    };
    const form = toControl(editableScenario(broken)) as DynamicGroup;
    expect(form.get(['vessels', 0, 'height'])?.value).toBe('2 h');
  });
});
