import { describe, expect, it } from 'vitest';
import { makeLazyHermiteTable } from './lazy-hermite-table';

describe('makeLazyHermiteTable', () => {
  it('reproduces a smooth function to 1e-9 relative between its nodes', () => {
    const table = makeLazyHermiteTable(
      2,
      (x, out) => {
        out[0] = Math.exp(-x) * Math.sqrt(1 + x);
        out[1] = Math.log(2 + x);
      },
      0,
      2,
      128,
    );
    const out = new Float64Array(2);
    for (let k = 0; k <= 200; k += 1) {
      const x = (2 * k) / 200 + (k % 7) * 1e-4;
      if (x > 2) continue;
      expect(table.evaluate(x, out)).toBe(true);
      expect(Math.abs((out[0] as number) / (Math.exp(-x) * Math.sqrt(1 + x)) - 1)).toBeLessThan(
        1e-9,
      );
      expect(Math.abs((out[1] as number) / Math.log(2 + x) - 1)).toBeLessThan(1e-9);
    }
  });

  it('is continuously differentiable across a node', () => {
    const table = makeLazyHermiteTable(
      1,
      (x, out) => {
        out[0] = Math.sin(3 * x);
      },
      0,
      1,
      16,
    );
    const out = new Float64Array(1);
    const at = (x: number): number => (table.evaluate(x, out) ? (out[0] as number) : Number.NaN);
    const node = 5 / 16;
    const h = 1e-7;
    const left = (at(node) - at(node - h)) / h;
    const right = (at(node + h) - at(node)) / h;
    expect(Math.abs(left - right)).toBeLessThan(1e-5);
  });

  it('computes each node once and only the nodes it needs', () => {
    let calls = 0;
    const table = makeLazyHermiteTable(
      1,
      (x, out) => {
        calls += 1;
        out[0] = x * x;
      },
      0,
      10,
      100,
    );
    const out = new Float64Array(1);
    for (let k = 0; k < 50; k += 1) table.evaluate(5 + k * 1e-3, out);
    expect(calls).toBe(6);
    expect(table.evaluations).toBe(calls);
  });

  it('declines points outside its range and leaves the output alone', () => {
    const table = makeLazyHermiteTable(
      1,
      (x, out) => {
        out[0] = x;
      },
      0,
      1,
      4,
    );
    const out = new Float64Array([42]);
    expect(table.evaluate(1.0001, out)).toBe(false);
    expect(table.evaluate(-1e-9, out)).toBe(false);
    expect(table.evaluate(Number.NaN, out)).toBe(false);
    expect(out[0]).toBe(42);
  });
});
