/**
 * A first step size for a (re)start of an order-5 embedded Runge–Kutta method, from the
 * derivative and one explicit Euler probe (Hairer, Nørsett & Wanner, "Solving Ordinary
 * Differential Equations I", 2nd ed., 1993, §II.4, "Starting step size"): with the weighted norm
 * ‖v‖ = max_i |v_i| / (tol·(|y_i| + floor_i)), d0 = ‖y‖, d1 = ‖f‖, h0 = 0.01·d0/d1, d2 = ‖f(y + h0·f) − f‖/h0,
 * h1 = (0.01/max(d1, d2))^(1/5); the step is min(100·h0, h1, maxStepS). A state that does not move
 * at all gets maxStepS. `rhs` is called once; `probe` and `probeDerivative` are scratch arrays.
 */
export function startingStepS(
  rhs: (out: Float64Array, y: Float64Array, timeS: number) => void,
  timeS: number,
  y: Float64Array,
  f: Float64Array,
  tolerance: number,
  errorFloor: Float64Array,
  maxStepS: number,
  probe: Float64Array,
  probeDerivative: Float64Array,
): number {
  const scale = (i: number): number =>
    tolerance * (Math.abs(y[i] as number) + (errorFloor[i] ?? 0) + 1e-300);
  let d0 = 0;
  let d1 = 0;
  for (let i = 0; i < y.length; i += 1) {
    d0 = Math.max(d0, Math.abs(y[i] as number) / scale(i));
    d1 = Math.max(d1, Math.abs(f[i] as number) / scale(i));
  }
  if (!(d1 > 1e-15)) return maxStepS;
  const h0 = Math.min(maxStepS, d0 < 1e-5 ? 1e-6 : (0.01 * d0) / d1);
  for (let i = 0; i < y.length; i += 1) probe[i] = (y[i] as number) + h0 * (f[i] as number);
  rhs(probeDerivative, probe, timeS + h0);
  let d2 = 0;
  for (let i = 0; i < y.length; i += 1)
    d2 = Math.max(d2, Math.abs((probeDerivative[i] as number) - (f[i] as number)) / scale(i) / h0);
  const biggest = Math.max(d1, d2);
  const h1 = biggest > 1e-15 ? (0.01 / biggest) ** 0.2 : Math.max(1e-6, h0 * 1e-3);
  return Math.min(100 * h0, h1, maxStepS);
}
