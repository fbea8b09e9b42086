import { describe, expect, it } from 'vitest';
import { parseScenario, type BellSiphonDrain, type Scenario } from '../../shared/scenario';
import { EXAMPLE_SCENARIO_FILE } from '../../shared/scenario';
import { makePumpLineHydraulics, solvePumpOperatingPoint } from '../system/operating-point';
import { makePumpResponseFunction, type PumpResponse } from './pump-response-table';
import { siphonFullBoreFlowM3PerS } from './siphon-flow';
import { makeSiphonFlowFunction } from './siphon-flow-table';

function example(): Scenario {
  const parsed = parseScenario(EXAMPLE_SCENARIO_FILE);
  if (!parsed.success) throw new Error('example scenario invalid');
  return parsed.scenario;
}

const NU = 1e-6;

describe('tabulated hydraulics against the exact solves', () => {
  it('gives the full-bore siphon flow within 1e-8 relative over the head range of a cycle', () => {
    const scenario = example();
    const bed = scenario.vessels[1];
    if (bed?.kind !== 'bed' || bed.drain.type !== 'bell-siphon') throw new Error('no bell bed');
    const drain: BellSiphonDrain = bed.drain;
    const maxHeadM = bed.floorElevation + bed.height - drain.outletElevation;
    const tabulated = makeSiphonFlowFunction(
      drain,
      'darcy-weisbach',
      NU,
      scenario.lossCoefficients,
      maxHeadM,
      false,
    );
    for (let k = 1; k <= 40; k += 1) {
      const headM = 0.12 + (k / 40) * (maxHeadM - 0.12);
      const exact = siphonFullBoreFlowM3PerS(
        drain,
        headM,
        'darcy-weisbach',
        NU,
        scenario.lossCoefficients,
      );
      expect(Math.abs(tabulated(headM) / exact - 1)).toBeLessThan(1e-8);
    }
    expect(tabulated(0)).toBe(0);
    expect(tabulated(-0.1)).toBe(0);
  });

  it('gives the pump operating point within 1e-9 relative over the source levels, and solves drowned outlets exactly', () => {
    const scenario = example();
    const pump = scenario.pumps[0];
    if (!pump) throw new Error('no pump');
    const line = makePumpLineHydraulics(pump, scenario.lossCoefficients);
    const elevations = pump.outlets.map((o) => o.elevation);
    const response = makePumpResponseFunction(
      line,
      elevations,
      'darcy-weisbach',
      NU,
      0.25,
      0.75,
      false,
    );
    const into: PumpResponse = {
      pumpFlowM3PerS: 0,
      headM: 0,
      outletFlowsM3PerS: new Float64Array(1),
    };
    for (let k = 0; k <= 30; k += 1) {
      const zS = 0.3 + (k / 30) * 0.4;
      response.evaluate(zS, elevations, true, into);
      const exact = solvePumpOperatingPoint(line, zS, elevations, 'darcy-weisbach', NU);
      expect(
        Math.abs(
          (into.outletFlowsM3PerS[0] as number) / (exact.outletFlowsM3PerS[0] as number) - 1,
        ),
      ).toBeLessThan(1e-9);
      expect(Math.abs(into.headM / exact.headM - 1)).toBeLessThan(1e-9);
    }
    const drowned = [1.25];
    response.evaluate(0.5, drowned, false, into);
    const exact = solvePumpOperatingPoint(line, 0.5, drowned, 'darcy-weisbach', NU);
    expect(into.outletFlowsM3PerS[0]).toBeCloseTo(exact.outletFlowsM3PerS[0] as number, 14);
  });
});
