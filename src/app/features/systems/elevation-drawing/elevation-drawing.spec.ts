import { TestBed } from '@angular/core/testing';
import { type Scenario, parseScenario } from '../../../../../shared/scenario';
import { EXAMPLE_TWO_BED_SCENARIO } from '../example-two-bed-scenario';
import { ElevationDrawing } from './elevation-drawing';
import { ELEVATION_MARGIN } from './draw-elevation';
import { layoutElevation, sideWidthM } from './elevation-layout';

function exampleScenario(): Scenario {
  const parsed = parseScenario(EXAMPLE_TWO_BED_SCENARIO);
  if (!parsed.success)
    throw new Error(`The example scenario is invalid: ${JSON.stringify(parsed.issues)}`);
  return parsed.scenario;
}

async function render(scenario: Scenario | null, system: 'metric' | 'us' = 'metric') {
  const fixture = TestBed.createComponent(ElevationDrawing);
  fixture.componentRef.setInput('scenario', scenario);
  fixture.componentRef.setInput('system', system);
  await fixture.whenStable();
  return { fixture, root: fixture.nativeElement as HTMLElement };
}

function rect(
  root: HTMLElement,
  selector: string,
): { x: number; y: number; width: number; height: number } {
  const element = root.querySelector(selector);
  if (!element) throw new Error(`Nothing drawn for ${selector}.`);
  const read = (name: string) => Number(element.getAttribute(name));
  return { x: read('x'), y: read('y'), width: read('width'), height: read('height') };
}

describe('ElevationDrawing', () => {
  it('draws a standpipe of height h as h at the drawing scale, standing on the bed floor', async () => {
    const { fixture, root } = await render(exampleScenario());
    const k = fixture.componentInstance.pxPerM();
    expect(k).toBeGreaterThan(0);
    const standpipe = rect(root, 'rect.standpipe[data-id="bed-a"]');
    expect(standpipe.height).toBeCloseTo(0.25 * k, 9);
    expect(standpipe.width).toBeCloseTo(0.0334 * k, 9);
    const bed = rect(root, 'rect.media[data-id="bed-a"]');
    // The media and the standpipe both start at the bed floor.
    expect(standpipe.y + standpipe.height).toBeCloseTo(bed.y + bed.height, 9);
  });

  it('redraws the standpipe when its height changes', async () => {
    const scenario = exampleScenario();
    const { fixture, root } = await render(scenario);
    const taller = structuredClone(scenario);
    const bed = taller.vessels[1];
    if (bed?.kind !== 'bed') throw new Error('The example lost its first bed.');
    bed.drain.standpipe.height = 0.28;
    fixture.componentRef.setInput('scenario', taller);
    await fixture.whenStable();
    const k = fixture.componentInstance.pxPerM();
    expect(rect(root, 'rect.standpipe[data-id="bed-a"]').height).toBeCloseTo(0.28 * k, 9);
  });

  it('puts the tank floor on the datum and the bed floor 0.8 m above it', async () => {
    const { fixture, root } = await render(exampleScenario());
    const k = fixture.componentInstance.pxPerM();
    const tankWater = rect(root, 'rect.water[data-id="tank"]');
    const bedMedia = rect(root, 'rect.media[data-id="bed-a"]');
    expect(tankWater.height).toBeCloseTo(0.55 * k, 9);
    expect(tankWater.y + tankWater.height - (bedMedia.y + bedMedia.height)).toBeCloseTo(0.8 * k, 9);
  });

  it('draws one pipe per drain and per pump outlet, and names every vessel', async () => {
    const { root } = await render(exampleScenario());
    expect(root.querySelectorAll('path.drain').length).toBe(2);
    expect(root.querySelectorAll('path.pump-line').length).toBe(2);
    const names = [...root.querySelectorAll('text.name')].map((t) => t.textContent);
    expect(names).toEqual(['tank', 'bed-a', 'bed-b']);
  });

  it('labels the elevation axis in inches for US customary readers', async () => {
    const { root } = await render(exampleScenario(), 'us');
    expect(root.textContent).toContain('elevation (in)');
  });

  it('lays vessels side by side without overlap, each as wide as its plan length', () => {
    const layout = layoutElevation(exampleScenario());
    const vessels = layout.boxes.filter((b) => b.kind === 'vessel');
    expect(vessels.map((v) => v.width)).toEqual([1.2, 1.0, 0.8]);
    for (let i = 1; i < vessels.length; i++) {
      const previous = vessels[i - 1]!;
      expect(vessels[i]!.x).toBeGreaterThan(previous.x + previous.width);
    }
    expect(sideWidthM({ type: 'cylinder', diameter: 0.9 })).toBe(0.9);
  });

  it('draws nothing but keeps its margins when there is no valid scenario', async () => {
    const { root } = await render(null);
    expect(root.querySelector('svg')?.childElementCount).toBe(0);
    expect(ELEVATION_MARGIN.left).toBeGreaterThan(0);
  });
});
