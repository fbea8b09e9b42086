import type { LossCoefficients, Pipe } from '../../shared/scenario/index';
import { minorLossCoefficient } from './minor-loss';

/** A pipe ready for the flow formulas: SI geometry and the sum of its minor-loss coefficients. */
export interface PipeRun {
  lengthM: number;
  diameterM: number;
  roughnessM: number;
  hazenWilliamsC: number;
  /** ΣK of its fittings plus any extra losses (entrance, valve), at the pipe velocity. */
  minorLossK: number;
}

/** Friction model of a run. */
export type FrictionModel = 'darcy-weisbach' | 'hazen-williams';

/**
 * Prepares a scenario pipe: its fittings' ΣK from the scenario's loss table plus `extraK` (for
 * example an entrance K = 0.5 or a throttled valve's K).
 */
export function makePipeRun(pipe: Pipe, coefficients: LossCoefficients, extraK = 0): PipeRun {
  return {
    lengthM: pipe.length,
    diameterM: pipe.innerDiameter,
    roughnessM: pipe.roughness,
    hazenWilliamsC: pipe.hazenWilliamsC,
    minorLossK: minorLossCoefficient(pipe.fittings, coefficients) + extraK,
  };
}
