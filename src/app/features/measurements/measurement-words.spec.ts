import type { CalibrationFit, ComparisonRow } from '../../../../shared/contracts/measurements';
import {
  calibrationLines,
  coefficientText,
  differenceText,
  figureText,
  fitSentence,
} from './measurement-words';

describe('measurement words', () => {
  it('shows times and levels in the reader’s units', () => {
    expect(figureText(0.265, 'm', 'metric')).toBe('265 mm');
    expect(figureText(0.0254, 'm', 'us')).toBe('1.00 in');
    expect(figureText(null, 's', 'metric')).toBe('–');
    expect(figureText(245.6, 's', 'metric')).toMatch(/^(246 s|4\.09 min)$/);
  });

  it('signs a difference and gives its relative size', () => {
    const row: ComparisonRow = {
      metric: 'drain',
      unit: 's',
      measured: 360,
      simulated: 245,
      difference: -115,
      relative: -0.3194,
    };
    expect(differenceText(row, 'metric')).toMatch(/^−.+ \(−31\.9 %\)$/);
    expect(differenceText({ ...row, difference: null, relative: null }, 'metric')).toBe('–');
  });

  it('rounds a coefficient to the digits its standard error supports', () => {
    expect(coefficientText(0.55243, 0.0082)).toBe('0.552 ± 0.008');
    expect(coefficientText(1.6133, 0.023)).toBe('1.61 ± 0.02');
    expect(coefficientText(0.7, null)).toBe('0.700');
  });

  it('sums up a fit and the values kept on a system', () => {
    const fit: CalibrationFit = {
      status: 'converged',
      message: 'Converged.',
      iterations: 5,
      evaluations: 24,
      chiSquareBefore: 3045,
      chiSquareAfter: 0.5,
      rmsNormalisedResidual: 0.4,
      degreesOfFreedom: 0,
      wallMs: 2700,
      residuals: [],
    };
    expect(fitSentence(fit)).toBe(
      'Converged. χ² 3.05e+3 → 0.500 (5 iterations, 24 simulations, 2.7 s).',
    );
    const lines = calibrationLines({
      calibrationId: '11111111-1111-4111-8111-111111111111',
      beds: [{ bed: 'bed-a', primingCoefficient: 0.552, dischargeLossMultiplier: 1.61 }],
      pumps: [{ pump: 'pump', flowScale: 0.842 }],
      appliedAt: '2024-06-01T10:00:00.000Z',
      appliedBy: { id: '22222222-2222-4222-8222-222222222222', name: 'Cal' },
    });
    expect(lines).toEqual([
      'bed-a: k_p 0.552, drain-loss multiplier 1.610',
      'pump: flow scale 0.842',
    ]);
  });
});
