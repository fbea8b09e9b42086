import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { SCENARIO_DEFAULTS, type Pipe, type Pump } from '../../shared/scenario/index';
import { makePumpLineHydraulics, solvePumpOperatingPoint } from './operating-point';

const NU = 1.0034e-6;
const K = SCENARIO_DEFAULTS.lossCoefficients;
const LPH = 1 / 3.6e6;

const pipe = (lengthM: number, diameterM: number, elbow90 = 0): Pipe => ({
  length: lengthM,
  innerDiameter: diameterM,
  material: 'pvc',
  roughness: 1.5e-6,
  hazenWilliamsC: 150,
  fittings: { elbow90, elbow45: 0, teeRun: 0, teeBranch: 0, ballValve: 0 },
});

function pump(valveOpenings: number[]): Pump {
  return {
    id: 'p',
    in: 'tank',
    intakeHeight: 0.3,
    curveKind: 'points',
    checkValve: false,
    flowScale: 1,
    initialState: 'on',
    curve: [
      { flow: 0, head: 2.2 },
      { flow: 1200 * LPH, head: 1.4 },
      { flow: 2000 * LPH, head: 0 },
    ],
    main: pipe(0.5, 0.0209),
    outlets: valveOpenings.map((valveOpening, i) => ({
      to: `bed-${i}`,
      elevation: 1.2,
      valveOpening,
      pipe: pipe(1.5, 0.0158, 3),
    })),
  };
}

describe('solvePumpOperatingPoint', () => {
  it('balances the pump head against the system: E_m − z_i equals the outlet losses and Σ Q_i = Q_p', () => {
    const line = makePumpLineHydraulics(pump([1, 1]), K);
    const point = solvePumpOperatingPoint(line, 0.55, [1.2, 1.0], 'darcy-weisbach', NU);
    const [a, b] = point.outletFlowsM3PerS as [number, number];
    expect(a + b).toBeCloseTo(point.pumpFlowM3PerS, 16);
    expect(b).toBeGreaterThan(a);
    expect(point.manifoldHeadM).toBeGreaterThan(1.2);
    expect(point.headM).toBeCloseTo(line.curve.headM(point.pumpFlowM3PerS), 15);
  });

  it('gives the same answer from any warm start, to 1e-10', () => {
    const line = makePumpLineHydraulics(pump([1]), K);
    const cold = solvePumpOperatingPoint(line, 0.55, [1.2], 'darcy-weisbach', NU).pumpFlowM3PerS;
    fc.assert(
      fc.property(fc.double({ min: 1e-7, max: 1e-3, noNaN: true }), (warm) => {
        const hot = solvePumpOperatingPoint(
          line,
          0.55,
          [1.2],
          'darcy-weisbach',
          NU,
          warm,
        ).pumpFlowM3PerS;
        expect(Math.abs(hot / cold - 1)).toBeLessThan(1e-10);
      }),
    );
  });

  it('delivers less as the valve closes and nothing through a closed valve', () => {
    const flows = [1, 0.6, 0.3, 0].map(
      (opening) =>
        solvePumpOperatingPoint(
          makePumpLineHydraulics(pump([opening]), K),
          0.55,
          [1.2],
          'darcy-weisbach',
          NU,
        ).pumpFlowM3PerS,
    );
    expect(flows[0]).toBeGreaterThan(flows[1] as number);
    expect(flows[1]).toBeGreaterThan(flows[2] as number);
    expect(flows[3]).toBe(0);
  });

  it('delivers less with a worn pump and when the outlet is higher', () => {
    const fresh = solvePumpOperatingPoint(
      makePumpLineHydraulics(pump([1]), K),
      0.55,
      [1.2],
      'darcy-weisbach',
      NU,
    ).pumpFlowM3PerS;
    const worn = solvePumpOperatingPoint(
      makePumpLineHydraulics(pump([1]), K, 0.7),
      0.55,
      [1.2],
      'darcy-weisbach',
      NU,
    ).pumpFlowM3PerS;
    const higher = solvePumpOperatingPoint(
      makePumpLineHydraulics(pump([1]), K),
      0.55,
      [1.8],
      'darcy-weisbach',
      NU,
    ).pumpFlowM3PerS;
    expect(worn).toBeLessThan(fresh);
    expect(higher).toBeLessThan(fresh);
  });

  it('carries more than the pump alone could when the source is far above the outlet (gravity helps)', () => {
    const line = makePumpLineHydraulics(pump([1]), K);
    const point = solvePumpOperatingPoint(line, 10, [0], 'darcy-weisbach', NU);
    expect(point.pumpFlowM3PerS).toBeGreaterThan(line.curve.maxFlowM3PerS);
    expect(point.headM).toBeLessThan(0);
    expect(point.outletFlowsM3PerS[0]).toBeCloseTo(point.pumpFlowM3PerS, 16);
  });

  it('stops at shut-off when the manifold cannot reach any outlet', () => {
    const point = solvePumpOperatingPoint(
      makePumpLineHydraulics(pump([1, 1]), K),
      0.55,
      [3, 4],
      'darcy-weisbach',
      NU,
    );
    expect(point).toEqual({
      pumpFlowM3PerS: 0,
      headM: 2.2,
      outletFlowsM3PerS: [0, 0],
      manifoldHeadM: 2.75,
    });
  });
});
