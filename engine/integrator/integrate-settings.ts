import type { StepperSettings } from './cash-karp-stepper';

/** Settings of one hybrid integration. */
export interface IntegrateSettings extends StepperSettings {
  /** Start and end time, s. */
  startS: number;
  endS: number;
  /** Event times are located to this fraction of the step that contains them (1e-6). */
  eventToleranceFraction: number;
  /** Upper bound on accepted steps; the run fails past it. */
  maxSteps: number;
  /** Upper bound on transitions at one instant; more means the modes chatter. */
  maxTransitionsAtOneInstant: number;
  /** Polled once per step; true stops the run cooperatively. */
  shouldStop?: () => boolean;
  /** Receives the fraction of simulated time done, at most once per percent. */
  onProgress?: (fraction: number) => void;
}
