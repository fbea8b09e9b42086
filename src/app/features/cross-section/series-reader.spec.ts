import { SeriesReader } from './series-reader';

const reader = () =>
  new SeriesReader({
    t_s: [0, 10, 20, 20, 30],
    channels: [
      { id: 'level:bed', values: [0, 0.1, 0.2, 0.05, 0.15] },
      { id: 'phase:bed', values: [0, 1, 2, 3, 3] },
      { id: 'flow:gap', values: [1, null, 3, 3, 3] },
    ],
  });

describe('SeriesReader', () => {
  it('interpolates linearly between samples and holds the ends outside them', () => {
    const r = reader();
    expect(r.valueAt('level:bed', 5)).toBeCloseTo(0.05, 12);
    expect(r.valueAt('level:bed', 25)).toBeCloseTo(0.1, 12);
    expect(r.valueAt('level:bed', -4)).toBe(0);
    expect(r.valueAt('level:bed', 99)).toBe(0.15);
    expect(r.startS).toBe(0);
    expect(r.endS).toBe(30);
  });

  it('takes the later of two samples at one time (the state just after an event)', () => {
    const r = reader();
    expect(r.indexAt(20)).toBe(3);
    expect(r.valueAt('level:bed', 20)).toBe(0.05);
    expect(r.heldAt('phase:bed', 20)).toBe(3);
    expect(r.heldAt('phase:bed', 19.9)).toBe(1);
  });

  it('finds the same sample playing forward, jumping back and jumping ahead', () => {
    const r = reader();
    const fresh = (t: number) => reader().indexAt(t);
    for (const t of [0, 3, 9.99, 10, 15, 20, 20.5, 29, 30, 31, 2, 25, 12, -1]) {
      expect(r.indexAt(t)).toBe(fresh(t));
    }
  });

  it('gives NaN for an unknown channel or a missing value, and the largest magnitude of a channel', () => {
    const r = reader();
    expect(r.valueAt('level:nowhere', 5)).toBeNaN();
    expect(r.valueAt('flow:gap', 5)).toBeNaN();
    expect(r.has('flow:gap')).toBe(true);
    expect(r.largest('level:bed')).toBe(0.2);
  });
});
