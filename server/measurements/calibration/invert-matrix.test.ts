import { describe, expect, it } from 'vitest';
import { invertMatrix } from './invert-matrix';

describe('invertMatrix', () => {
  it('inverts a 3×3 matrix so that A·A⁻¹ = I', () => {
    const a = [
      [4, 1, 2],
      [1, 3, 0.5],
      [2, 0.5, 5],
    ];
    const inverse = invertMatrix(a);
    expect(inverse).not.toBeNull();
    for (let i = 0; i < 3; i++) {
      for (let j = 0; j < 3; j++) {
        const product = a[i]!.reduce((sum, v, k) => sum + v * inverse![k]![j]!, 0);
        expect(product).toBeCloseTo(i === j ? 1 : 0, 12);
      }
    }
  });

  it('needs a pivot swap for a zero on the diagonal', () => {
    expect(
      invertMatrix([
        [0, 2],
        [3, 0],
      ]),
    ).toEqual([
      [0, 1 / 3],
      [0.5, 0],
    ]);
  });

  it('returns null for a singular matrix', () => {
    expect(
      invertMatrix([
        [1, 2],
        [2, 4],
      ]),
    ).toBeNull();
    expect(invertMatrix([[0]])).toBeNull();
  });
});
