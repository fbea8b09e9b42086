/**
 * The messages between the editor and the simulation worker. Everything in them is plain data
 * (structured-clone safe): the normalised scenario in, progress and the engine's outcome out.
 */
import type { SimulationResult } from '../../../../engine/index';
import type { Scenario } from '../../../../shared/scenario';

/** Asks the worker to simulate `scenario` for `durationS` simulated seconds. */
export interface SimulationRequest {
  readonly requestId: number;
  readonly scenario: Scenario;
  readonly durationS: number;
  /** Stop (keeping the partial result) after this much wall time; null runs to the end. */
  readonly budgetMs: number | null;
  /** Cap on stored samples per channel, to keep the answer small. */
  readonly maxSamples: number;
}

/** The worker's share of the run so far, 0..1. */
export interface SimulationProgress {
  readonly kind: 'progress';
  readonly requestId: number;
  readonly fraction: number;
}

/** The engine ended: its status, the (possibly partial) result and the wall time it took. */
export interface SimulationDone {
  readonly kind: 'done';
  readonly requestId: number;
  readonly status: 'completed' | 'stopped' | 'failed';
  readonly reason: string | null;
  /** True when the wall-time budget, not the engine, ended the run early. */
  readonly stoppedByBudget: boolean;
  /** Simulated seconds the result covers. */
  readonly reachedS: number;
  readonly wallMs: number;
  readonly result: SimulationResult;
}

/** The engine threw (a broken invariant or invalid input); `message` says what. */
export interface SimulationCrashed {
  readonly kind: 'crashed';
  readonly requestId: number;
  readonly message: string;
}

/** Anything the worker posts back. */
export type SimulationReply = SimulationProgress | SimulationDone | SimulationCrashed;
