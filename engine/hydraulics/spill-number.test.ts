import { describe, expect, it } from 'vitest';
import { spillNumber } from './spill-number';

describe('spillNumber', () => {
  it('is 0.706 for 15.3 L/min into a 1 in Schedule 40 bore (drain stack 7/24 full, Wyly & Eaton lineage)', () => {
    expect(spillNumber(15.3 / 60000, 1.049 * 0.0254)).toBeCloseTo(0.706, 2);
  });

  it('is the same for geometrically similar flows: Q ∝ D^2.5', () => {
    expect(spillNumber(1e-4 * 2 ** 2.5, 0.04)).toBeCloseTo(spillNumber(1e-4, 0.02), 12);
  });
});
