import type { SizingCheck } from '../../../../shared/contracts/sizing';
import { readCheck } from './check-reading';

const check = (
  unit: SizingCheck['unit'],
  value: number | null,
  limit: number | null,
): SizingCheck => ({
  check: 'x',
  subject: 's',
  title: 't',
  status: 'ok',
  value,
  limit,
  unit,
  source: 'src',
  detail: 'd',
});

describe('readCheck', () => {
  it('reads pressures in kPa or lb/ft², masses in kg or lb, volumes in L or gal', () => {
    expect(readCheck(check('Pa', 6190, 1915), 'metric')).toEqual({
      value: '6.19 kPa',
      limit: '1.92 kPa',
    });
    expect(readCheck(check('Pa', 1915, null), 'us')).toEqual({ value: '40 lb/ft²', limit: '—' });
    expect(readCheck(check('kg', 100, null), 'us').value).toBe('220 lb');
    expect(readCheck(check('m3', 0.0129, 0.063), 'metric')).toEqual({
      value: '12.9 L',
      limit: '63.0 L',
    });
  });

  it('reads times in seconds or minutes, rates per hour and ratios', () => {
    expect(readCheck(check('s', 175, 3600), 'metric')).toEqual({
      value: '2.92 min',
      limit: '60 min',
    });
    expect(readCheck(check('per-hour', 4.06, 1), 'metric').value).toBe('4.06 /h');
    expect(readCheck(check('ratio', 0.436, 1), 'metric')).toEqual({
      value: '0.436 : 1',
      limit: '1 : 1',
    });
  });
});
