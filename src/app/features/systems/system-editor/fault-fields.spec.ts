import { MatFormFieldHarness } from '@angular/material/form-field/testing';
import { MatSelectHarness } from '@angular/material/select/testing';
import { FaultFields } from './fault-fields';
import { type RenderedSection, renderSection } from './render-section';

async function chooseKind(view: RenderedSection<FaultFields>, option: string, index = 0) {
  const fields = await view.loader.getAllHarnesses(
    MatFormFieldHarness.with({ floatingLabelText: 'Fault' }),
  );
  const select = await fields[index]?.getControl(MatSelectHarness);
  if (!select) throw new Error(`No fault kind picker number ${index + 1}.`);
  await select.open();
  await select.clickOptions({ text: option });
  await view.fixture.whenStable();
}

describe('FaultFields', () => {
  it('adds a half-blocked drain on the first bed', async () => {
    const view = await renderSection(FaultFields);
    expect(view.root.querySelector('.note')?.textContent).toContain('No faults');
    await view.click('Add a fault');
    expect(view.state.scenario()?.faults).toEqual([
      { kind: 'drain-blocked', bed: 'bed-a', fraction: 0.5 },
    ]);
  });

  it('stores the share blocked as typed', async () => {
    const view = await renderSection(FaultFields);
    await view.click('Add a fault');
    await view.type('Share blocked', '0.25');
    expect(view.state.scenario()?.faults).toEqual([
      { kind: 'drain-blocked', bed: 'bed-a', fraction: 0.25 },
    ]);
  });

  it('turns a fault into a worn pump with its own fields', async () => {
    const view = await renderSection(FaultFields);
    await view.click('Add a fault');
    await chooseKind(view, 'Pump worn');
    await view.type("Share of the curve's flow", '0.7');
    expect(view.state.scenario()?.faults).toEqual([
      { kind: 'pump-worn', pump: 'pump', flowScale: 0.7 },
    ]);
    expect(view.root.textContent).not.toContain('Share blocked');
  });

  it("names the schema's problem under a drain blocked completely", async () => {
    const view = await renderSection(FaultFields);
    await view.click('Add a fault');
    await view.type('Share blocked', '1');
    expect(view.state.scenario()).toBeNull();
    const message = view.errorOf('Share blocked');
    expect(message).toBe(view.state.issueAt('faults[0].fraction'));
    expect(message).toMatch(/<\s*1/);
  });

  it('names a bed that no longer exists', async () => {
    const view = await renderSection(FaultFields);
    await view.click('Add a fault');
    view.form.get(['faults', 0, 'bed'])?.setValue('bed-z');
    await view.fixture.whenStable();
    expect(view.errorOf('Bed')).toBe('No bed has the id "bed-z"; use an existing bed id.');
  });

  it('removes a fault from the scenario', async () => {
    const view = await renderSection(FaultFields);
    await view.click('Add a fault');
    await view.click('Add a fault');
    await chooseKind(view, 'Pump worn', 1);
    await view.click('Remove', 0);
    expect(view.state.scenario()?.faults).toEqual([
      { kind: 'pump-worn', pump: 'pump', flowScale: 0.8 },
    ]);
    await view.click('Remove', 0);
    expect(view.state.scenario()?.faults).toEqual([]);
    expect(view.state.document()['faults']).toEqual([]);
  });
});
