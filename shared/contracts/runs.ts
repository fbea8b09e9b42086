/**
 * `/api/systems/:id/runs` and `/api/runs`: simulation runs on the server, their results, series,
 * downloads and comparison.
 *
 * Starting a run (`POST /api/systems/:id/runs`): a run whose simulated duration is at most
 * `RUN_SYNC_MAX_DURATION_S` (24 h) and that does not ask for `async: true` is answered when it
 * ends: 201 with the full `Run`. A longer run (or `async: true`) is answered at once: 202 with a
 * `RunStarted` and a `Location` header; poll `GET /api/runs/:id` (`status`, `progress` 0..1) until
 * `status` is no longer `queued` or `running`, or cancel with `POST /api/runs/:id/cancel`.
 */
import { z } from 'zod';
import { VerdictStatusSchema } from './systems';

/** Runs up to this simulated duration (s) are answered synchronously (201). */
export const RUN_SYNC_MAX_DURATION_S = 24 * 3600;

/**
 * `queued` → `running` → `completed` (the engine finished), `stopped` (the engine stopped early on
 * its own, e.g. a sample limit; partial result kept), `failed` (numerical failure, time limit or
 * internal error; `error` says why) or `cancelled` (someone cancelled; partial result kept).
 */
export const RunStatusSchema = z.enum([
  'queued',
  'running',
  'completed',
  'stopped',
  'failed',
  'cancelled',
]);
/** A run's status. */
export type RunStatus = z.infer<typeof RunStatusSchema>;

/** `POST /api/systems/:id/runs` body (optional). `duration` overrides the scenario's run.duration. */
export const StartRunRequestSchema = z.strictObject({
  /** Seconds, or a string with a time unit ("6 h"). */
  duration: z.union([z.number().positive(), z.string().min(1)]).optional(),
  /** Answer 202 at once even for a short run. */
  async: z.boolean().optional(),
});
/** `POST /api/systems/:id/runs` body. */
export type StartRunRequest = z.infer<typeof StartRunRequestSchema>;

const nullableNumber = z.number().nullable();

/**
 * Per-bed cycle statistics; means are null when no full cycle happened. Flood = fill start to
 * priming, drain = priming to break; levels are means over cycles, m above the bed floor.
 */
export const BedSummarySchema = z.object({
  id: z.string(),
  cycles: z.number(),
  periodMean_s: nullableNumber,
  periodMin_s: nullableNumber.optional(),
  periodMax_s: nullableNumber.optional(),
  floodMean_s: nullableNumber,
  drainMean_s: nullableNumber,
  highLevel_m: nullableNumber,
  lowLevel_m: nullableNumber,
  /** Share of the run spent at flood level (spilling or siphoning). */
  fractionFlooded: nullableNumber.optional(),
  state: z.enum(['cycling', 'spill-stall', 'siphon-lock', 'flooded', 'idle']),
});
/** Per-bed cycle statistics. */
export type BedSummary = z.infer<typeof BedSummarySchema>;

/** Per-vessel extremes and water lost (leaks, overflows to "out"). */
export const VesselSummarySchema = z.object({
  id: z.string(),
  minLevel_m: nullableNumber,
  minLevelAt_s: nullableNumber,
  maxLevel_m: nullableNumber,
  maxLevelAt_s: nullableNumber.optional(),
  lost_m3: nullableNumber,
});
/** Per-vessel extremes. */
export type VesselSummary = z.infer<typeof VesselSummarySchema>;

/** Per-pump mean flow, time run dry and energy (from the rated power when given, else water power). */
export const PumpSummarySchema = z.object({
  id: z.string(),
  meanFlow_m3s: nullableNumber,
  dry_s: nullableNumber,
  energy_J: nullableNumber,
  energyBasis: z.enum(['rated-power', 'water-power']).optional(),
  energyPerDay_J: nullableNumber.optional(),
});
/** Per-pump figures. */
export type PumpSummary = z.infer<typeof PumpSummarySchema>;

/** The engine's summary of a run. */
export const RunSummarySchema = z.object({
  beds: z.array(BedSummarySchema),
  vessels: z.array(VesselSummarySchema),
  pumps: z.array(PumpSummarySchema),
});
/** The engine's summary of a run. */
export type RunSummary = z.infer<typeof RunSummarySchema>;

/** Something that happened at `t_s` in `where` (a vessel, bed or pump id); `values` in SI. */
export const RunEventSchema = z.object({
  t_s: z.number(),
  kind: z.string(),
  where: z.string(),
  detail: z.string(),
  values: z.record(z.string(), z.number().nullable()).optional(),
});
/** One event. */
export type RunEvent = z.infer<typeof RunEventSchema>;

