import greenhouseFile from '../../../../scenarios/greenhouse-three-beds.json';
import { parseScenario } from '../../../../shared/scenario';
import { buildCrossSectionScene } from './cross-section-scene';
import { sceneFrame } from './scene-frame';

const parsed = parseScenario(greenhouseFile);
if (!parsed.success) throw new Error('The greenhouse example is invalid.');
const scene = buildCrossSectionScene(parsed.scenario);

describe('buildCrossSectionScene', () => {
  it('starts each drain at its standpipe top and names the flow channel it shows', () => {
    const drain = scene.pipes.find((p) => p.id === 'drain:bed-north');
    const bed = scene.beds.find((b) => b.id === 'bed-north');
    expect(drain?.channelId).toBe('flow:bed-north.drain');
    expect(drain?.points[0]).toEqual([bed?.centreXM, 0.55 + 0.25]);
    expect(drain?.points[1]).toEqual([bed?.centreXM, 0.55]);
    expect(drain?.points.at(-1)?.[1]).toBeCloseTo(-0.2, 12);
    expect(scene.pipes.filter((p) => p.kind === 'pump-line').map((p) => p.channelId)).toEqual([
      'flow:sump-pump.outlet[0]',
      'flow:sump-pump.outlet[1]',
      'flow:sump-pump.outlet[2]',
      'flow:sump-pump.outlet[3]',
    ]);
  });

  it('runs the tank overflow across into the sump and down to its rim', () => {
    const overflow = scene.pipes.find((p) => p.id === 'overflow:tank');
    const sump = scene.vessels.find((v) => v.id === 'sump');
    const last = overflow?.points.at(-1);
    expect(overflow?.points[0]?.[1]).toBeCloseTo(0.48, 12);
    expect(last?.[0]).toBeGreaterThan(sump?.xM ?? Infinity);
    expect(last?.[1]).toBeCloseTo(-0.75 + 0.7, 12);
  });

  it('keeps the bell top, break level and plan area of each bed', () => {
    const bed = scene.beds.find((b) => b.id === 'bed-middle');
    expect(bed?.bellTopM).toBeCloseTo(0.23 + 0.02, 12);
    expect(bed?.breakLevelM).toBeCloseTo(0.02, 12);
    expect(bed?.planAreaM2).toBeCloseTo(0.6, 12);
  });

  it('scales heights by the exaggeration and widths not, within the height limit', () => {
    const flat = sceneFrame(scene, 1);
    const tall = sceneFrame(scene, 4);
    expect(flat.pzPerM).toBe(flat.pxPerM);
    expect(tall.pzPerM / tall.pxPerM).toBeCloseTo(4, 12);
    expect(tall.height).toBeLessThanOrEqual(560 + 1e-9);
  });
});
