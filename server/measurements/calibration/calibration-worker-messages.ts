/** Messages between the calibration runner (main thread) and a calibration worker thread. */
import type { CalibrationProblem, FitLimits } from './calibration-problem';
import type { FitOutcome } from './fit-calibration';

/** Main → worker: fit one problem. */
export interface CalibrationJobMessage {
  problem: CalibrationProblem;
  limits: FitLimits;
}

/** Worker → main: the outcome, or the error that stopped the fit. */
export type CalibrationWorkerMessage =
  { type: 'done'; outcome: FitOutcome } | { type: 'error'; message: string };
