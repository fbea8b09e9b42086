import { describe, expect, it } from 'vitest';
import { seriesToCsv } from './series-csv';

describe('seriesToCsv', () => {
  it('writes the header t_s,<ids> and one row per sample with round-trip numbers', () => {
    const csv = seriesToCsv({
      t_s: Float64Array.from([0, 5]),
      channels: [
        {
          id: 'level:tank',
          kind: 'level',
          where: 'tank',
          unit: 'm',
          values: Float64Array.from([0.1 + 0.2, 0.5]),
        },
        {
          id: 'phase:bed',
          kind: 'phase',
          where: 'bed',
          unit: '',
          values: Float64Array.from([0, Number.NaN]),
        },
      ],
    });
    expect(csv).toBe('t_s,level:tank,phase:bed\n0,0.30000000000000004,0\n5,0.5,\n');
    const row = csv.split('\n')[1]?.split(',') ?? [];
    expect(Number(row[1])).toBe(0.1 + 0.2);
  });
  it('quotes an id that holds a comma', () => {
    const csv = seriesToCsv({
      t_s: Float64Array.from([]),
      channels: [
        { id: 'a,b', kind: 'level', where: 'a', unit: 'm', values: Float64Array.from([]) },
      ],
    });
    expect(csv).toBe('t_s,"a,b"\n');
  });
});
