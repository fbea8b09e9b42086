/**
 * What the cross-section reads from a run, as plain structural types: both the stored run's
 * contract (`RunSeries`, `RunEvent`) and the engine's in-browser result (`SimulationResult`) fit
 * them, so a lesson that simulates in a worker can hand its result straight in.
 */

/** One channel of a series, e.g. `level:tank` (m above the floor), `flow:bed-a.drain` (m³/s). */
export interface CrossSectionChannel {
  readonly id: string;
  readonly values: readonly (number | null)[];
}

/** Sample times (s, ascending; a time may repeat at an event) and the channels sampled at them. */
export interface CrossSectionSeries {
  readonly t_s: readonly number[];
  readonly channels: readonly CrossSectionChannel[];
}

/** Something that happened at `t_s` in `where`, with its sentence and numbers (SI). */
export interface CrossSectionEvent {
  readonly t_s: number;
  readonly kind: string;
  readonly where: string;
  readonly detail: string;
  readonly values?: Readonly<Record<string, number | null>> | undefined;
}
