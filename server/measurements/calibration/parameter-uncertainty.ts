/** Standard errors and the Gauss–Newton step at a least-squares point, from its Jacobian. */
import { invertMatrix } from './invert-matrix';

/** Standard errors of the (log) parameters, and the Gauss–Newton step still to go. */
export interface Uncertainty {
  /** Standard error of each log-parameter; null when JᵀJ is singular (a parameter the figures do not see). */
  logStandardErrors: (number | null)[];
  /** δ = −(JᵀJ)⁻¹Jᵀr; null when singular. */
  step: number[] | null;
}

/**
 * With J the Jacobian of the normalised residuals r (m × n) at the fit, the covariance of the
 * parameters is (JᵀJ)⁻¹·s², s² = χ²/(m − n) when m > n (the residuals' own scatter), else 1
 * (the stated uncertainties taken as they are) — Press et al., Numerical Recipes, 3rd ed., §15.5.
 */
export function parameterUncertainty(
  jacobian: readonly (readonly number[])[],
  residuals: readonly number[],
): Uncertainty {
  const n = jacobian[0]?.length ?? 0;
  const m = jacobian.length;
  const jtj = Array.from({ length: n }, (_, a) =>
    Array.from({ length: n }, (_, b) =>
      jacobian.reduce((s, row) => s + (row[a] ?? 0) * (row[b] ?? 0), 0),
    ),
  );
  const jtr = Array.from({ length: n }, (_, a) =>
    jacobian.reduce((s, row, i) => s + (row[a] ?? 0) * (residuals[i] ?? 0), 0),
  );
  const inverse = invertMatrix(jtj);
  if (!inverse) return { logStandardErrors: Array.from({ length: n }, () => null), step: null };
  const chiSquare = residuals.reduce((s, r) => s + r * r, 0);
  const s2 = m > n ? chiSquare / (m - n) : 1;
  return {
    logStandardErrors: inverse.map((row, a) => Math.sqrt(Math.max(0, (row[a] ?? 0) * s2))),
    step: inverse.map((row) => -row.reduce((s, v, b) => s + v * (jtr[b] ?? 0), 0)),
  };
}
