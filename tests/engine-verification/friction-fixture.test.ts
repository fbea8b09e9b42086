import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { SCENARIO_DEFAULTS, type StandpipeDrain } from '../../shared/scenario/index';
import { readFixture } from './read-fixture';
import {
  siphonFullBoreFlowM3PerS,
  colebrookFrictionFactor,
  darcyWeisbachHeadLossM,
} from './engine-parts';

// Reference values computed by Caleb Bell's `fluids` (Debian python3-fluids) with scipy, written by
// scripts/fixtures/generate-friction-fixture.py; the library versions are recorded in the fixture.
const FixtureSchema = z.object({
  versions: z.object({ fluids: z.string(), scipy: z.string() }),
  colebrook: z.array(
    z.object({ reynolds: z.number(), relativeRoughness: z.number(), f: z.number() }),
  ),
  laminar: z.array(z.object({ reynolds: z.number(), f: z.number() })),
  pipes: z.array(
    z.object({
      diameterM: z.number(),
      lengthM: z.number(),
      flowM3PerS: z.number(),
      roughnessM: z.number(),
      kinematicViscosityM2PerS: z.number(),
      reynolds: z.number(),
      headLossM: z.number(),
    }),
  ),
  drains: z.array(
    z.object({
      diameterM: z.number(),
      lengthM: z.number(),
      elbow90: z.number(),
      headM: z.number(),
      kinematicViscosityM2PerS: z.number(),
      roughnessM: z.number(),
      flowM3PerS: z.number(),
    }),
  ),
});

const fixture = readFixture('friction.json', FixtureSchema);
const relativeError = (value: number, reference: number): number => Math.abs(value / reference - 1);

/** A plain standpipe drain of one bore whose standpipe and pipe together are `lengthM` long. */
function straightDrain(
  diameterM: number,
  lengthM: number,
  elbow90: number,
  roughnessM: number,
): StandpipeDrain {
  const standpipeHeightM = Math.min(0.2, lengthM / 2);
  return {
    type: 'standpipe',
    to: 'sump',
    outletElevation: 0,
    dischargeLossMultiplier: 1,
    standpipe: {
      innerDiameter: diameterM,
      outerDiameter: diameterM * 1.2,
      height: standpipeHeightM,
      weirCoefficient: 1.838,
      dischargeCoefficient: 0.61,
    },
    pipe: {
      length: lengthM - standpipeHeightM,
      innerDiameter: diameterM,
      material: 'pvc',
      roughness: roughnessM,
      hazenWilliamsC: 150,
      fittings: { elbow90, elbow45: 0, teeRun: 0, teeBranch: 0, ballValve: 0 },
    },
  };
}

describe(`Darcy–Weisbach and Colebrook against fluids ${fixture.versions.fluids} (LIB)`, () => {
  it('records the library versions it was generated with', () => {
    expect(fixture.versions.fluids).toMatch(/^\d+\.\d+/);
    expect(fixture.colebrook.length).toBeGreaterThan(100);
  });

  it('matches fluids.Colebrook(tol=0) to 1e-10 over Re 4e3–1e8 and ε/D 0–0.05', () => {
    let worst = 0;
    for (const row of fixture.colebrook) {
      worst = Math.max(
        worst,
        relativeError(colebrookFrictionFactor(row.reynolds, row.relativeRoughness), row.f),
      );
    }
    expect(worst).toBeLessThan(1e-10);
  });

  it('gives the laminar 64/Re of fluids below Re 2000', () => {
    for (const row of fixture.laminar)
      expect(colebrookFrictionFactor(row.reynolds, 0.001)).toBeCloseTo(row.f, 14);
  });

  it('matches fluids.one_phase_dP head losses within 0.1 % for laminar and turbulent pipes', () => {
    expect(fixture.pipes.some((row) => row.reynolds < 2000)).toBe(true);
    for (const row of fixture.pipes) {
      const loss = darcyWeisbachHeadLossM(
        row.lengthM,
        row.diameterM,
        row.flowM3PerS,
        row.roughnessM,
        row.kinematicViscosityM2PerS,
      );
      expect(relativeError(loss, row.headLossM), JSON.stringify(row)).toBeLessThan(1e-3);
    }
  });

  it('matches full-bore drain flows (entrance 0.5, elbows 0.9, friction, exit 1) solved by scipy within 0.1 %', () => {
    expect(SCENARIO_DEFAULTS.lossCoefficients).toMatchObject({
      entrance: 0.5,
      elbow90: 0.9,
      exit: 1,
    });
    for (const row of fixture.drains) {
      const drain = straightDrain(row.diameterM, row.lengthM, row.elbow90, row.roughnessM);
      const flow = siphonFullBoreFlowM3PerS(
        drain,
        row.headM,
        'darcy-weisbach',
        row.kinematicViscosityM2PerS,
      );
      expect(relativeError(flow, row.flowM3PerS), JSON.stringify(row)).toBeLessThan(1e-3);
    }
  });
});
