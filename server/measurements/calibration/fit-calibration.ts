/**
 * Fits calibration coefficients to measured cycle figures by weighted least squares:
 * minimise χ² = Σ ((simulated − measured)/σ)² over the logarithms of the coefficients (positive,
 * and relative steps suit multipliers) with Levenberg–Marquardt (ml-levenberg-marquardt;
 * Marquardt, J. SIAM 11:431, 1963), the Jacobian by forward differences of whole simulations.
 * Bounded by an evaluation budget and a deadline: past them, the best point so far is kept.
 */
import { levenbergMarquardt } from 'ml-levenberg-marquardt';
import type { CalibrationFit, CalibrationResidual } from '../../../shared/contracts/measurements';
import type { CalibrationProblem, FitLimits } from './calibration-problem';
import { FigureEvaluator, FitBudgetExceeded, type Evaluation } from './evaluate-figures';
import type { SimulateFn } from './model-spreads';
import { parameterUncertainty, type Uncertainty } from './parameter-uncertainty';

/** The fitted coefficients (same order as the problem's), their standard errors and the fit report. */
export interface FitOutcome {
  values: number[];
  standardErrors: (number | null)[];
  fit: CalibrationFit;
}

/** Forward-difference step in log-coefficient (0.2 %): well above the engine's event-time noise. */
const GRADIENT_STEP = 2e-3;
/** A remaining Gauss–Newton step below this in every log-coefficient (0.1 %) counts as converged. */
const CONVERGED_STEP = 1e-3;

/** Thrown to end the library's loop once χ² stopped improving (it has no such test of its own). */
class FitStalled extends Error {}

/** Iterations without a relative χ² gain above STALL_GAIN end the fit. */
const STALL_ITERATIONS = 3;
const STALL_GAIN = 1e-6;

/** Runs the library's iterations; whether the budget ran out, and how many iterations were made. */
function runLevenbergMarquardt(
  problem: CalibrationProblem,
  evaluator: FigureEvaluator,
  start: number[],
  maxIterations: number,
  m: number,
): { outOfBudget: boolean; iterations: number } {
  const x = Array.from({ length: m }, (_, i) => i);
  const n = start.length;
  let calls = 0;
  // Per iteration the library evaluates the point, n shifted points and the stepped point.
  const iterations = (): number => Math.max(0, Math.floor((calls - 1) / (n + 2)));
  const bestByIteration: number[] = [];
  const bestChiSquare = (): number => Math.min(...evaluator.all().map((e) => e.chiSquare));
  try {
    const result = levenbergMarquardt(
      { x, y: new Array<number>(m).fill(0) },
      (p) => {
        calls++;
        if ((calls - 1) % (n + 2) === 0 && calls > 1) {
          bestByIteration.push(bestChiSquare());
          const earlier = bestByIteration.at(-1 - STALL_ITERATIONS);
          const latest = bestByIteration.at(-1) ?? 0;
          if (earlier !== undefined && earlier - latest <= STALL_GAIN * earlier)
            throw new FitStalled();
        }
        const residuals = evaluator.evaluate(p).residuals;
        return (i) => residuals[i] ?? 0;
      },
      {
        initialValues: start,
        minValues: problem.parameters.map((p) => Math.log(p.lower)),
        maxValues: problem.parameters.map((p) => Math.log(p.upper)),
        gradientDifference: GRADIENT_STEP,
        damping: 1e-2,
        maxIterations,
        errorTolerance: 1e-12,
      },
    );
    return { outOfBudget: false, iterations: result.iterations };
  } catch (error) {
    if (error instanceof FitBudgetExceeded) return { outOfBudget: true, iterations: iterations() };
    if (error instanceof FitStalled) return { outOfBudget: false, iterations: iterations() };
    throw error;
  }
}

