import { axisUnits, formatAxisValue } from './axis-units';

describe('axis units', () => {
  it('sends lengths and volumes with their display unit, a valve opening as a fraction and a flow factor as a number', () => {
    expect(axisUnits('standpipe-height', 'metric').toRequest(0.15)).toBe('0.15 m');
    expect(axisUnits('drain-diameter', 'us').toRequest(1)).toBe('1 in');
    expect(axisUnits('vessel-volume', 'metric').toRequest(400)).toBe('400 L');
    expect(axisUnits('valve-opening', 'metric').toRequest(60)).toBe(0.6);
    expect(axisUnits('pump-flow-scale', 'metric').toRequest(1.5)).toBe(1.5);
  });

  it('writes values as a builder reads them', () => {
    expect(formatAxisValue('pump-flow-scale', 1.25, 'metric')).toBe('×1.25');
    expect(formatAxisValue('valve-opening', 0.6, 'metric')).toBe('60 %');
    expect(formatAxisValue('standpipe-diameter', 0.0266, 'metric')).toBe('26.6 mm');
    expect(formatAxisValue('vessel-volume', 0.5, 'metric')).toBe('500 L');
  });
});
