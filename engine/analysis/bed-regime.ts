import type { BedState } from '../results/run-result';

/**
 * What a bed did over a run, as an operating-window map shows it: `rim-overflow` when water
 * spilled over the bed's rim at any time (whatever else it did), else the bed's state from the
 * run summary (`cycling`, `spill-stall`, `siphon-lock`, `flooded` for a bed that reached flood
 * level without a full cycle or stall, `idle` for one that never did).
 */
export type BedRegime = BedState | 'rim-overflow';

/** The parts of a run result {@link bedRegime} reads (a stored run's parts fit too). */
export interface RegimeEvidence {
  summary: { beds: readonly { id: string; state: BedState }[] };
  events: readonly { kind: string; where: string }[];
}

/** The regime of bed `bedId` in a run; null when the run has no such bed. */
export function bedRegime(result: RegimeEvidence, bedId: string): BedRegime | null {
  const bed = result.summary.beds.find((b) => b.id === bedId);
  if (!bed) return null;
  const overflowed = result.events.some((e) => e.kind === 'rim-overflow' && e.where === bedId);
  return overflowed ? 'rim-overflow' : bed.state;
}
