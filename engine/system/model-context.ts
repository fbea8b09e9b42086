import type { RunEvent } from '../results/run-result';

/**
 * What every component sees during one evaluation: the state, the derived vessel levels and
 * water-surface elevations, and the flow of every channel. Buffers are allocated once per run.
 */
export interface ModelContext {
  /** Simulated time, s. */
  timeS: number;
  /** The state vector being evaluated (not owned; valid during the call). */
  state: Float64Array;
  /** Vessel level above its floor, m (indexed like the vessels). */
  readonly levelM: Float64Array;
  /** Vessel water-surface elevation above the datum, m. */
  readonly surfaceM: Float64Array;
  /** Flow of each channel, m³/s, positive from its `from` to its `to`. */
  readonly flowM3PerS: Float64Array;
  /** Sum of flows into each vessel before rim and empty limits, m³/s. */
  readonly inflowM3PerS: Float64Array;
  /** Inflow minus outflow of each vessel before rim and empty limits, m³/s. */
  readonly netInflowM3PerS: Float64Array;
}

/** One directed flow path between two state components (vessel volumes or loss sinks). */
export interface FlowChannel {
  /** Series id, e.g. "flow:bed-a.drain". */
  id: string;
  /** Readable name of the path. */
  where: string;
  /** State index the water leaves. */
  from: number;
  /** State index the water reaches. */
  to: number;
}

/** Inputs of a mode switch: which events fired, the state (changeable), and the event log. */
export interface SwitchInput {
  readonly ctx: ModelContext;
  /** 1 where the event fired this instant (global event numbering); all 0 after the first pass. */
  readonly fired: Uint8Array;
  /** The state; a component may move water instantly between water components. */
  readonly state: Float64Array;
  /** Appends a reported event. */
  readonly log: (event: RunEvent) => void;
}

/**
 * Whether a switch whose event function `g` is at `g` applies now: when g is below zero, or at
 * zero when its event `index` (global numbering) fired this instant.
 */
export function switchDue(fired: Uint8Array, index: number, g: number): boolean {
  return g < 0 || (g <= 0 && fired[index] === 1);
}

/**
 * A part of the system model: it contributes flows on its channels, event functions, and mode
 * switches. Switch conditions are strict inequalities unless the matching event fired, so two
 * opposite switches can never both apply at the same state.
 */
export interface ModelComponent {
  /** Number of event functions this component owns. */
  readonly eventCount: number;
  /** Index of its first event function in the model's numbering (set at assembly). */
  eventOffset: number;
  /** Writes its channel flows into ctx.flowM3PerS and any meter rates into `rates`. */
  computeFlows(ctx: ModelContext, rates: Float64Array): void;
  /** Writes its event functions into out[eventOffset …]. */
  eventValues(ctx: ModelContext, out: Float64Array): void;
  /** Applies the mode switches due at this instant; returns true when anything changed. */
  switchModes(input: SwitchInput): boolean;
}
