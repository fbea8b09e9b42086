import { MatFormFieldHarness } from '@angular/material/form-field/testing';
import { MatSelectHarness } from '@angular/material/select/testing';
import { withChanges } from '../../../../../shared/scenario/testing/with-changes';
import { EXAMPLE_TWO_BED_SCENARIO } from '../example-two-bed-scenario';
import { type RenderedSection, renderSection } from './render-section';
import { VesselFields } from './vessel-fields';

async function choosePlanShape(view: RenderedSection<VesselFields>, option: string) {
  const field = await view.loader.getHarness(
    MatFormFieldHarness.with({ floatingLabelText: 'Plan shape' }),
  );
  const select = await field.getControl(MatSelectHarness);
  if (!select) throw new Error('No plan shape picker.');
  await select.open();
  await select.clickOptions({ text: option });
  await view.fixture.whenStable();
}

/** The tank's plan shape in the normalised scenario, or null while the document is invalid. */
function tankShape(view: RenderedSection<VesselFields>) {
  return view.state.scenario()?.vessels[0]?.shape ?? null;
}

describe('the level-to-area table of a vessel', () => {
  it('starts from the box plan area at the floor and at the rim', async () => {
    const view = await renderSection(VesselFields, { keys: ['vessels', 0] });
    await choosePlanShape(view, 'Area by level (tapered or odd shapes)');
    const shape = tankShape(view);
    expect(shape?.type).toBe('table');
    const points = shape?.type === 'table' ? shape.points : [];
    expect(points.map((point) => point.level)).toEqual([0, 0.7]);
    // The example tank is 1.2 m × 0.8 m.
    for (const point of points) expect(point.area).toBeCloseTo(0.96, 12);
  });

  it('stores typed levels and areas in SI', async () => {
    const view = await renderSection(VesselFields, { keys: ['vessels', 0] });
    await choosePlanShape(view, 'Area by level (tapered or odd shapes)');
    await view.click('Add a level');
    await view.type('Level', '0.5', 1);
    await view.type('Plan area', '0.8', 1);
    await view.type('Level', '70 cm', 2);
    await view.type('Plan area', '2 ft^2', 2);
    expect(view.state.issues()).toEqual([]);
    const shape = tankShape(view);
    const points = shape?.type === 'table' ? shape.points : [];
    expect(points.map((point) => point.level)).toEqual([0, 0.5, 0.7]);
    expect(points[1]?.area).toBe(0.8);
    expect(points[2]?.area).toBeCloseTo(2 * 0.3048 ** 2, 12);
  });

  it('names the row whose level does not rise', async () => {
    const view = await renderSection(VesselFields, { keys: ['vessels', 0] });
    await choosePlanShape(view, 'Area by level (tapered or odd shapes)');
    await view.type('Level', '0', 1);
    expect(view.state.scenario()).toBeNull();
    expect(view.errorOf('Level', 1)).toBe('Table levels must increase from one point to the next.');
    expect(view.errorOf('Level', 0)).toBeNull();
  });

  it('names a first row above the floor', async () => {
    const view = await renderSection(VesselFields, { keys: ['vessels', 0] });
    await choosePlanShape(view, 'Area by level (tapered or odd shapes)');
    await view.type('Level', '0.1', 0);
    expect(view.errorOf('Level', 0)).toBe('A level-to-area table starts at level 0 (the floor).');
  });

  it('removes a row but keeps at least two', async () => {
    const file = withChanges(
      {
        'vessels[0].shape': {
          type: 'table',
          points: [
            { level: 0, area: '0.6 m^2' },
            { level: '0.3 m', area: '0.8 m^2' },
            { level: '0.7 m', area: '1 m^2' },
          ],
        },
      },
      EXAMPLE_TWO_BED_SCENARIO,
    );
    const view = await renderSection(VesselFields, { file, keys: ['vessels', 0] });
    await view.click('Remove', 1);
    const shape = tankShape(view);
    expect(shape?.type === 'table' ? shape.points : []).toEqual([
      { level: 0, area: 0.6 },
      { level: 0.7, area: 1 },
    ]);
    const removes = [...view.root.querySelectorAll<HTMLButtonElement>('button')].filter((b) =>
      b.textContent?.trim().endsWith('Remove'),
    );
    expect(removes.every((button) => button.disabled)).toBe(true);
  });

  it('goes back to a rectangle of the same floor area', async () => {
    const view = await renderSection(VesselFields, { keys: ['vessels', 0] });
    await choosePlanShape(view, 'Area by level (tapered or odd shapes)');
    await choosePlanShape(view, 'Rectangular');
    const shape = tankShape(view);
    expect(shape?.type === 'box' ? shape.length * shape.width : null).toBeCloseTo(0.96, 12);
  });
});
