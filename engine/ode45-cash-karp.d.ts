/**
 * Type declarations for the CommonJS package `ode45-cash-karp` 1.1.0 (scijs), which ships none.
 * Only the members the engine uses are declared.
 */
declare module 'ode45-cash-karp' {
  namespace ode45 {
    /** A numeric state vector the integrator updates in place. */
    type StateVector = Float64Array | number[];

    /** Right-hand side: writes dy/dt at (y, t) into `dydt`. */
    type Derivative = (dydt: StateVector, y: StateVector, t: number) => void;

    /** Options copied onto the integrator; all optional. */
    interface Options {
      /** Target error level of the default relative norm (default 1e-8). */
      tol?: number;
      maxIncreaseFactor?: number;
      maxDecreaseFactor?: number;
      dtMinMag?: number;
      dtMaxMag?: number;
      /** Logs convergence warnings with console.log when true (the default). */
      verbose?: boolean;
      /** Normalising factor of the error in dimension i (default |y| + |dt·dydt| + 1e-32). */
      errorScaleFunction?: (i: number, dt: number, y: number, dydt: number) => number;
      errorReduceFunction?: (i: number, accumulatedError: number, errorEstimate: number) => number;
      errorPostFunction?: (accumulatedError: number) => number;
    }

    /** The adaptive Cash–Karp integrator; `y` is the array passed in, updated in place. */
    interface Integrator {
      n: number;
      y: StateVector;
      t: number;
      dt: number;
      tol: number;
      dtMaxMag: number | undefined;
      deriv: Derivative;
      /** Takes one adaptive step; returns false once `t` has reached `tLimit`. */
      step(tLimit?: number): boolean;
      steps(n: number, tLimit?: number): boolean | undefined;
    }
  }

  /** Creates an integrator for y' = f(t, y) from (t0, y0) with first trial step dt0. */
  function ode45(
    y0: ode45.StateVector,
    deriv: ode45.Derivative,
    t0: number,
    dt0: number,
    options?: ode45.Options,
  ): ode45.Integrator;

  export = ode45;
}
