import { describe, expect, it } from 'vitest';
import type { BedVessel } from '../../shared/scenario/index';
import { timeToReach } from './integrate-until';
import {
  makeStorage,
  STANDARD_GRAVITY_M_PER_S2 as G,
  torricelliOutflowM3PerS,
} from './engine-parts';

const FT = 0.3048;

/** Draining time of a prismatic tank through an orifice (Torricelli + continuity, textbook):
 *  t = 2A/(C_d·a·√(2g))·(√h₁ − √h₂). */
function closedFormDrainS(
  areaM2: number,
  cd: number,
  orificeM2: number,
  h1: number,
  h2: number,
): number {
  return ((2 * areaM2) / (cd * orificeM2 * Math.sqrt(2 * G))) * (Math.sqrt(h1) - Math.sqrt(h2));
}

describe('Torricelli draining: closed form, ODE integration and published examples', () => {
  it('FE practice problem 435 (engineeringprep.com): 4 ft tank, 5 in² nozzle, 6 → 2 ft, no losses → 94 s within 1 %', () => {
    const area = (Math.PI / 4) * (4 * FT) ** 2;
    const nozzle = 5 * 0.0254 ** 2;
    const closed = closedFormDrainS(area, 1, nozzle, 6 * FT, 2 * FT);
    const integrated = timeToReach(
      (h) => -torricelliOutflowM3PerS(1, nozzle, h) / area,
      6 * FT,
      2 * FT,
    );
    expect(Math.abs(closed / 94 - 1)).toBeLessThan(0.01);
    expect(Math.abs(integrated / closed - 1)).toBeLessThan(1e-6);
  });

  it('library-computed (scipy solve_ivp): cylinder D 0.5 m, 25 mm orifice, C_d 0.61, 1 m → empty in 296.13 s', () => {
    const area = (Math.PI / 4) * 0.5 ** 2;
    const orifice = (Math.PI / 4) * 0.025 ** 2;
    const emptyS = (area / (0.61 * orifice)) * Math.sqrt((2 * 1) / G);
    expect(emptyS).toBeCloseTo(296.13, 1);
    // The integration stops 1 µm above the orifice, where √h is still smooth; the closed form to the
    // same level is 0.1 % short of empty.
    const integrated = timeToReach(
      (h) => -torricelliOutflowM3PerS(0.61, orifice, h) / area,
      1,
      1e-6,
    );
    expect(Math.abs(integrated / closedFormDrainS(area, 0.61, orifice, 1, 1e-6) - 1)).toBeLessThan(
      1e-6,
    );
    expect(Math.abs(integrated / emptyS - 1)).toBeLessThan(1.01e-3);
  });

  it('closed form and ODE agree within 0.1 % (in fact 1e-6) over a range of tanks and heads', () => {
    for (const [areaM2, diameterM, h1, h2] of [
      [0.96, 0.004, 0.55, 0.05],
      [0.2, 0.0266, 0.3, 0.02],
      [3, 0.05, 1.5, 0.5],
    ] as const) {
      const orifice = (Math.PI / 4) * diameterM * diameterM;
      const closed = closedFormDrainS(areaM2, 0.61, orifice, h1, h2);
      const integrated = timeToReach(
        (h) => -torricelliOutflowM3PerS(0.61, orifice, h) / areaM2,
        h1,
        h2,
      );
      expect(Math.abs(integrated / closed - 1)).toBeLessThan(1e-6);
    }
  });

  it('library-computed bed case: 1.0 × 0.5 m bed, porosity 0.40, 1 in Sch 40 orifice C_d 0.61, outlet 0.30 m below the floor, 0.25 → 0.03 m in 44.41 s', () => {
    const bed: BedVessel = {
      kind: 'bed',
      id: 'bed',
      shape: { type: 'box', length: 1, width: 0.5 },
      floorElevation: 0,
      height: 0.3,
      initialLevel: 0.25,
      media: { type: 'gravel', porosity: 0.4, depth: 0.3 },
      drain: {
        type: 'standpipe',
        to: 'sump',
        outletElevation: -0.3,
        dischargeLossMultiplier: 1,
        standpipe: {
          innerDiameter: 0.001,
          outerDiameter: 0.0011,
          height: 0.29,
          weirCoefficient: 1.838,
          dischargeCoefficient: 0.61,
        },
        pipe: {
          length: 0.3,
          innerDiameter: 0.0266,
          material: 'pvc',
          roughness: 1.5e-6,
          hazenWilliamsC: 150,
          fittings: { elbow90: 0, elbow45: 0, teeRun: 0, teeBranch: 0, ballValve: 0 },
        },
      },
    };
    const storage = makeStorage(bed);
    const orifice = (Math.PI / 4) * (1.049 * 0.0254) ** 2;
    const initialFlow = torricelliOutflowM3PerS(0.61, orifice, 0.25 + 0.3);
    expect(initialFlow * 60000).toBeCloseTo(67.0, 1);
    const volume = (v: number): number =>
      -torricelliOutflowM3PerS(0.61, orifice, storage.levelAtVolumeM(v) + 0.3);
    const seconds = timeToReach(
      volume,
      storage.volumeAtLevelM3(0.25),
      storage.volumeAtLevelM3(0.03),
    );
    expect(Math.abs(seconds / 44.41 - 1)).toBeLessThan(1e-3);
  });
});