/** One check with its number, its limit and the published source or practice behind the limit. */
export const VerdictSchema = z.object({
  check: z.string(),
  status: VerdictStatusSchema,
  value: z.union([z.number(), z.string()]).nullable(),
  limit: z.union([z.number(), z.string()]).nullable(),
  source: z.string(),
});
/** One verdict. */
export type Verdict = z.infer<typeof VerdictSchema>;

/** Integrator statistics, the simulated time reached and the server's wall time. */
export const RunStatsSchema = z.object({
  steps: z.number(),
  rejected: z.number(),
  rhsEvaluations: z.number(),
  events: z.number(),
  wall_ms: z.number(),
  simulated_s: z.number().optional(),
  /** The sample cap the server gave the engine (needed to reproduce the run's series). */
  maxSamples: z.number().int().optional(),
});
/** Integrator statistics. */
export type RunStats = z.infer<typeof RunStatsSchema>;

/** The most events `GET /api/runs/:id` carries (a month-long run can store tens of thousands). */
export const RUN_EVENTS_SHOWN = 5000;

/** `GET /api/runs/:id` and the 201 answer of a synchronous run. Result fields are null until it ends. */
export const RunSchema = z.object({
  id: z.uuid(),
  systemId: z.uuid(),
  systemVersion: z.number().int(),
  status: RunStatusSchema,
  /** 0..1: 0 while queued, the engine's progress while running, 1 once ended. */
  progress: z.number().min(0).max(1),
  durationS: z.number(),
  /** Worst verdict status; null before the run ends or when it has no verdicts. */
  verdict: VerdictStatusSchema.nullable(),
  error: z.string().nullable(),
  summary: RunSummarySchema.nullable(),
  verdicts: z.array(VerdictSchema).nullable(),
  /** The first RUN_EVENTS_SHOWN events in time order; `result.json` has all `eventCount` of them. */
  events: z.array(RunEventSchema).nullable(),
  /** How many events the run stored. */
  eventCount: z.number().int().nonnegative(),
  stats: RunStatsSchema.nullable(),
  massBalanceError: z.number().nullable(),
  /** Number of stored samples per channel (0 when no series). */
  sampleCount: z.number().int().nonnegative(),
  createdBy: z.uuid().nullable(),
  createdAt: z.iso.datetime({ offset: true }),
  finishedAt: z.iso.datetime({ offset: true }).nullable(),
});
/** A run. */
export type Run = z.infer<typeof RunSchema>;

/** The 202 answer of an asynchronous start; poll `GET /api/runs/:id`. */
export const RunStartedSchema = z.object({
  id: z.uuid(),
  status: RunStatusSchema,
  progress: z.number().min(0).max(1),
});
/** The 202 answer of an asynchronous start. */
export type RunStarted = z.infer<typeof RunStartedSchema>;

/** `GET /api/runs/:id` query: `snapshot=1` adds the normalised scenario the run used. */
export const RunGetQuerySchema = z.object({ snapshot: z.enum(['0', '1']).optional() });

/** `GET /api/runs/:id?snapshot=1` adds the normalised scenario the run used (all SI, defaults filled). */
export const RunWithSnapshotSchema = RunSchema.extend({
  scenario: z.record(z.string(), z.unknown()),
});
/** A run with its normalised scenario snapshot. */
export type RunWithSnapshot = z.infer<typeof RunWithSnapshotSchema>;

/** Sort keys of `GET /api/systems/:id/runs`; a leading `-` sorts descending. */
export const RunSortSchema = z.enum([
  'createdAt',
  '-createdAt',
  'durationS',
  '-durationS',
  'verdict',
  '-verdict',
  'status',
  '-status',
]);

/** `GET /api/systems/:id/runs` query: sort (default `-createdAt`), filters, page (from 1), pageSize. */
export const RunListQuerySchema = z.object({
  sort: RunSortSchema.default('-createdAt'),
  status: RunStatusSchema.optional(),
  verdict: VerdictStatusSchema.optional(),
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(20),
});
/** `GET /api/systems/:id/runs` query. */
export type RunListQuery = z.infer<typeof RunListQuerySchema>;

/** One row of the runs table (no result bodies). */
export const RunListItemSchema = z.object({
  id: z.uuid(),
  status: RunStatusSchema,
  progress: z.number().min(0).max(1),
  durationS: z.number(),
  systemVersion: z.number().int(),
  verdict: VerdictStatusSchema.nullable(),
  error: z.string().nullable(),
  createdBy: z.uuid().nullable(),
  createdByName: z.string().nullable(),
  createdAt: z.iso.datetime({ offset: true }),
  finishedAt: z.iso.datetime({ offset: true }).nullable(),
});
/** One row of the runs table. */
export type RunListItem = z.infer<typeof RunListItemSchema>;

