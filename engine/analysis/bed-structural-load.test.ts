import { describe, expect, it } from 'vitest';
import { parseScenario, type BedVessel } from '../../shared/scenario/index';
import { withChanges } from '../../shared/scenario/testing/with-changes';
import { waterDensityKgPerM3 } from '../hydraulics/water-properties';
import { bedStructuralLoad, MEDIA_DENSITIES } from './bed-structural-load';

function exampleBed(changes: Record<string, unknown> = {}): BedVessel {
  const parsed = parseScenario(withChanges(changes));
  if (!parsed.success) throw new Error(JSON.stringify(parsed.issues));
  const bed = parsed.scenario.vessels[1];
  if (bed?.kind !== 'bed') throw new Error('expected the example bed');
  return bed;
}

describe('bedStructuralLoad', () => {
  it('adds wet media and the water of a brim-full bed: a 1.0 × 0.6 m gravel bed, 0.30 m of media, 0.32 m rim', () => {
    const bed = exampleBed();
    const load = bedStructuralLoad(bed, 20);
    const rho = waterDensityKgPerM3(20);
    const guardM2 =
      (Math.PI / 4) * (bed.drain.type === 'bell-siphon' ? bed.drain.bell.outerDiameter : 0) ** 2;
    const media = (0.6 - guardM2) * 0.3;
    expect(load.footprintM2).toBeCloseTo(0.6, 12);
    expect(load.mediaVolumeM3).toBeCloseTo(media, 12);
    expect(load.wetMediaKg).toBeCloseTo(1600 * media * 1.01, 9);
    // Layer by layer: media pores (0.40) outside the bell, open water inside it round the solid
    // standpipe (to 0.25 m), inside the bell above it (to the cap at 0.275 m), open water above the media.
    const disc = (d: number): number => (Math.PI / 4) * d * d;
    const [bell, pipe] = [disc(0.0779), disc(0.0334)];
    const water =
      (0.4 * (0.6 - bell) + bell - pipe) * 0.25 +
      (0.4 * (0.6 - bell) + bell) * 0.025 +
      0.4 * 0.6 * 0.025 +
      0.6 * 0.02;
    expect(load.waterAtRimKg).toBeCloseTo(rho * water, 9);
    expect(load.loadAtRimN).toBeCloseTo(load.totalAtRimKg * 9.80665, 9);
    expect(load.pressureAtRimPa).toBeCloseTo(load.loadAtRimN / 0.6, 9);
    expect(load.totalAtFloodKg).toBeLessThan(load.totalAtRimKg);
  });

  it('weighs an expanded-clay bed at about a third of a gravel one, and a bed without media as water alone', () => {
    const gravel = bedStructuralLoad(exampleBed(), 20);
    const clay = bedStructuralLoad(
      exampleBed({ 'vessels[1].media': { type: 'expanded-clay', depth: '0.30 m' } }),
      20,
    );
    const none = bedStructuralLoad(
      exampleBed({ 'vessels[1].media': { type: 'none', depth: '0 m' } }),
      20,
    );
    expect(clay.wetMediaKg / gravel.wetMediaKg).toBeCloseTo((400 * 1.25) / (1600 * 1.01), 9);
    expect(none.wetMediaKg).toBe(0);
    expect(none.totalAtRimKg).toBe(none.waterAtRimKg);
    expect(MEDIA_DENSITIES.gravel.source).toMatch(/no source/);
  });
});
