import { ControlFields } from './control-fields';
import { renderSection } from './render-section';

describe('ControlFields', () => {
  it('says there are no float switches in a scenario without any', async () => {
    const { root, state } = await renderSection(ControlFields);
    expect(root.querySelector('.note')?.textContent).toContain('No float switches');
    expect(state.scenario()?.controls).toEqual([]);
  });

  it('adds a float switch on the pump in its own tank and stores typed levels in metres', async () => {
    const view = await renderSection(ControlFields);
    await view.click('Add a float switch');
    await view.type('Stops below', '0.3');
    await view.type('Restarts above', '45 cm');
    expect(view.state.issues()).toEqual([]);
    expect(view.state.scenario()?.controls).toEqual([
      { kind: 'float-switch', pump: 'pump', vessel: 'tank', stopBelow: 0.3, restartAbove: 0.45 },
    ]);
  });

  it('starts a new switch as a cut-off 5 cm above the pump intake that restarts 5 cm higher', async () => {
    const view = await renderSection(ControlFields);
    await view.click('Add a float switch');
    // The example pump draws from the tank through an intake 0.30 m above its floor.
    expect(view.state.scenario()?.controls).toEqual([
      { kind: 'float-switch', pump: 'pump', vessel: 'tank', stopBelow: 0.35, restartAbove: 0.4 },
    ]);
  });

  it('reads a level typed in inches into metres', async () => {
    const view = await renderSection(ControlFields);
    await view.click('Add a float switch');
    await view.type('Stops below', '12 in');
    expect(view.state.scenario()?.controls[0]?.stopBelow).toBeCloseTo(0.3048, 12);
  });

  it('names the problem under the restart level when it is not above the stop level', async () => {
    const view = await renderSection(ControlFields);
    await view.click('Add a float switch');
    await view.type('Stops below', '0.4');
    await view.type('Restarts above', '0.35');
    expect(view.state.scenario()).toBeNull();
    expect(view.errorOf('Restarts above')).toBe(
      'The restart level must be above the stop level, so the switch cannot chatter.',
    );
    expect(view.errorOf('Stops below')).toBeNull();
  });

  it('names the problem when the restart level is above the vessel it floats in', async () => {
    const view = await renderSection(ControlFields);
    await view.click('Add a float switch');
    await view.type('Restarts above', '0.8');
    expect(view.errorOf('Restarts above')).toContain('below the height of "tank"');
  });

  it('removes a float switch from the scenario', async () => {
    const view = await renderSection(ControlFields);
    await view.click('Add a float switch');
    await view.click('Add a float switch');
    await view.type('Stops below', '0.2', 1);
    await view.click('Remove', 0);
    const controls = view.state.scenario()?.controls ?? [];
    expect(controls.map((control) => control.stopBelow)).toEqual([0.2]);
    expect(view.root.querySelectorAll('tw-quantity-input').length).toBe(2);
  });
});
