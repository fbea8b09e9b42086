import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { flowForHeadM3PerS, pipeHeadLossM } from './pipe-flow';
import type { FrictionModel, PipeRun } from './pipe-run';

const NU = 1.0034e-6;
const oneInch: PipeRun = {
  lengthM: 1.5,
  diameterM: 0.0266,
  roughnessM: 1.5e-6,
  hazenWilliamsC: 150,
  minorLossK: 1.8,
};
const models: FrictionModel[] = ['darcy-weisbach', 'hazen-williams'];

describe('pipe head loss and its inverse', () => {
  it('adds the minor losses ΣK·v²/2g to the friction', () => {
    const flow = 20 / 60000;
    const v = flow / ((Math.PI / 4) * 0.0266 ** 2);
    const friction = pipeHeadLossM({ ...oneInch, minorLossK: 0 }, flow, 'darcy-weisbach', NU);
    expect(pipeHeadLossM(oneInch, flow, 'darcy-weisbach', NU) - friction).toBeCloseTo(
      (1.8 * v * v) / (2 * 9.80665),
      14,
    );
  });

  it('inverts the loss exactly (1e-10 relative) for laminar to turbulent flows with both friction models', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...models),
        fc.double({ min: -6, max: 1, noNaN: true }),
        fc.double({ min: 0, max: 3, noNaN: true }),
        (model, logHead, extraK) => {
          const head = 10 ** logHead;
          const flow = flowForHeadM3PerS(oneInch, head, model, NU, extraK);
          const v = flow / ((Math.PI / 4) * 0.0266 ** 2);
          const used = pipeHeadLossM(oneInch, flow, model, NU) + (extraK * v * v) / (2 * 9.80665);
          expect(Math.abs(used / head - 1)).toBeLessThan(1e-10);
        },
      ),
    );
  });

  it('gives more flow for more head (monotone inverse)', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...models),
        fc.double({ min: 1e-5, max: 5, noNaN: true }),
        fc.double({ min: 1e-3, max: 2, noNaN: true }),
        (model, head, factor) => {
          expect(flowForHeadM3PerS(oneInch, head * (1 + factor), model, NU, 1)).toBeGreaterThan(
            flowForHeadM3PerS(oneInch, head, model, NU, 1),
          );
        },
      ),
    );
  });

  it('gives no flow without head or through a closed valve, and backflow for negative head', () => {
    expect(flowForHeadM3PerS(oneInch, 0, 'darcy-weisbach', NU, 1)).toBe(0);
    expect(flowForHeadM3PerS(oneInch, 0.5, 'darcy-weisbach', NU, Number.POSITIVE_INFINITY)).toBe(0);
    const forward = flowForHeadM3PerS(oneInch, 0.5, 'darcy-weisbach', NU, 1);
    expect(flowForHeadM3PerS(oneInch, -0.5, 'darcy-weisbach', NU, 1)).toBe(-forward);
  });

  it('tends to the frictionless orifice flow A·√(2gH/K) for a very short pipe', () => {
    const stub: PipeRun = { ...oneInch, lengthM: 1e-9, minorLossK: 0.5 };
    const flow = flowForHeadM3PerS(stub, 0.3, 'darcy-weisbach', NU, 1);
    expect(flow / ((Math.PI / 4) * 0.0266 ** 2 * Math.sqrt((2 * 9.80665 * 0.3) / 1.5))).toBeCloseTo(
      1,
      6,
    );
  });
});
