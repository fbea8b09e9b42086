/**
 * The model side of a calibration: simulated figures and normalised residuals for a set of
 * coefficient values, cached by value (so repeated points, and the idle iterations of a converged
 * fit, cost no simulation), within an evaluation budget and a deadline.
 */
import type { CycleSpreads } from '../cycle-figures';
import { withCoefficients } from '../with-coefficients';
import type { CalibrationProblem, FigureTarget, FitLimits } from './calibration-problem';
import { modelSpreads, type SimulateFn } from './model-spreads';

/** Thrown when the next evaluation would pass the budget or the deadline. */
export class FitBudgetExceeded extends Error {}

/**
 * Residual standing in for a figure the model cannot produce (the bed stalled or locked): far
 * worse than any real misfit, so the fit steps back into the cycling region.
 */
export const MISSING_FIGURE_RESIDUAL = 1e4;

/** One evaluated point: log-coefficients, simulated figure per target figure, residuals, χ². */
export interface Evaluation {
  logValues: number[];
  /** Per target, per figure: the simulated value or null. */
  simulated: (number | null)[][];
  /** (simulated − measured)/σ of the fitted figures, in target order. */
  residuals: number[];
  chiSquare: number;
}

function simulatedFigure(
  spreads: CycleSpreads | null | undefined,
  metric: FigureTarget['metric'],
): number | null {
  return spreads?.[metric]?.mean ?? null;
}

/** Evaluates the model at log-coefficients; see the module comment. */
export class FigureEvaluator {
  private readonly cache = new Map<string, Evaluation>();
  private readonly beds: string[];
  private durationS: number;
  /** Simulations run so far. */
  evaluations = 0;

  constructor(
    private readonly problem: CalibrationProblem,
    private readonly simulate: SimulateFn,
    private readonly limits: FitLimits,
    private readonly now: () => number,
    private readonly startedAt: number = now(),
  ) {
    this.beds = [...new Set(problem.targets.map((t) => t.bed))];
    this.durationS = problem.durationS;
  }

  /** Every point evaluated so far. */
  all(): Evaluation[] {
    return [...this.cache.values()];
  }

  /** The point, from the cache or by one simulation; throws FitBudgetExceeded past the limits. */
  evaluate(logValues: readonly number[]): Evaluation {
    // Steps below 1e-6 in log-coefficient (1e-4 %) are the same point.
    const key = logValues.map((v) => Math.round(v * 1e6)).join(',');
    const cached = this.cache.get(key);
    if (cached) return cached;
    if (
      this.evaluations >= this.limits.maxEvaluations ||
      this.now() - this.startedAt > this.limits.deadlineMs
    )
      throw new FitBudgetExceeded();
    this.evaluations++;
    const values = this.problem.parameters.map((p, i) => ({
      key: p.key,
      target: p.target,
      value: Math.exp(logValues[i] ?? 0),
    }));
    const scenario = withCoefficients(this.problem.scenario, values);
    const { spreads, durationS } = modelSpreads(this.simulate, scenario, this.beds, this.durationS);
    this.durationS = Math.max(this.durationS, durationS);
    const simulated = this.problem.targets.map((t) =>
      t.figures.map((f) => simulatedFigure(spreads.get(t.bed), f.metric)),
    );
    const residuals: number[] = [];
    this.problem.targets.forEach((t, ti) =>
      t.figures.forEach((f, fi) => {
        if (!f.fitted) return;
        const sim = simulated[ti]?.[fi] ?? null;
        residuals.push(sim === null ? MISSING_FIGURE_RESIDUAL : (sim - f.measured) / f.sigma);
      }),
    );
    const evaluation = {
      logValues: [...logValues],
      simulated,
      residuals,
      chiSquare: residuals.reduce((s, r) => s + r * r, 0),
    };
    this.cache.set(key, evaluation);
    return evaluation;
  }
}
