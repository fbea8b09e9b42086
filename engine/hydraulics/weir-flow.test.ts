import { describe, expect, it } from 'vitest';
import { rimControlSwitchHeadM, rimSpillFlowM3PerS, weirFlowM3PerS } from './weir-flow';

describe('weir and rim flow', () => {
  it('gives Q = C_w·L·H^1.5: 1 m of crest at 0.1 m head with C_w 1.838 passes 58.1 L/s', () => {
    expect(weirFlowM3PerS(1.838, 1, 0.1)).toBeCloseTo(1.838 * 0.1 ** 1.5, 15);
    expect(weirFlowM3PerS(1.838, 1, 0.1) * 1000).toBeCloseTo(58.12, 2);
  });

  it('is zero at and below the crest', () => {
    expect(weirFlowM3PerS(1.838, 1, 0)).toBe(0);
    expect(weirFlowM3PerS(1.838, 1, -0.01)).toBe(0);
    expect(rimSpillFlowM3PerS(0.0266, -0.01, 1.838, 0.61)).toBe(0);
  });

  it('follows the weir below the switch head and the bore orifice above it (shaft-spillway practice)', () => {
    const d = 0.0266;
    const switchHead = rimControlSwitchHeadM(d, 1.838, 0.61);
    expect(switchHead / d).toBeCloseTo(0.367, 3);
    const low = switchHead / 3;
    const high = switchHead * 3;
    expect(rimSpillFlowM3PerS(d, low, 1.838, 0.61)).toBeCloseTo(
      weirFlowM3PerS(1.838, Math.PI * d, low),
      15,
    );
    expect(rimSpillFlowM3PerS(d, high, 1.838, 0.61)).toBeCloseTo(
      0.61 * (Math.PI / 4) * d * d * Math.sqrt(2 * 9.80665 * high),
      15,
    );
  });
});
