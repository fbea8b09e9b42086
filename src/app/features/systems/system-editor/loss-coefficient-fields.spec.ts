import { SCENARIO_DEFAULTS } from '../../../../../shared/scenario';
import { EXAMPLE_TWO_BED_SCENARIO as EXAMPLE } from '../example-two-bed-scenario';
import { LossCoefficientFields } from './loss-coefficient-fields';
import { renderSection } from './render-section';

describe('LossCoefficientFields', () => {
  it('shows each usual value beside its empty field', async () => {
    const view = await renderSection(LossCoefficientFields);
    const elbow = [...view.root.querySelectorAll('mat-form-field')].find((field) =>
      field.textContent?.includes('90° elbow'),
    );
    expect(elbow?.querySelector('mat-hint')?.textContent?.trim()).toBe('Empty: 0.9');
    expect(elbow?.querySelector('input')?.value).toBe('');
    expect(view.state.scenario()?.lossCoefficients).toEqual(SCENARIO_DEFAULTS.lossCoefficients);
  });

  it('overrides one coefficient and keeps the usual values of the others', async () => {
    const view = await renderSection(LossCoefficientFields);
    await view.type('90° elbow', '1.2');
    expect(view.state.document()['lossCoefficients']).toEqual({ elbow90: 1.2 });
    expect(view.state.scenario()?.lossCoefficients).toEqual({
      ...SCENARIO_DEFAULTS.lossCoefficients,
      elbow90: 1.2,
    });
  });

  it('shows an override read from a scenario file in its field', async () => {
    const file = { ...structuredClone(EXAMPLE), lossCoefficients: { bellReturn: 2 } };
    const view = await renderSection(LossCoefficientFields, { file });
    const bell = [...view.root.querySelectorAll('mat-form-field')].find((field) =>
      field.textContent?.includes('Turn inside the bell'),
    );
    expect(bell?.querySelector('input')?.value).toBe('2');
    expect(view.state.scenario()?.lossCoefficients.bellReturn).toBe(2);
  });

  it("names the schema's problem under a negative coefficient", async () => {
    const view = await renderSection(LossCoefficientFields);
    await view.type('Pipe exit', '-1');
    expect(view.state.scenario()).toBeNull();
    expect(view.errorOf('Pipe exit')).toBe(view.state.issueAt('lossCoefficients.exit'));
    expect(view.errorOf('Pipe exit')).toMatch(/>=\s*0/);
  });

  it('goes back to the usual values', async () => {
    const view = await renderSection(LossCoefficientFields);
    await view.type('Tee (branch)', '2.5');
    await view.type('Ball valve, open', '0.2');
    await view.click('Use the usual values');
    expect(view.state.document()['lossCoefficients']).toEqual({});
    expect(view.state.scenario()?.lossCoefficients).toEqual(SCENARIO_DEFAULTS.lossCoefficients);
  });
});
