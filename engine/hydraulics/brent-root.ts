/** Thrown when a root solver is given a bracket whose ends do not straddle a root. */
export class RootBracketError extends Error {
  readonly code = 'root-not-bracketed';
}

/**
 * Root of a continuous function on [a, b] whose values at the ends have opposite signs (or one is
 * zero), by Brent's method: inverse quadratic interpolation and secant steps, safeguarded by
 * bisection, so it never leaves the bracket and converges superlinearly. Stops when the bracket is
 * narrower than 4·ε·|x| + `xTolerance` (absolute, in x's unit) or f(x) = 0.
 * Source: R. P. Brent, "Algorithms for Minimization without Derivatives", Prentice-Hall 1973, ch. 4
 * (procedure zero).
 */
export function brentRoot(
  fn: (x: number) => number,
  lower: number,
  upper: number,
  xTolerance: number,
  maxIterations = 200,
): number {
  let a = lower;
  let b = upper;
  let fa = fn(a);
  let fb = fn(b);
  if (fa === 0) return a;
  if (fb === 0) return b;
  if ((fa > 0 && fb > 0) || (fa < 0 && fb < 0) || Number.isNaN(fa) || Number.isNaN(fb)) {
    throw new RootBracketError(`No sign change between ${a} (${fa}) and ${b} (${fb}).`);
  }
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  for (let iteration = 0; iteration < maxIterations; iteration += 1) {
    if ((fb > 0 && fc > 0) || (fb < 0 && fc < 0)) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      [a, b, c] = [b, c, b];
      [fa, fb, fc] = [fb, fc, fb];
    }
    const tolerance = 2 * Number.EPSILON * Math.abs(b) + 0.5 * xTolerance;
    const m = 0.5 * (c - b);
    if (Math.abs(m) <= tolerance || fb === 0) return b;
    [d, e] = nextStep(a, b, c, fa, fb, fc, d, e, m, tolerance);
    a = b;
    fa = fb;
    b += Math.abs(d) > tolerance ? d : m > 0 ? tolerance : -tolerance;
    fb = fn(b);
  }
  return b;
}

/** One Brent step [d, e]: interpolation when it is safe and shrinks fast enough, else bisection. */
function nextStep(
  a: number,
  b: number,
  c: number,
  fa: number,
  fb: number,
  fc: number,
  d: number,
  e: number,
  m: number,
  tolerance: number,
): [number, number] {
  if (Math.abs(e) < tolerance || Math.abs(fa) <= Math.abs(fb)) return [m, m];
  const s = fb / fa;
  let p: number;
  let q: number;
  if (a === c) {
    p = 2 * m * s;
    q = 1 - s;
  } else {
    const qa = fa / fc;
    const r = fb / fc;
    p = s * (2 * m * qa * (qa - r) - (b - a) * (r - 1));
    q = (qa - 1) * (r - 1) * (s - 1);
  }
  if (p > 0) q = -q;
  else p = -p;
  if (2 * p < Math.min(3 * m * q - Math.abs(tolerance * q), Math.abs(e * q))) return [p / q, d];
  return [m, m];
}
