import { describe, expect, it } from 'vitest';
import { parseQuantity } from './parse-quantity';

function valueOf(value: unknown, dimension: Parameters<typeof parseQuantity>[1]): number {
  const result = parseQuantity(value, dimension, 'field');
  if (!result.success) throw new Error(result.issue.message);
  return result.value;
}

describe('parseQuantity', () => {
  it('reads lengths and diameters in metric and US units into metres', () => {
    expect(valueOf('25 mm', 'diameter')).toBe(0.025);
    expect(valueOf('1 in', 'diameter')).toBe(0.0254);
    expect(valueOf('12 in', 'length')).toBeCloseTo(0.3048, 15);
    expect(valueOf('26.6 mm', 'diameter')).toBe(0.0266);
  });

  it('reads flows into cubic metres per second (US gallon = 3.785411784 L)', () => {
    expect(valueOf('300 L/h', 'flow')).toBeCloseTo(300e-3 / 3600, 18);
    expect(valueOf('5 gal/min', 'flow')).toBeCloseTo((5 * 3.785411784e-3) / 60, 18);
    expect(valueOf('10 gpm', 'flow')).toBeCloseTo(6.30901964e-4, 15);
    expect(valueOf('20 lpm', 'flow')).toBeCloseTo(20e-3 / 60, 18);
  });

  it('reads times, areas, volumes and powers into SI', () => {
    expect(valueOf('2 h', 'time')).toBe(7200);
    expect(valueOf('90 min', 'time')).toBe(5400);
    expect(valueOf('4 ft^2', 'area')).toBeCloseTo(4 * 0.3048 ** 2, 15);
    expect(valueOf('500 L', 'volume')).toBe(0.5);
    expect(valueOf('35 W', 'power')).toBe(35);
  });

  it('keeps temperatures in degrees Celsius, whatever unit they are written in', () => {
    expect(valueOf('24 degC', 'temperature')).toBe(24);
    expect(valueOf('75 degF', 'temperature')).toBeCloseTo(23.8888888888889, 12);
    expect(valueOf('300 K', 'temperature')).toBeCloseTo(26.85, 12);
    expect(valueOf(18, 'temperature')).toBe(18);
  });

  it('takes plain numbers and unit-less numeric strings as SI values', () => {
    expect(valueOf(0.3, 'length')).toBe(0.3);
    expect(valueOf('0.3', 'length')).toBe(0.3);
    expect(valueOf(0.6, 'dimensionless')).toBe(0.6);
  });

  it('rejects a value of the wrong dimension with the path, the expectation and what was given', () => {
    const result = parseQuantity('2 h', 'length', 'vessels[0].height');
    expect(result).toEqual({
      success: false,
      issue: {
        path: 'vessels[0].height',
        message: 'Expected a length such as "0.3 m" or "12 in"; got "2 h", which is a time.',
      },
    });
    const flowAsLength = parseQuantity('3 m', 'flow', 'pumps[0].maxFlow');
    expect(flowAsLength.success).toBe(false);
    if (!flowAsLength.success) expect(flowAsLength.issue.message).toContain('which is a length');
  });

  it('rejects unknown units, non-finite numbers and values of other types', () => {
    for (const bad of ['3 furlongz', '', NaN, Infinity, null, true, [1], { value: 1 }]) {
      const result = parseQuantity(bad, 'length', 'p');
      expect(result.success, String(bad)).toBe(false);
    }
    const unitOnDimensionless = parseQuantity('3 mm', 'dimensionless', 'p');
    expect(unitOnDimensionless.success).toBe(false);
  });
});
