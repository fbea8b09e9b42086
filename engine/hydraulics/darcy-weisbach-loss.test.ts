import { describe, expect, it } from 'vitest';
import { darcyWeisbachHeadLossM } from './darcy-weisbach-loss';

describe('darcyWeisbachHeadLossM', () => {
  it("gives 117 m for Kudela's oil example (ν 1e-5, 0.2 m³/s, 500 m of 0.2 m, ε 0.26 mm; Wrocław Univ. Sci. & Tech.)", () => {
    expect(darcyWeisbachHeadLossM(500, 0.2, 0.2, 0.26e-3, 1e-5) / 117).toBeCloseTo(1, 2);
  });

  it('reduces to Hagen–Poiseuille h = 32νLv/(gD²) in laminar flow', () => {
    const d = 0.01;
    const v = 0.05; // Re = 500
    const flow = v * (Math.PI / 4) * d * d;
    expect(darcyWeisbachHeadLossM(3, d, flow, 1e-5, 1e-6)).toBeCloseTo(
      (32 * 1e-6 * 3 * v) / (9.80665 * d * d),
      15,
    );
  });

  it('is zero without flow and odd in the flow', () => {
    expect(darcyWeisbachHeadLossM(3, 0.02, 0, 1.5e-6, 1e-6)).toBe(0);
    const forward = darcyWeisbachHeadLossM(3, 0.02, 3e-4, 1.5e-6, 1e-6);
    expect(darcyWeisbachHeadLossM(3, 0.02, -3e-4, 1.5e-6, 1e-6)).toBe(-forward);
  });

  it('grows with the flow through the laminar–turbulent blend', () => {
    let previous = 0;
    for (let re = 100; re < 6000; re += 50) {
      const flow = ((re * 1e-6) / 0.02) * (Math.PI / 4) * 0.02 * 0.02;
      const loss = darcyWeisbachHeadLossM(1, 0.02, flow, 1.5e-6, 1e-6);
      expect(loss).toBeGreaterThan(previous);
      previous = loss;
    }
  });
});
