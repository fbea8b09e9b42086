import type { StepSegment } from './step-segment';

/**
 * A piecewise-smooth ODE system with discrete modes: smooth between transitions, switched by
 * located state events and by timed events. The model owns its modes; the integrator only
 * tells it when and why to switch.
 *
 * Event convention: each event function g_i is positive while nothing happens, and the event
 * fires when g_i goes from > 0 to ≤ 0. An event that is ≤ 0 right after a transition is
 * disarmed until it becomes positive again, which rules out zero-length mode flips.
 */
export interface HybridSystem {
  /** Number of state components. */
  readonly stateSize: number;
  /** Number of event functions (fixed for the run; unused ones return a positive constant). */
  readonly eventCount: number;
  /** Writes dy/dt at (y, t) for the current modes into `out` (no allocation). */
  derivative(out: Float64Array, y: Float64Array, timeS: number): void;
  /** Writes every event function g_i(t, y) for the current modes into `out`. */
  eventValues(out: Float64Array, y: Float64Array, timeS: number): void;
  /** First time strictly after `afterS` at which a timed transition is due, or Infinity. */
  nextTimedTransitionS(afterS: number): number;
  /**
   * Switches modes at `timeS`, for the fired events `fired` and, when `timed` is true, for the
   * timed transitions due at that time. May change `y` in place (instant transfers that conserve
   * water). Must leave the modes consistent with the new state (a switch that makes another
   * condition true at once is applied in the same call), because events that are already ≤ 0
   * afterwards stay disarmed until they turn positive.
   */
  transition(timeS: number, y: Float64Array, fired: readonly number[], timed: boolean): void;
}

/** Receives the accepted trajectory: smooth pieces and the transitions between them. */
export interface TrajectoryObserver {
  /** An accepted step; the segment's arrays are reused after the call returns. */
  onSegment(segment: StepSegment): void;
  /** Called just before the model switches modes at `timeS`, with the state at that instant. */
  beforeTransition(timeS: number, state: Float64Array): void;
  /** Called just after the switch, with the state afterwards (changed if water moved instantly). */
  afterTransition(timeS: number, state: Float64Array): void;
}

/** Integrator counters, as reported in a run's statistics. */
export interface IntegrationStats {
  /** Accepted steps. */
  steps: number;
  /** Rejected trial steps. */
  rejected: number;
  /** Right-hand-side evaluations made by the model (cache hits excluded). */
  rhsEvaluations: number;
  /** Transitions (located events and timed events). */
  events: number;
}

/** How an integration ended, with the time and state reached; `failed` carries the reason. */
export type IntegrationOutcome =
  | { status: 'completed'; endS: number; state: Float64Array; stats: IntegrationStats }
  | { status: 'stopped'; endS: number; state: Float64Array; stats: IntegrationStats }
  | {
      status: 'failed';
      endS: number;
      state: Float64Array;
      stats: IntegrationStats;
      reason: string;
    };
