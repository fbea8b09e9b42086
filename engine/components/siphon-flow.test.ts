import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  SCENARIO_DEFAULTS,
  type BellSiphonDrain,
  type StandpipeDrain,
} from '../../shared/scenario/index';
import { primingFlowM3PerS, siphonFullBoreFlowM3PerS } from './siphon-flow';

const NU = 1.0034e-6;
const G = 9.80665;
const BORE = 0.0266;
const boreArea = (Math.PI / 4) * BORE * BORE;
const noFittings = { elbow90: 0, elbow45: 0, teeRun: 0, teeBranch: 0, ballValve: 0 };

function plainDrain(standpipeHeightM: number, pipeLengthM: number): StandpipeDrain {
  return {
    type: 'standpipe',
    to: 'sump',
    outletElevation: 0,
    dischargeLossMultiplier: 1,
    standpipe: {
      innerDiameter: BORE,
      outerDiameter: 0.0334,
      height: standpipeHeightM,
      weirCoefficient: 1.838,
      dischargeCoefficient: 0.61,
    },
    pipe: {
      length: pipeLengthM,
      innerDiameter: BORE,
      material: 'pvc',
      roughness: 1.5e-6,
      hazenWilliamsC: 150,
      fittings: { ...noFittings, elbow90: 2 },
    },
  };
}

function bellDrain(
  overrides: Partial<BellSiphonDrain['bell']> = {},
  multiplier = 1,
): BellSiphonDrain {
  const base = plainDrain(0.25, 0.7);
  return {
    ...base,
    type: 'bell-siphon',
    primingCoefficient: 0.7,
    dischargeLossMultiplier: multiplier,
    bell: {
      innerDiameter: 0.0779,
      outerDiameter: 0.0889,
      capGap: 0.025,
      intakeHeight: 0.025,
      ...overrides,
    },
  };
}

describe('siphonFullBoreFlowM3PerS', () => {
  it('tends to A·√(2gH/(1 + K_entrance)) when the drain has no length and no fittings (energy balance limit)', () => {
    const stub = {
      ...plainDrain(1e-9, 1e-9),
      pipe: { ...plainDrain(1e-9, 1e-9).pipe, fittings: noFittings },
    };
    const flow = siphonFullBoreFlowM3PerS(stub, 0.4, 'darcy-weisbach', NU);
    expect(flow / (boreArea * Math.sqrt((2 * G * 0.4) / 1.5))).toBeCloseTo(1, 6);
  });

  it('gives 82 L/min for a 1 in, 0.6 m drain with a sharp entry under 0.6 m, as the library-computed full-bore example', () => {
    const drain = {
      ...plainDrain(0.2, 0.4),
      pipe: { ...plainDrain(0.2, 0.4).pipe, innerDiameter: 1.049 * 0.0254, fittings: noFittings },
    };
    const wide = { ...drain, standpipe: { ...drain.standpipe, innerDiameter: 1.049 * 0.0254 } };
    expect((siphonFullBoreFlowM3PerS(wide, 0.6, 'darcy-weisbach', NU) * 60000) / 82.2).toBeCloseTo(
      1,
      2,
    );
  });

  it('is zero without a head drop and grows with it', () => {
    const drain = bellDrain();
    expect(siphonFullBoreFlowM3PerS(drain, 0, 'darcy-weisbach', NU)).toBe(0);
    expect(siphonFullBoreFlowM3PerS(drain, -0.1, 'darcy-weisbach', NU)).toBe(0);
    fc.assert(
      fc.property(
        fc.double({ min: 1e-4, max: 2, noNaN: true }),
        fc.double({ min: 1e-3, max: 1, noNaN: true }),
        (head, more) => {
          expect(
            siphonFullBoreFlowM3PerS(drain, head * (1 + more), 'darcy-weisbach', NU),
          ).toBeGreaterThan(siphonFullBoreFlowM3PerS(drain, head, 'darcy-weisbach', NU));
        },
      ),
    );
  });

  it('loses more through a bell than through a bare standpipe, and more again through narrow slots', () => {
    const bare = siphonFullBoreFlowM3PerS(plainDrain(0.25, 0.7), 0.3, 'darcy-weisbach', NU);
    const bell = siphonFullBoreFlowM3PerS(bellDrain(), 0.3, 'darcy-weisbach', NU);
    const slotted = siphonFullBoreFlowM3PerS(
      bellDrain({ slotCount: 4, slotWidth: 0.004 }),
      0.3,
      'darcy-weisbach',
      NU,
    );
    expect(bell).toBeLessThan(bare);
    expect(slotted).toBeLessThan(bell);
  });

  it('falls as the calibration multiplier on the drain losses rises', () => {
    const flows = [0.5, 1, 2].map((m) =>
      siphonFullBoreFlowM3PerS(bellDrain({}, m), 0.3, 'darcy-weisbach', NU),
    );
    expect(flows[0]).toBeGreaterThan(flows[1] as number);
    expect(flows[1]).toBeGreaterThan(flows[2] as number);
  });

  it('uses the scenario loss table it is given (a larger exit K gives less flow)', () => {
    const strict = { ...SCENARIO_DEFAULTS.lossCoefficients, entrance: 1 };
    expect(siphonFullBoreFlowM3PerS(bellDrain(), 0.3, 'darcy-weisbach', NU, strict)).toBeLessThan(
      siphonFullBoreFlowM3PerS(bellDrain(), 0.3, 'darcy-weisbach', NU),
    );
  });

  it('agrees within 10 % between Darcy–Weisbach and Hazen–Williams friction for a short drain', () => {
    const dw = siphonFullBoreFlowM3PerS(bellDrain(), 0.3, 'darcy-weisbach', NU);
    const hw = siphonFullBoreFlowM3PerS(bellDrain(), 0.3, 'hazen-williams', NU);
    expect(Math.abs(hw / dw - 1)).toBeLessThan(0.1);
  });
});

describe('primingFlowM3PerS', () => {
  it('gives about 15 L/min for a 1 in Schedule 40 bore with k_p 0.7 (drain stacks 7/24 full: 15.3 L/min, Wyly & Eaton lineage)', () => {
    const drain = {
      ...bellDrain(),
      standpipe: { ...bellDrain().standpipe, innerDiameter: 1.049 * 0.0254 },
    };
    expect(Math.abs((primingFlowM3PerS(drain) * 60000) / 15.3 - 1)).toBeLessThan(0.02);
  });

  it('is k_p·√(g·D⁵): doubling k_p doubles it, doubling the bore multiplies it by 2^2.5', () => {
    const drain = bellDrain();
    const base = primingFlowM3PerS(drain);
    expect(primingFlowM3PerS({ ...drain, primingCoefficient: 1.4 })).toBeCloseTo(2 * base, 15);
    expect(
      primingFlowM3PerS({ ...drain, standpipe: { ...drain.standpipe, innerDiameter: 2 * BORE } }) /
        base,
    ).toBeCloseTo(2 ** 2.5, 12);
  });
});
