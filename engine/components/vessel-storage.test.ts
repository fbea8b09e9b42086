import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { BedVessel, TankVessel } from '../../shared/scenario/index';
import { makeStorage } from './vessel-storage';

const disc = (d: number): number => (Math.PI / 4) * d * d;
const tank = (shape: TankVessel['shape'], height = 1): TankVessel => ({
  kind: 'tank',
  id: 't',
  shape,
  floorElevation: 0,
  height,
  initialLevel: 0,
});

function bed(porosity: number, mediaDepth: number, guard?: number): BedVessel {
  return {
    kind: 'bed',
    id: 'b',
    shape: { type: 'box', length: 1, width: 0.6 },
    floorElevation: 0.8,
    height: 0.32,
    initialLevel: 0,
    media: { type: 'gravel', porosity, depth: mediaDepth },
    drain: {
      type: 'bell-siphon',
      to: 't',
      outletElevation: 0.6,
      dischargeLossMultiplier: 1,
      primingCoefficient: 0.7,
      ...(guard !== undefined && { guard: { diameter: guard } }),
      standpipe: {
        innerDiameter: 0.0266,
        outerDiameter: 0.0334,
        height: 0.25,
        weirCoefficient: 1.838,
        dischargeCoefficient: 0.61,
      },
      bell: { innerDiameter: 0.0779, outerDiameter: 0.0889, capGap: 0.025, intakeHeight: 0.025 },
      pipe: {
        length: 0.5,
        innerDiameter: 0.0266,
        material: 'pvc',
        roughness: 1.5e-6,
        hazenWilliamsC: 150,
        fittings: { elbow90: 0, elbow45: 0, teeRun: 0, teeBranch: 0, ballValve: 0 },
      },
    },
  };
}

describe('makeStorage', () => {
  it('gives V = A·h for a box and a cylinder', () => {
    const box = makeStorage(tank({ type: 'box', length: 1.2, width: 0.8 }, 0.7));
    expect(box.volumeAtLevelM3(0.55)).toBeCloseTo(0.528, 15);
    expect(box.maxVolumeM3).toBeCloseTo(0.672, 15);
    const cylinder = makeStorage(tank({ type: 'cylinder', diameter: 0.5 }));
    expect(cylinder.volumeAtLevelM3(1)).toBeCloseTo(disc(0.5), 15);
  });

  it('integrates a level-to-area table with linear area between points (a frustum-like tub)', () => {
    const tub = makeStorage(
      tank({
        type: 'table',
        points: [
          { level: 0, area: 1 },
          { level: 1, area: 2 },
        ],
      }),
    );
    expect(tub.volumeAtLevelM3(0.5)).toBeCloseTo(0.625, 15);
    expect(tub.volumeAtLevelM3(1)).toBeCloseTo(1.5, 15);
    expect(tub.areaAtLevelM2(0.25)).toBeCloseTo(1.25, 15);
    expect(tub.levelAtVolumeM(0.625)).toBeCloseTo(0.5, 15);
  });

  it('stores water only in the pores of the media, and all around the drain parts inside the bell and guard', () => {
    const storage = makeStorage(bed(0.4, 0.3, 0.1));
    const plan = 0.6;
    const guard = disc(0.1);
    const standpipeSolid = disc(0.0334);
    const bellWall = disc(0.0889) - disc(0.0779);
    expect(storage.areaAtLevelM2(0.1)).toBeCloseTo(
      0.4 * (plan - guard) + guard - standpipeSolid - bellWall,
      14,
    );
    expect(storage.areaAtLevelM2(0.26)).toBeCloseTo(0.4 * (plan - guard) + guard - bellWall, 14);
    expect(storage.areaAtLevelM2(0.29)).toBeCloseTo(0.4 * (plan - guard) + guard, 14);
    expect(storage.areaAtLevelM2(0.31)).toBeCloseTo(plan, 14);
  });

  it('holds exactly φ·A·h in a bed of media without drain parts, to first order', () => {
    const storage = makeStorage(bed(0.4, 0.3));
    const open = 0.4 * (0.6 - disc(0.0889)) + disc(0.0779) - disc(0.0334);
    expect(storage.volumeAtLevelM3(0.2)).toBeCloseTo(open * 0.2, 14);
  });

  it('inverts volume to level exactly and monotonically for random beds and tables', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.25, max: 0.6, noNaN: true }),
        fc.double({ min: 0, max: 0.32, noNaN: true }),
        fc.double({ min: -0.05, max: 0.4, noNaN: true }),
        fc.double({ min: 1e-6, max: 0.01, noNaN: true }),
        (porosity, depth, level, step) => {
          const storage = makeStorage(bed(porosity, depth, 0.12));
          const volume = storage.volumeAtLevelM3(level);
          expect(Math.abs(storage.levelAtVolumeM(volume) - level)).toBeLessThan(1e-12);
          expect(storage.volumeAtLevelM3(level + step)).toBeGreaterThan(volume);
        },
      ),
    );
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: 0.1, max: 3, noNaN: true }), { minLength: 2, maxLength: 6 }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (areas, fraction) => {
          const points = areas.map((area, i) => ({ level: i / (areas.length - 1), area }));
          const storage = makeStorage(tank({ type: 'table', points }));
          const volume = storage.volumeAtLevelM3(fraction);
          expect(Math.abs(storage.levelAtVolumeM(volume) - fraction)).toBeLessThan(1e-12);
        },
      ),
    );
  });

  it('extends linearly with the bottom area below the floor and the top area above the rim', () => {
    const storage = makeStorage(bed(0.4, 0.3));
    expect(storage.volumeAtLevelM3(-0.01)).toBeCloseTo(-0.01 * storage.areaAtLevelM2(0), 15);
    expect(storage.volumeAtLevelM3(0.33) - storage.maxVolumeM3).toBeCloseTo(0.01 * 0.6, 14);
    expect(storage.levelAtVolumeM(storage.maxVolumeM3 + 0.006)).toBeCloseTo(0.33, 14);
  });

  it('refuses drain parts that leave no room for water', () => {
    const crowded = { ...bed(0.4, 0.3), shape: { type: 'cylinder' as const, diameter: 0.085 } };
    expect(() => makeStorage(crowded)).toThrow(/no storage area/);
  });
});
