import { describe, expect, it } from 'vitest';
import { formatQuantity } from './format-quantity';
import { DisplayUnitError, fromDisplay } from './from-display';
import { toDisplay } from './to-display';

describe('display units', () => {
  it('shows diameters in millimetres or inches', () => {
    expect(toDisplay(0.0254, 'diameter', 'us')).toEqual({ value: 1, unit: 'in', label: 'in' });
    expect(toDisplay(0.0266, 'diameter', 'metric').value).toBeCloseTo(26.6, 12);
  });

  it('shows flows in L/min or US gal/min', () => {
    expect(toDisplay(6.30901964e-5, 'flow', 'us').value).toBeCloseTo(1, 12);
    expect(toDisplay(1e-3 / 60, 'flow', 'metric').value).toBeCloseTo(1, 12);
  });

  it('shows temperatures in °C or °F from a value kept in °C', () => {
    expect(toDisplay(20, 'temperature', 'us').value).toBeCloseTo(68, 12);
    expect(toDisplay(20, 'temperature', 'metric')).toEqual({
      value: 20,
      unit: 'degC',
      label: '°C',
    });
  });

  it('converts a displayed value back to SI, round-tripping every dimension', () => {
    expect(fromDisplay(1, 'in', 'diameter')).toBe(0.0254);
    expect(fromDisplay(68, 'degF', 'temperature')).toBeCloseTo(20, 12);
    const dims = [
      'length',
      'diameter',
      'area',
      'volume',
      'time',
      'flow',
      'power',
      'temperature',
    ] as const;
    for (const dimension of dims) {
      for (const system of ['metric', 'us'] as const) {
        const shown = toDisplay(0.37, dimension, system);
        expect(fromDisplay(shown.value, shown.unit, dimension)).toBeCloseTo(0.37, 12);
      }
    }
  });

  it('refuses a display unit of another dimension', () => {
    expect(() => fromDisplay(3, 'L/min', 'length')).toThrow(DisplayUnitError);
  });

  it('formats with a sensible number of digits and the unit label', () => {
    expect(formatQuantity(0.0254, 'diameter', 'us')).toBe('1.00 in');
    expect(formatQuantity(0.5, 'volume', 'metric')).toBe('500 L');
    expect(formatQuantity(0.25, 'length', 'metric')).toBe('0.25 m');
    expect(formatQuantity(2.5e-4, 'flow', 'metric')).toBe('15.0 L/min');
    expect(formatQuantity(0.7, 'dimensionless', 'us')).toBe('0.7');
  });
});
