/** Something that happened during a run, with the numbers that explain it. */
export interface RunEvent {
  /** Time, s. */
  t_s: number;
  /**
   * One of spill-start, spill-end, primed, siphon-break, spill-stall, siphon-lock, rim-overflow,
   * overflow-start, overflow-end, below-min-level, pump-dry, pump-restart, pump-off, pump-on,
   * leak-start, back-siphon-start, back-siphon-end, float-switch.
   */
  kind: string;
  /** Vessel, bed or pump id. */
  where: string;
  /** A sentence with the numbers. */
  detail: string;
  /** The same numbers, SI, for programs. */
  values?: Record<string, number>;
}

/** A bed's regime over the run. */
export type BedState = 'cycling' | 'spill-stall' | 'siphon-lock' | 'flooded' | 'idle';

/** Per-bed cycle statistics; means are null when no full cycle happened. */
export interface BedSummary {
  id: string;
  cycles: number;
  periodMean_s: number | null;
  periodMin_s: number | null;
  periodMax_s: number | null;
  /** Fill start (previous break) to priming. */
  floodMean_s: number | null;
  /** Priming to break. */
  drainMean_s: number | null;
  /** Mean over cycles of the highest level, m above the bed floor. */
  highLevel_m: number | null;
  /** Mean over cycles of the lowest level, m above the bed floor. */
  lowLevel_m: number | null;
  /** Share of the run spent at flood level (spilling or siphoning). */
  fractionFlooded: number;
  state: BedState;
}

/** Per-vessel extremes and the water lost from it (rim, overflow to "out", leaks). */
export interface VesselSummary {
  id: string;
  minLevel_m: number;
  minLevelAt_s: number;
  maxLevel_m: number;
  maxLevelAt_s: number;
  lost_m3: number;
}

/** Per-pump figures. */
export interface PumpSummary {
  id: string;
  meanFlow_m3s: number;
  /** Time spent dry (wanted to run, source below its intake), s. */
  dry_s: number;
  /** Energy, J: from the rated power when given, else the water power ρ·g·Q·H. */
  energy_J: number;
  energyBasis: 'rated-power' | 'water-power';
  /** Energy scaled to one day, J. */
  energyPerDay_J: number;
}

/** One design check. */
export interface Verdict {
  check: string;
  status: 'ok' | 'warning' | 'fails';
  value: number | string | null;
  limit: number | string | null;
  /** A published source, or "common practice". */
  source: string;
}

/** One series channel on the output grid. */
export interface SeriesChannel {
  /** e.g. "level:tank". */
  id: string;
  kind: 'level' | 'volume' | 'flow' | 'head' | 'power' | 'phase';
  where: string;
  unit: 'm' | 'm3' | 'm3/s' | 'W' | '';
  values: number[];
}

/** Integrator statistics; wall_ms is filled by the caller (the engine has no clock). */
export interface RunStats {
  steps: number;
  rejected: number;
  rhsEvaluations: number;
  events: number;
  wall_ms: number;
  /** Simulated time reached, s. */
  simulated_s: number;
  /** Events left out of `events` to keep a capped run's memory flat (0 without maxSamples). */
  eventsOmitted: number;
}

/** Everything a run returns. */
export interface SimulationResult {
  summary: { beds: BedSummary[]; vessels: VesselSummary[]; pumps: PumpSummary[] };
  events: RunEvent[];
  verdicts: Verdict[];
  /** |water now + water lost − water at start| / water at start (or total capacity when empty). */
  massBalanceError: number;
  stats: RunStats;
  series: { t_s: number[]; channels: SeriesChannel[] };
}

/** Options of {@link simulate}. */
export interface SimulateOptions {
  /** Overrides the scenario's run duration, s. */
  durationS?: number;
  /** Overrides the scenario's output interval, s. */
  outputIntervalS?: number;
  /**
   * Caps the series length (the grid is widened and event samples are left out to fit) and the
   * event list (at most this many, always including the first of each kind at each place), so
   * memory stays flat with run length. Cycle statistics still count every cycle.
   */
  maxSamples?: number;
  /** Receives the fraction of simulated time done (0–1), at most once per percent. */
  onProgress?: (fraction: number) => void;
  /** Polled once per step; returning true stops the run with the partial result. */
  shouldStop?: () => boolean;
  /**
   * 'tabulated' (default): pump operating points and full-bore drain flows are solved exactly at
   * the nodes of lazily built C¹ tables and interpolated in between; 'exact': solved at every
   * right-hand-side evaluation (much slower; for verification).
   */
  hydraulics?: 'tabulated' | 'exact';
}

/** A tagged outcome: a numerical failure is a value, not an exception. */
export interface SimulationOutcome {
  status: 'completed' | 'stopped' | 'failed';
  reason?: string;
  result: SimulationResult;
}
