/**
 * One accepted integration step with the values and derivatives at both ends: everything a
 * cubic Hermite interpolant needs for dense output and event location.
 */
export interface StepSegment {
  /** Step start time, s. */
  t0S: number;
  /** Step end time, s. */
  t1S: number;
  /** State at the start of the step. */
  readonly y0: Float64Array;
  /** State at the end of the step. */
  readonly y1: Float64Array;
  /** Derivative dy/dt at the start of the step. */
  readonly f0: Float64Array;
  /** Derivative dy/dt at the end of the step. */
  readonly f1: Float64Array;
}

/** Allocates a segment for a state of `size` components, times zero. */
export function makeStepSegment(size: number): StepSegment {
  return {
    t0S: 0,
    t1S: 0,
    y0: new Float64Array(size),
    y1: new Float64Array(size),
    f0: new Float64Array(size),
    f1: new Float64Array(size),
  };
}
