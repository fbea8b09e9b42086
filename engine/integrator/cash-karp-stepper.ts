/// <reference path="../ode45-cash-karp.d.ts" />
import ode45 from 'ode45-cash-karp';

/** Settings of the adaptive Cash–Karp stepper. */
export interface StepperSettings {
  /** Relative tolerance per step (the package's `tol`). */
  relativeTolerance: number;
  /**
   * Absolute floor of each component's error scale: a component is controlled to
   * relativeTolerance·(|y| + |h·f| + floor). Makes tiny or zero components cheap to integrate.
   */
  readonly errorFloor: Float64Array;
  /** Largest step, s. */
  maxStepS: number;
  /** First trial step, s. */
  initialStepS: number;
}

/** Counters of the stepper; `rejected` counts trial steps that failed the error test. */
export interface StepperCounters {
  rhsEvaluations: number;
  rhsCalls: number;
  rejected: number;
}

/**
 * The scijs `ode45-cash-karp` integrator (Cash & Karp, ACM TOMS 16(3), 1990, 201–222) wrapped
 * for restarts: its state can be reset to any (t, y), and a known derivative at the current
 * point is served from a one-entry cache, so the first stage of the next step costs nothing.
 */
export interface CashKarpStepper {
  /** Current time, s. */
  readonly timeS: number;
  /** Current state (the stepper's own array; copy it before changing it). */
  readonly state: Float64Array;
  /** Step size the stepper will try next, s. */
  readonly nextStepS: number;
  readonly counters: StepperCounters;
  /** Resets to (t, y); `derivative` is f(t, y) when known. */
  reset(timeS: number, y: Float64Array, derivative: Float64Array | undefined, stepS: number): void;
  /** Tells the stepper that f at its current point equals `derivative`. */
  cacheDerivative(derivative: Float64Array): void;
  /** One accepted adaptive step, never past `limitS`. Throws when the error estimate is not finite. */
  step(limitS: number): void;
}

/** Creates a stepper for `rhs` (called as rhs(out, y, t)). */
export function makeCashKarpStepper(
  rhs: (out: Float64Array, y: Float64Array, timeS: number) => void,
  size: number,
  settings: StepperSettings,
): CashKarpStepper {
  const state = new Float64Array(size);
  const cached = new Float64Array(size);
  let cacheTimeS = Number.NaN;
  const counters: StepperCounters = { rhsEvaluations: 0, rhsCalls: 0, rejected: 0 };
  const { errorFloor, relativeTolerance } = settings;
  const derive = (out: ode45.StateVector, y: ode45.StateVector, t: number): void => {
    counters.rhsCalls += 1;
    if (y === state && t === cacheTimeS) {
      (out as Float64Array).set(cached);
      return;
    }
    counters.rhsEvaluations += 1;
    rhs(out as Float64Array, y as Float64Array, t);
  };
  const integrator = ode45(state, derive, 0, settings.initialStepS, {
    tol: relativeTolerance,
    dtMaxMag: settings.maxStepS,
    verbose: false,
    errorScaleFunction: (i, dt, y, dydt) =>
      Math.abs(y) + Math.abs(dt * dydt) + (errorFloor[i] ?? 0) + 1e-300,
  });
  return {
    get timeS() {
      return integrator.t;
    },
    state,
    get nextStepS() {
      return integrator.dt;
    },
    counters,
    reset(timeS, y, derivative, stepS) {
      state.set(y);
      integrator.t = timeS;
      integrator.dt = Math.min(stepS, settings.maxStepS);
      cacheTimeS = Number.NaN;
      if (derivative) this.cacheDerivative(derivative);
    },
    cacheDerivative(derivative) {
      cached.set(derivative);
      cacheTimeS = integrator.t;
    },
    step(limitS) {
      const callsBefore = counters.rhsCalls;
      integrator.step(limitS);
      cacheTimeS = Number.NaN;
      const calls = counters.rhsCalls - callsBefore;
      // The package declines a step within 1e-10·dt of the limit, and may land an ulp short of
      // it: in both cases the limit has been reached.
      if (calls === 0 || Math.abs(limitS - integrator.t) <= 1e-12 * Math.max(1, Math.abs(limitS))) {
        integrator.t = limitS;
      }
      // Each trial costs 5 stage evaluations after the shared first one.
      if (calls > 0) counters.rejected += (calls - 1) / 5 - 1;
    },
  };
}
