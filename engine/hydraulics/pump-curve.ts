import type { Pump } from '../../shared/scenario/index';

/** A pump's head as a function of flow, after the flow scale (wear) is applied. */
export interface PumpCurve {
  /** Head, m, at `flowM3PerS`; flat at the shut-off head for Q < 0, decreasing past zero head. */
  headM(flowM3PerS: number): number;
  /** Flow at zero head, m³/s. */
  readonly maxFlowM3PerS: number;
  /** Head at zero flow, m. */
  readonly shutoffHeadM: number;
}

/** What `makePumpCurve` reads from a scenario pump. */
export type PumpCurveSource = Pick<
  Pump,
  'curveKind' | 'curve' | 'maxHead' | 'maxFlow' | 'flowScale'
>;

/**
 * Interior slopes of a monotone piecewise-cubic Hermite interpolant: zero where the data turn,
 * else the weighted harmonic mean of the neighbouring secants (Fritsch–Butland), which keeps
 * α = m/δ within [0, 3] so the cubic is monotone; ends take their segment's secant.
 */
function pchipSlopes(xs: number[], ys: number[]): number[] {
  const n = xs.length;
  const h = xs.slice(1).map((x, k) => x - (xs[k] as number));
  const delta = h.map((hk, k) => ((ys[k + 1] as number) - (ys[k] as number)) / hk);
  const slopes = new Array<number>(n).fill(0);
  slopes[0] = delta[0] as number;
  slopes[n - 1] = delta[n - 2] as number;
  for (let k = 1; k < n - 1; k += 1) {
    const d0 = delta[k - 1] as number;
    const d1 = delta[k] as number;
    if (d0 * d1 <= 0) continue;
    const w1 = 2 * (h[k] as number) + (h[k - 1] as number);
    const w2 = (h[k] as number) + 2 * (h[k - 1] as number);
    slopes[k] = (w1 + w2) / (w1 / d0 + w2 / d1);
  }
  return slopes;
}

/** Hermite cubic through (x0,y0,m0), (x1,y1,m1) evaluated at x. */
function hermite(
  x: number,
  x0: number,
  x1: number,
  y0: number,
  y1: number,
  m0: number,
  m1: number,
): number {
  const h = x1 - x0;
  const t = (x - x0) / h;
  const t2 = t * t;
  const t3 = t2 * t;
  return (
    (2 * t3 - 3 * t2 + 1) * y0 +
    (t3 - 2 * t2 + t) * h * m0 +
    (-2 * t3 + 3 * t2) * y1 +
    (t3 - t2) * h * m1
  );
}

function pointsCurve(source: PumpCurveSource, scale: number): PumpCurve {
  const xs = source.curve.map((point) => point.flow * scale);
  const ys = source.curve.map((point) => point.head);
  const slopes = pchipSlopes(xs, ys);
  const n = xs.length;
  const lastX = xs[n - 1] as number;
  const lastY = ys[n - 1] as number;
  const lastSlope = slopes[n - 1] as number;
  const headM = (flow: number): number => {
    if (flow <= 0) return ys[0] as number;
    if (flow >= lastX) return lastY + lastSlope * (flow - lastX);
    let k = 1;
    while ((xs[k] as number) < flow) k += 1;
    return hermite(
      flow,
      xs[k - 1] as number,
      xs[k] as number,
      ys[k - 1] as number,
      ys[k] as number,
      slopes[k - 1] as number,
      slopes[k] as number,
    );
  };
  return { headM, maxFlowM3PerS: lastX - lastY / lastSlope, shutoffHeadM: ys[0] as number };
}

/**
 * A pump's head–flow curve, H(Q) in m with Q in m³/s, its flows multiplied by `flowScale`
 * (H_s(Q) = H(Q/s): a worn or clogged pump gives the same head at a smaller flow).
 * - Datasheet points: monotone piecewise-cubic Hermite interpolation (PCHIP), which never
 *   overshoots between points and is strictly decreasing when the heads are; beyond the last point
 *   it continues linearly with the last secant down to zero head and below.
 * - Max head H0 and max flow Q0 only: H = H0·(1 − (Q/Q0)²), evaluated exactly.
 * Valid for flows from zero to the flow at zero head; below zero flow the head stays at shut-off.
 * Sources: F. N. Fritsch & R. E. Carlson, SIAM J. Numer. Anal. 17(2):238–246, 1980; F. N. Fritsch
 * & J. Butland, SIAM J. Sci. Stat. Comput. 5(2):300–304, 1984.
 */
export function makePumpCurve(source: PumpCurveSource, flowScale = source.flowScale): PumpCurve {
  if (
    source.curveKind === 'parabola' &&
    source.maxHead !== undefined &&
    source.maxFlow !== undefined
  ) {
    const shutoffHeadM = source.maxHead;
    const maxFlowM3PerS = source.maxFlow * flowScale;
    return {
      headM: (flow) =>
        flow <= 0 ? shutoffHeadM : shutoffHeadM * (1 - (flow / maxFlowM3PerS) ** 2),
      maxFlowM3PerS,
      shutoffHeadM,
    };
  }
  return pointsCurve(source, flowScale);
}
