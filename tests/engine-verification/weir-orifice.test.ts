import { describe, expect, it } from 'vitest';
import { SCENARIO_DEFAULTS } from '../../shared/scenario/index';
import {
  ORIFICE_DISCHARGE_COEFFICIENTS as CD,
  STANDARD_GRAVITY_M_PER_S2 as G,
  rimControlSwitchHeadM,
  rimSpillFlowM3PerS,
  weirFlowM3PerS,
} from './engine-parts';

const FT = 0.3048;
const SCH40_ID_M: Record<string, number> = {
  '3/4': 0.824 * 0.0254,
  '1': 1.049 * 0.0254,
  '2': 2.067 * 0.0254,
};

describe('weir and orifice coefficients', () => {
  it('converts C_w = 3.33 ft^½/s (USDA-SCS riser practice) to 1.838 m^½/s, the scenario default', () => {
    // Q[cfs] = 3.33·L[ft]·H[ft]^1.5 → in SI the coefficient is 3.33·√(0.3048 m/ft).
    expect(3.33 * Math.sqrt(FT)).toBeCloseTo(1.838, 3);
    expect(SCENARIO_DEFAULTS.weirCoefficientSqrtMPerS).toBe(1.838);
    const flowSi = weirFlowM3PerS(1.838, 1, 0.1);
    const flowUs = 3.33 * (1 / FT) * (0.1 / FT) ** 1.5 * FT ** 3;
    expect(Math.abs(flowSi / flowUs - 1)).toBeLessThan(0.001);
  });

  it('matches EPA SWMM 5: C_w/√(2g) = 0.414 → 1.834 m^½/s, within 0.5 % of 1.838', () => {
    const swmm = 0.414 * Math.sqrt(2 * G);
    expect(Math.abs(swmm - 1.834)).toBeLessThan(1e-3);
    expect(Math.abs(swmm / 1.838 - 1)).toBeLessThan(0.005);
  });

  it('switches a circular rim from weir to orifice control at H/D = 0.362 for C_d 0.6 (SWMM 5 note), 0.368 for 0.61, 0.483 for 0.80', () => {
    const cw = 0.414 * Math.sqrt(2 * G);
    expect(Math.abs(rimControlSwitchHeadM(1, cw, 0.6) - 0.362)).toBeLessThan(0.005);
    expect(Math.abs(rimControlSwitchHeadM(1, cw, 0.61) - 0.368)).toBeLessThan(0.005);
    expect(Math.abs(rimControlSwitchHeadM(1, cw, 0.8) - 0.483)).toBeLessThan(0.005);
    const switchHead = rimControlSwitchHeadM(0.0266, 1.838, 0.61);
    const weir = weirFlowM3PerS(1.838, Math.PI * 0.0266, switchHead);
    expect(rimSpillFlowM3PerS(0.0266, switchHead, 1.838, 0.61)).toBeCloseTo(weir, 15);
  });

  it.each([
    ['1', 0.002, 0.82],
    ['3/4', 0.01, 5.5],
    ['1', 0.01, 8.89],
    ['1', 0.02, 12.6],
    ['2', 0.02, 48.8],
  ])(
    'library-computed standpipe-rim table: %s in at %f m → %f L/min (smaller of weir and orifice, C_w 1.834, C_d 0.6)',
    (nps, head, litresPerMinute) => {
      const flow = rimSpillFlowM3PerS(SCH40_ID_M[nps] as number, head, 1.834, 0.6) * 60000;
      expect(Math.abs(flow / litresPerMinute - 1)).toBeLessThan(0.01);
    },
  );

  it('uses orifice C_d from Encyclopaedia Britannica 11th ed. (1911), "Hydromechanics" (Unwin): sharp 0.603–0.621, short tube 0.82, rounded 0.96–0.99', () => {
    expect(CD.sharpEdged).toBeGreaterThanOrEqual(0.603);
    expect(CD.sharpEdged).toBeLessThanOrEqual(0.621);
    expect(SCENARIO_DEFAULTS.orificeDischargeCoefficient).toBe(CD.sharpEdged);
    expect(Math.abs(CD.shortTube - 0.82)).toBeLessThanOrEqual(0.02);
    expect(Math.abs(CD.rounded - 0.97)).toBeLessThanOrEqual(0.02);
    expect(CD.reentrant).toBeGreaterThanOrEqual(0.5);
    expect(CD.reentrant).toBeLessThanOrEqual(0.52);
  });

  // A pond-outlet calculator's US-unit set (Q = C·A·√H, ft): a magnitude check only.
  it('agrees in magnitude with the US-unit set C = 4.9 / 6.4 / 7.9 ft^½/s ÷ √(2·32.2) = 0.61 / 0.80 / 0.98', () => {
    const root2g = Math.sqrt(2 * 32.2);
    expect([4.9 / root2g, 6.4 / root2g, 7.9 / root2g].map((c) => Number(c.toFixed(2)))).toEqual([
      0.61, 0.8, 0.98,
    ]);
    expect(Math.abs(4.9 / root2g - CD.sharpEdged)).toBeLessThanOrEqual(0.01);
    expect(Math.abs(6.4 / root2g - CD.shortTube)).toBeLessThanOrEqual(0.03);
    expect(Math.abs(7.9 / root2g - CD.rounded)).toBeLessThanOrEqual(0.02);
  });
});
