import { describe, expect, it } from 'vitest';
import { HttpError } from '../http/http-error';
import { selectSeries, strideIndices } from './select-series';

const series = {
  t_s: Float64Array.from([0, 1, 2, 3, 4, 5, 6, 7, 8, 9]),
  channels: [
    {
      id: 'level:tank',
      kind: 'level' as const,
      where: 'tank',
      unit: 'm' as const,
      values: Float64Array.from([10, 11, 12, 13, 14, 15, 16, 17, 18, 19]),
    },
    {
      id: 'flow:pump',
      kind: 'flow' as const,
      where: 'pump',
      unit: 'm3/s' as const,
      values: Float64Array.from([20, 21, 22, 23, 24, 25, 26, 27, 28, 29]),
    },
  ],
};

describe('strideIndices', () => {
  it('keeps every sample when there are no more than maxPoints', () => {
    expect(strideIndices(4, 10)).toEqual([0, 1, 2, 3]);
    expect(strideIndices(4, undefined)).toEqual([0, 1, 2, 3]);
  });
  it('keeps the first and last sample and spreads the rest evenly', () => {
    expect(strideIndices(10, 4)).toEqual([0, 3, 6, 9]);
    expect(strideIndices(101, 3)).toEqual([0, 50, 100]);
  });
});

describe('selectSeries', () => {
  it('returns the asked channels in the asked order at the thinned samples', () => {
    const picked = selectSeries(series, { channels: 'flow:pump, level:tank', maxPoints: 4 });
    expect(Array.from(picked.t_s)).toEqual([0, 3, 6, 9]);
    expect(picked.channels.map((c) => c.id)).toEqual(['flow:pump', 'level:tank']);
    expect(Array.from(picked.channels[0]?.values ?? [])).toEqual([20, 23, 26, 29]);
  });
  it('answers an unknown channel with a 400 naming it and the known ones', () => {
    try {
      selectSeries(series, { channels: 'level:sump' });
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(HttpError);
      expect((error as HttpError).status).toBe(400);
      expect((error as HttpError).message).toContain('level:sump');
      expect((error as HttpError).message).toContain('level:tank, flow:pump');
    }
  });
});
