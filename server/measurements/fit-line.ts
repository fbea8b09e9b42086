/** Ordinary least-squares straight line through points. */

/** y = intercept + slope·x. */
export interface Line {
  slope: number;
  intercept: number;
}

/**
 * The least-squares line through the points (x[i], y[i]) (normal equations on centred x, e.g.
 * Press et al., Numerical Recipes, 3rd ed., §15.2); null for fewer than two points or no spread
 * in x.
 */
export function fitLine(x: readonly number[], y: readonly number[]): Line | null {
  const n = Math.min(x.length, y.length);
  if (n < 2) return null;
  let mx = 0;
  let my = 0;
  for (let i = 0; i < n; i++) {
    mx += (x[i] ?? 0) / n;
    my += (y[i] ?? 0) / n;
  }
  let sxx = 0;
  let sxy = 0;
  for (let i = 0; i < n; i++) {
    const dx = (x[i] ?? 0) - mx;
    sxx += dx * dx;
    sxy += dx * ((y[i] ?? 0) - my);
  }
  if (sxx === 0) return null;
  const slope = sxy / sxx;
  return { slope, intercept: my - slope * mx };
}