/** `GET /api/systems/:id/runs`. */
export const RunListSchema = z.object({
  items: z.array(RunListItemSchema),
  total: z.number().int().nonnegative(),
  page: z.number().int().min(1),
  pageSize: z.number().int().min(1),
});
/** A page of runs. */
export type RunList = z.infer<typeof RunListSchema>;

/** One series channel, e.g. `level:tank` (m above the vessel floor), `flow:pump` (m³/s). */
export const SeriesChannelSchema = z.object({
  id: z.string(),
  kind: z.enum(['level', 'volume', 'flow', 'head', 'power', 'phase']),
  where: z.string(),
  unit: z.enum(['m', 'm3', 'm3/s', 'W', '']),
  values: z.array(z.number().nullable()),
});
/** One series channel. */
export type SeriesChannel = z.infer<typeof SeriesChannelSchema>;

/**
 * `GET /api/runs/:id/series` query: `channels` (comma-separated ids; default all) and
 * `maxPoints` (keep at most this many samples by even striding, first and last always kept).
 */
export const RunSeriesQuerySchema = z.object({
  channels: z.string().optional(),
  maxPoints: z.coerce.number().int().min(2).max(1_000_000).optional(),
});
/** `GET /api/runs/:id/series` query. */
export type RunSeriesQuery = z.infer<typeof RunSeriesQuerySchema>;

/** `GET /api/runs/:id/series`: sample times and the channels (phase values: 0 filling … 4 break). */
export const RunSeriesSchema = z.object({
  t_s: z.array(z.number()),
  channels: z.array(SeriesChannelSchema),
});
/** A run's time series. */
export type RunSeries = z.infer<typeof RunSeriesSchema>;

/** `GET /api/runs/compare?a=<runId>&b=<runId>` query (both runs readable by the user). */
export const RunCompareQuerySchema = z.object({ a: z.uuid(), b: z.uuid() });

/** One compared number; `delta` = b − a, null when either side is missing. */
export const CompareRowSchema = z.object({
  where: z.string(),
  metric: z.string(),
  unit: z.string(),
  a: z.number().nullable(),
  b: z.number().nullable(),
  delta: z.number().nullable(),
  changed: z.boolean(),
});
/** One compared number. */
export type CompareRow = z.infer<typeof CompareRowSchema>;

/** A verdict in either run: its status in each (null when absent in one). */
export const VerdictChangeSchema = z.object({
  check: z.string(),
  a: VerdictStatusSchema.nullable(),
  b: VerdictStatusSchema.nullable(),
  changed: z.boolean(),
});
/** A verdict in either run. */
export type VerdictChange = z.infer<typeof VerdictChangeSchema>;

/** Which run is which in a comparison. */
export const CompareSideSchema = z.object({
  id: z.uuid(),
  systemId: z.uuid(),
  systemName: z.string(),
  status: RunStatusSchema,
  durationS: z.number(),
  verdict: VerdictStatusSchema.nullable(),
  createdAt: z.iso.datetime({ offset: true }),
});

/**
 * `GET /api/runs/compare`: per bed (cycles, period, flood, drain, high/low level, state as text in
 * `states`), per vessel (min/max level, lost water), per pump (mean flow, dry time, energy) and
 * per verdict check.
 */
export const RunComparisonSchema = z.object({
  a: CompareSideSchema,
  b: CompareSideSchema,
  beds: z.array(CompareRowSchema),
  bedStates: z.array(
    z.object({
      where: z.string(),
      a: z.string().nullable(),
      b: z.string().nullable(),
      changed: z.boolean(),
    }),
  ),
  vessels: z.array(CompareRowSchema),
  pumps: z.array(CompareRowSchema),
  verdicts: z.array(VerdictChangeSchema),
});
/** A comparison of two runs. */
export type RunComparison = z.infer<typeof RunComparisonSchema>;

/**
 * `GET /api/runs/:id/result.json` (a download): the run, the normalised scenario it ran (all SI,
 * defaults filled, `run.duration` = the duration used) and its whole result including the series.
 */
export const RunResultFileSchema = z.object({
  format: z.literal('tidewright-run/1'),
  run: RunSchema.pick({
    id: true,
    systemId: true,
    systemVersion: true,
    status: true,
    durationS: true,
    verdict: true,
    error: true,
    createdAt: true,
    finishedAt: true,
  }),
  scenario: z.record(z.string(), z.unknown()),
  summary: RunSummarySchema.nullable(),
  events: z.array(RunEventSchema).nullable(),
  verdicts: z.array(VerdictSchema).nullable(),
  massBalanceError: z.number().nullable(),
  stats: RunStatsSchema.nullable(),
  series: RunSeriesSchema.nullable(),
});
/** The downloadable result of a run. */
export type RunResultFile = z.infer<typeof RunResultFileSchema>;
