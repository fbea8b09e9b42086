import { describe, expect, it } from 'vitest';
import { detectTimeFormat } from './detect-time-format';

describe('detectTimeFormat', () => {
  it('recognises ISO dates, year-first dates and Unix times by magnitude', () => {
    expect(detectTimeFormat(['2024-05-31T14:03:22Z'])).toEqual({ format: 'iso' });
    expect(detectTimeFormat(['2024-05-31 14:03'])).toEqual({ format: 'iso' });
    expect(detectTimeFormat(['2024/05/31 14:03'])).toEqual({ format: 'ymd' });
    expect(detectTimeFormat(['1717164202'])).toEqual({ format: 'epoch-s' });
    expect(detectTimeFormat(['1717164202000'])).toEqual({ format: 'epoch-ms' });
    expect(detectTimeFormat(['0', '1.5'])).toEqual({ format: 'elapsed-s' });
    expect(detectTimeFormat(['0:00:05'])).toEqual({ format: 'elapsed-s' });
  });

  it('tells day-first from month-first only once a field exceeds 12', () => {
    expect(detectTimeFormat(['01/05/2024 10:00', '13/05/2024 10:00'])).toEqual({ format: 'dmy' });
    expect(detectTimeFormat(['05/01/2024 10:00', '05/13/2024 10:00'])).toEqual({ format: 'mdy' });
    const ambiguous = detectTimeFormat(['01/05/2024 10:00', '02/05/2024 10:00']);
    expect(ambiguous.format).toBeNull();
  });

  it('says why when nothing fits', () => {
    expect(detectTimeFormat(['', ' '])).toEqual({
      format: null,
      reason: 'the time column is empty',
    });
    expect(detectTimeFormat(['Tuesday noon']).format).toBeNull();
  });
});
