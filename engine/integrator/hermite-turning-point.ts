/**
 * The s in (0, 1) where the cubic Hermite interpolant with end values y0, y1 and scaled slopes
 * d0 = h·f0, d1 = h·f1 has zero slope: root of A·s² + B·s + C with A = 6y0 + 3d0 − 6y1 + 3d1,
 * B = −6y0 − 4d0 + 6y1 − 2d1, C = d0. Undefined when no root lies inside.
 */
export function hermiteTurningPoint(
  y0: number,
  y1: number,
  d0: number,
  d1: number,
): number | undefined {
  const a = 6 * y0 + 3 * d0 - 6 * y1 + 3 * d1;
  const b = -6 * y0 - 4 * d0 + 6 * y1 - 2 * d1;
  const c = d0;
  if (Math.abs(a) < 1e-300) {
    const s = -c / b;
    return s > 0 && s < 1 ? s : undefined;
  }
  const disc = b * b - 4 * a * c;
  if (disc < 0) return undefined;
  const q = -0.5 * (b + Math.sign(b || 1) * Math.sqrt(disc));
  for (const s of [q / a, c / q]) if (s > 0 && s < 1) return s;
  return undefined;
}
