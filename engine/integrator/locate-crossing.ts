/**
 * Finds where a continuous function crosses from positive to zero-or-negative inside a bracket,
 * by the Illinois variant of regula falsi (Dowell & Jarratt, BIT 11, 1971, 168–174; superlinear,
 * order ≈ 1.44) with a bisection safeguard whenever three steps have not halved the bracket. Requires gLo > 0 and gHi ≤ 0. Shrinks the bracket until its width is at most
 * `toleranceS` and returns its right end, where g ≤ 0 holds: the event is then certainly past.
 * Terminates after at most ~200 iterations even for a tolerance below the floating-point spacing.
 */
export function locateCrossing(
  g: (timeS: number) => number,
  loStartS: number,
  hiStartS: number,
  gLoStart: number,
  gHiStart: number,
  toleranceS: number,
): number {
  let lo = loStartS;
  let hi = hiStartS;
  let gLo = gLoStart;
  let gHi = gHiStart;
  let lastSide = 0;
  let widthBefore = hi - lo;
  for (let iteration = 0; iteration < 200 && hi - lo > toleranceS; iteration += 1) {
    let t = hi - (gHi * (hi - lo)) / (gHi - gLo);
    const slow = iteration % 3 === 2 && hi - lo > 0.5 * widthBefore;
    if (iteration % 3 === 2) widthBefore = hi - lo;
    if (slow || !(t > lo && t < hi)) t = 0.5 * (lo + hi);
    if (t <= lo || t >= hi) break;
    const gt = g(t);
    if (Number.isNaN(gt)) return hi;
    if (gt > 0) {
      lo = t;
      gLo = gt;
      if (lastSide === 1) gHi *= 0.5;
      lastSide = 1;
    } else {
      hi = t;
      gHi = gt;
      if (lastSide === -1) gLo *= 0.5;
      lastSide = -1;
    }
  }
  return hi;
}
