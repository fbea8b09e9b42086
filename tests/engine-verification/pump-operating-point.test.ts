import { describe, expect, it } from 'vitest';
import type { Pipe, Pump } from '../../shared/scenario/index';
import { SCENARIO_DEFAULTS } from '../../shared/scenario/index';
import {
  darcyWeisbachHeadLossM,
  hazenWilliamsHeadLossM,
  STANDARD_GRAVITY_M_PER_S2 as G,
  makePumpLineHydraulics,
  solvePumpOperatingPoint,
} from './engine-parts';

const NU = 1.0034e-6;
const K = SCENARIO_DEFAULTS.lossCoefficients;

/** Plain bisection of an increasing (sign = 1) or decreasing (sign = −1) function: 200 halvings. */
function bisect(fn: (x: number) => number, lo: number, hi: number): number {
  const rising = fn(hi) > fn(lo);
  for (let k = 0; k < 200; k += 1) {
    const mid = 0.5 * (lo + hi);
    if (fn(mid) > 0 === rising) hi = mid;
    else lo = mid;
  }
  return 0.5 * (lo + hi);
}

function pipe(lengthM: number, diameterM: number, elbow90: number): Pipe {
  return {
    length: lengthM,
    innerDiameter: diameterM,
    material: 'pvc',
    roughness: 1.5e-6,
    hazenWilliamsC: 150,
    fittings: { elbow90, elbow45: 0, teeRun: 0, teeBranch: 0, ballValve: 0 },
  };
}

/** Head lost in a pipe (friction written out here, minor losses ΣK·v²/2g), m. */
function pipeLoss(
  p: Pipe,
  flow: number,
  extraK: number,
  model: 'darcy-weisbach' | 'hazen-williams',
): number {
  const v = flow / ((Math.PI / 4) * p.innerDiameter ** 2);
  const friction =
    model === 'darcy-weisbach'
      ? darcyWeisbachHeadLossM(p.length, p.innerDiameter, flow, p.roughness, NU)
      : hazenWilliamsHeadLossM(p.length, flow, p.hazenWilliamsC, p.innerDiameter);
  return friction + ((p.fittings.elbow90 * K.elbow90 + extraK) * v * v) / (2 * G);
}

const parabolaPump = (outlets: Pump['outlets']): Pump => ({
  id: 'p',
  in: 'tank',
  intakeHeight: 0,
  curveKind: 'parabola',
  curve: [],
  maxHead: 3,
  maxFlow: 40 / 60000,
  checkValve: false,
  flowScale: 1,
  initialState: 'on',
  main: pipe(0.8, 0.0209, 1),
  outlets,
});
const pumpHead = (flow: number): number => 3 * (1 - (flow / (40 / 60000)) ** 2);

describe('pump operating point against an independent bisection of pump curve = system curve', () => {
  it.each(['darcy-weisbach', 'hazen-williams'] as const)(
    'one outlet, %s friction: same flow to 1e-10',
    (model) => {
      const pump = parabolaPump([
        { to: 'bed', elevation: 1.4, valveOpening: 1, pipe: pipe(1.5, 0.0158, 3) },
      ]);
      const outlet = pump.outlets[0]!.pipe;
      const systemHead = (q: number): number =>
        1.4 - 0.5 + pipeLoss(pump.main, q, K.entrance, model) + pipeLoss(outlet, q, K.exit, model);
      const reference = bisect((q) => pumpHead(q) - systemHead(q), 0, 40 / 60000);
      const solved = solvePumpOperatingPoint(
        makePumpLineHydraulics(pump, K),
        0.5,
        [1.4],
        model,
        NU,
      );
      expect(Math.abs(solved.pumpFlowM3PerS / reference - 1)).toBeLessThan(1e-10);
      expect(solved.headM).toBeCloseTo(pumpHead(reference), 9);
    },
  );

  it('two outlets at different heights: flows split so both end at the same manifold head', () => {
    const pump = parabolaPump([
      { to: 'bed-a', elevation: 1.2, valveOpening: 1, pipe: pipe(1.0, 0.0158, 2) },
      { to: 'bed-b', elevation: 1.6, valveOpening: 1, pipe: pipe(2.5, 0.0158, 4) },
    ]);
    const outletFlow = (manifold: number, index: number): number => {
      const o = pump.outlets[index]!;
      if (manifold <= o.elevation) return 0;
      return bisect(
        (q) => o.elevation + pipeLoss(o.pipe, q, K.exit, 'darcy-weisbach') - manifold,
        0,
        1e-2,
      );
    };
    const manifold = (q: number): number =>
      0.5 + pumpHead(q) - pipeLoss(pump.main, q, K.entrance, 'darcy-weisbach');
    const reference = bisect(
      (q) => outletFlow(manifold(q), 0) + outletFlow(manifold(q), 1) - q,
      0,
      40 / 60000,
    );
    const solved = solvePumpOperatingPoint(
      makePumpLineHydraulics(pump, K),
      0.5,
      [1.2, 1.6],
      'darcy-weisbach',
      NU,
    );
    expect(Math.abs(solved.pumpFlowM3PerS / reference - 1)).toBeLessThan(1e-10);
    expect(solved.outletFlowsM3PerS[0]! + solved.outletFlowsM3PerS[1]!).toBeCloseTo(
      solved.pumpFlowM3PerS,
      15,
    );
    expect(
      Math.abs(solved.outletFlowsM3PerS[1]! / outletFlow(manifold(reference), 1) - 1),
    ).toBeLessThan(1e-9);
    expect(solved.outletFlowsM3PerS[0]!).toBeGreaterThan(solved.outletFlowsM3PerS[1]!);
  });

  it('delivers nothing when the outlet is above the shut-off head', () => {
    const pump = parabolaPump([
      { to: 'bed', elevation: 3.6, valveOpening: 1, pipe: pipe(1.5, 0.0158, 3) },
    ]);
    const solved = solvePumpOperatingPoint(
      makePumpLineHydraulics(pump, K),
      0.5,
      [3.6],
      'darcy-weisbach',
      NU,
    );
    expect(solved).toEqual({
      pumpFlowM3PerS: 0,
      headM: 3,
      outletFlowsM3PerS: [0],
      manifoldHeadM: 3.5,
    });
  });
});