/** J of the residuals at `best` by forward differences; null when the budget runs out. */
function jacobianAt(evaluator: FigureEvaluator, best: Evaluation): number[][] | null {
  const columns: number[][] = [];
  try {
    for (let j = 0; j < best.logValues.length; j++) {
      const shifted = best.logValues.map((v, k) => (k === j ? v + GRADIENT_STEP : v));
      const r = evaluator.evaluate(shifted).residuals;
      columns.push(r.map((v, i) => (v - (best.residuals[i] ?? 0)) / GRADIENT_STEP));
    }
  } catch (error) {
    if (error instanceof FitBudgetExceeded) return null;
    throw error;
  }
  return best.residuals.map((_, i) => columns.map((c) => c[i] ?? 0));
}

function residualRows(
  problem: CalibrationProblem,
  before: Evaluation,
  after: Evaluation,
): CalibrationResidual[] {
  return problem.targets.flatMap((t, ti) =>
    t.figures.map((f, fi) => {
      const simulatedAfter = after.simulated[ti]?.[fi] ?? null;
      return {
        measurementId: t.measurementId,
        bed: t.bed,
        metric: f.metric,
        unit: f.unit,
        measured: f.measured,
        sigma: f.sigma,
        before: before.simulated[ti]?.[fi] ?? null,
        after: simulatedAfter,
        normalised: simulatedAfter === null ? null : (simulatedAfter - f.measured) / f.sigma,
        fitted: f.fitted,
      };
    }),
  );
}

function judge(
  best: Evaluation,
  uncertainty: Uncertainty | null,
  outOfBudget: boolean,
): Pick<CalibrationFit, 'status' | 'message'> {
  if (best.residuals.some((r) => Math.abs(r) >= 1e4)) {
    return {
      status: 'failed',
      message:
        'The model did not cycle for any coefficients tried; check the system against the real one (pump, standpipe, bell) first.',
    };
  }
  const step = uncertainty?.step;
  if (best.chiSquare < 1e-12 || (step && step.every((d) => Math.abs(d) < CONVERGED_STEP))) {
    return {
      status: 'converged',
      message: 'Converged: a further step would change no coefficient by more than 0.1 %.',
    };
  }
  if (outOfBudget)
    return {
      status: 'time-limit',
      message:
        'Stopped at the time or simulation limit; the best coefficients found so far are shown.',
    };
  return {
    status: 'max-iterations',
    message:
      'Stopped at the iteration limit before the coefficients settled; the best found so far are shown.',
  };
}

/** Runs the fit; `now` is a clock in ms (the deadline counts from the first call). */
export function fitCalibration(
  problem: CalibrationProblem,
  simulate: SimulateFn,
  limits: FitLimits,
  now: () => number,
): FitOutcome {
  const startedAt = now();
  const evaluator = new FigureEvaluator(problem, simulate, limits, now, startedAt);
  const start = problem.parameters.map((p) =>
    Math.log(Math.min(p.upper, Math.max(p.lower, p.initial))),
  );
  const before = evaluator.evaluate(start);
  const m = before.residuals.length;
  const run = runLevenbergMarquardt(problem, evaluator, start, limits.maxIterations, m);
  let outOfBudget = run.outOfBudget;
  const best = evaluator.all().reduce((a, b) => (b.chiSquare < a.chiSquare ? b : a), before);
  const jacobian = jacobianAt(evaluator, best);
  outOfBudget ||= jacobian === null;
  const uncertainty = jacobian ? parameterUncertainty(jacobian, best.residuals) : null;
  const values = best.logValues.map(Math.exp);
  const n = problem.parameters.length;
  return {
    values,
    standardErrors: values.map((v, j) => {
      const se = uncertainty?.logStandardErrors[j];
      return se === null || se === undefined ? null : v * se;
    }),
    fit: {
      ...judge(best, uncertainty, outOfBudget),
      iterations: run.iterations,
      evaluations: evaluator.evaluations,
      chiSquareBefore: before.chiSquare,
      chiSquareAfter: best.chiSquare,
      rmsNormalisedResidual: m > 0 ? Math.sqrt(best.chiSquare / m) : null,
      degreesOfFreedom: m - n,
      wallMs: Math.round(now() - startedAt),
      residuals: residualRows(problem, before, best),
    },
  };
}
