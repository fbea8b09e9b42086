/**
 * What a calibration fits: coefficients (k_p and the drain-loss multiplier per measured bed, the
 * flow scale per pump feeding one), against measured cycle figures with their uncertainties.
 * Plain data, so it crosses to a worker thread as is.
 */
import type {
  CalibrationParameterKey,
  CalibrationResidual,
} from '../../../shared/contracts/measurements';
import type { Scenario } from '../../../shared/scenario/index';

/** One coefficient to fit, with its start value and bounds (the fit works on its logarithm). */
export interface ParameterSpec {
  key: CalibrationParameterKey;
  target: string;
  initial: number;
  lower: number;
  upper: number;
}

/** One measured figure of one bed: the mean, its standard uncertainty, and whether it is fitted. */
export interface FigureTarget {
  metric: CalibrationResidual['metric'];
  unit: 's' | 'm';
  measured: number;
  sigma: number;
  fitted: boolean;
}

/** The figures one measurement gives for one bed. */
export interface BedTarget {
  measurementId: string;
  bed: string;
  figures: FigureTarget[];
}

/** Everything the fit needs. `scenario` already carries the currently applied calibration. */
export interface CalibrationProblem {
  scenario: Scenario;
  parameters: ParameterSpec[];
  targets: BedTarget[];
  /** Simulated time of one model evaluation, s (lengthened when too few cycles fit in it). */
  durationS: number;
}

/** Limits on one fit. */
export interface FitLimits {
  /** Most simulations. */
  maxEvaluations: number;
  /** Most Levenberg–Marquardt iterations. */
  maxIterations: number;
  /** Wall time, ms. */
  deadlineMs: number;
}

/**
 * Bounds of each coefficient. k_p: 0.05–5 (the drain-stack analogy gives 0.5–0.9; far outside
 * it the bed stalls or primes at once); loss multiplier 0.1–20; pump flow scale 0.2–3.
 */
export const PARAMETER_BOUNDS: Readonly<
  Record<CalibrationParameterKey, { lower: number; upper: number }>
> = {
  primingCoefficient: { lower: 0.05, upper: 5 },
  dischargeLossMultiplier: { lower: 0.1, upper: 20 },
  flowScale: { lower: 0.2, upper: 3 },
};
