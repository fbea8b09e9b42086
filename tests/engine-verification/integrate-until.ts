/// <reference path="../../engine/ode45-cash-karp.d.ts" />
import ode45 from 'ode45-cash-karp';

/**
 * Integrates a scalar ODE y' = f(y) from (0, y0) with the scijs Cash–Karp integrator until y falls
 * to `target`, and returns that time, located on the cubic Hermite interpolant of the last step
 * (values and slopes at both ends) by bisection. For reference checks only.
 */
export function timeToReach(
  rate: (y: number) => number,
  y0: number,
  target: number,
  tolerance = 1e-12,
): number {
  const integrator = ode45(
    [y0],
    (dydt, y) => {
      dydt[0] = rate(y[0] as number);
    },
    0,
    1e-3,
    { tol: tolerance, verbose: false },
  );
  let t0 = 0;
  let ya = y0;
  for (let step = 0; step < 1_000_000; step += 1) {
    integrator.step();
    const t1 = integrator.t;
    const yb = integrator.y[0] as number;
    if (yb <= target) return locateOnHermite(t0, t1, ya, yb, rate(ya), rate(yb), target);
    t0 = t1;
    ya = yb;
  }
  throw new Error('The level never reached the target.');
}

function locateOnHermite(
  t0: number,
  t1: number,
  y0: number,
  y1: number,
  f0: number,
  f1: number,
  target: number,
): number {
  const h = t1 - t0;
  const at = (s: number): number => {
    const s2 = s * s;
    const s3 = s2 * s;
    return (
      (2 * s3 - 3 * s2 + 1) * y0 +
      (s3 - 2 * s2 + s) * h * f0 +
      (-2 * s3 + 3 * s2) * y1 +
      (s3 - s2) * h * f1
    );
  };
  let lo = 0;
  let hi = 1;
  for (let k = 0; k < 80; k += 1) {
    const mid = 0.5 * (lo + hi);
    if (at(mid) > target) lo = mid;
    else hi = mid;
  }
  return t0 + h * 0.5 * (lo + hi);
}
