/**
 * The operating window: `/api/systems/:id/sweeps` and `/api/sweeps/:id` (a grid of runs over one or
 * two design parameters, run on the server), and `/api/systems/:id/inflow-window` (the inflows over
 * which each bell-siphon bed cycles, solved from its flow balance).
 *
 * Starting a sweep answers 202 at once with the sweep; poll `GET /api/sweeps/:id?cells=0` for
 * `cellsDone` / `progress` until `status` is no longer `queued` or `running`, then read the cells
 * with `GET /api/sweeps/:id`. `POST /api/sweeps/:id/cell-runs` stores a full run of one
 * cell's scenario and answers its id, so the map can open it.
 */
import { z } from 'zod';
import { VerdictStatusSchema } from './systems';

/** Most cells in one sweep (50 × 50). */
export const SWEEP_MAX_CELLS = 2500;
/** Most steps along one axis. */
export const SWEEP_MAX_STEPS = 50;
/** Longest simulated time of one cell, s (24 h). */
export const SWEEP_MAX_DURATION_S = 24 * 3600;
/** Simulated time of each cell when the request names none, s (2 h). */
export const SWEEP_DEFAULT_DURATION_S = 2 * 3600;

/**
 * What an axis varies. `pump-flow-scale`: the pump curve's flows times a factor (a stronger or
 * weaker pump); `valve-opening`: the open fraction 0–1 of one outlet's valve; `standpipe-height`
 * and `intake-height` (the bell's slot top, i.e. the break level): m above the bed floor;
 * `standpipe-diameter`: the bore, m (the wall keeps its thickness); `drain-diameter`: the drain
 * pipe's bore, m; `vessel-volume`: a tank's or sump's volume to its rim, m³ (its plan is scaled,
 * its height kept).
 */
export const SweepParameterSchema = z.enum([
  'pump-flow-scale',
  'valve-opening',
  'standpipe-height',
  'intake-height',
  'standpipe-diameter',
  'drain-diameter',
  'vessel-volume',
]);
/** A sweep parameter. */
export type SweepParameter = z.infer<typeof SweepParameterSchema>;

/** The quantity each parameter is measured in (for reading unit strings and showing values). */
export const SWEEP_PARAMETER_DIMENSIONS: Readonly<
  Record<SweepParameter, 'dimensionless' | 'length' | 'diameter' | 'volume'>
> = {
  'pump-flow-scale': 'dimensionless',
  'valve-opening': 'dimensionless',
  'standpipe-height': 'length',
  'intake-height': 'length',
  'standpipe-diameter': 'diameter',
  'drain-diameter': 'diameter',
  'vessel-volume': 'volume',
};

/** A number in SI units, or a string with a unit ("120 mm", "400 L"). */
const QuantityInputSchema = z.union([z.number().finite(), z.string().min(1).max(40)]);

/**
 * One axis of a sweep request: the parameter, the part it belongs to (`target`: a pump id for the
 * pump parameters, a bed id for the drain parameters, a tank or sump id for `vessel-volume`;
 * `outlet` the outlet index for `valve-opening`), and `steps` evenly spaced values from `from` to
 * `to`, both ends included.
 */
export const SweepAxisRequestSchema = z.strictObject({
  parameter: SweepParameterSchema,
  target: z.string().min(1).max(100),
  outlet: z.number().int().min(0).max(100).optional(),
  from: QuantityInputSchema,
  to: QuantityInputSchema,
  steps: z.number().int().min(2).max(SWEEP_MAX_STEPS),
});
/** One axis of a sweep request. */
export type SweepAxisRequest = z.infer<typeof SweepAxisRequestSchema>;

/**
 * `POST /api/systems/:id/sweeps` body: one or two axes; the bed whose regime the map shows (the
 * first bed when absent); each cell's simulated duration (2 h when absent).
 */
export const StartSweepRequestSchema = z.strictObject({
  axes: z.array(SweepAxisRequestSchema).min(1).max(2),
  bedId: z.string().min(1).max(100).optional(),
  duration: QuantityInputSchema.optional(),
});
/** `POST /api/systems/:id/sweeps` body. */
export type StartSweepRequest = z.infer<typeof StartSweepRequestSchema>;

/** An axis as stored: SI values, the value the system has now, and a label for charts. */
export const SweepAxisSchema = z.object({
  parameter: SweepParameterSchema,
  target: z.string(),
  outlet: z.number().int().optional(),
  from: z.number(),
  to: z.number(),
  steps: z.number().int(),
  /** The value in the system's own scenario (the current design), SI. */
  current: z.number().nullable(),
  /** E.g. "Standpipe height of bed-north". */
  label: z.string(),
});
/** A stored axis. */
export type SweepAxis = z.infer<typeof SweepAxisSchema>;

/** What a sweep varies and how each cell runs. */
export const SweepParametersSchema = z.object({
  axes: z.array(SweepAxisSchema).min(1).max(2),
  bedId: z.string(),
  durationS: z.number().positive(),
});
/** What a sweep varies. */
export type SweepParameters = z.infer<typeof SweepParametersSchema>;

/**
 * What the mapped bed did in one cell: the run's bed states plus `rim-overflow` (water spilled
 * over the bed's rim), `invalid` (the values make an impossible geometry, e.g. an intake above the
 * standpipe; `error` says which) and `failed` (the engine could not finish; `error` says why).
 */
export const CellRegimeSchema = z.enum([
  'cycling',
  'spill-stall',
  'siphon-lock',
  'rim-overflow',
  'flooded',
  'idle',
  'invalid',
  'failed',
]);
/** A cell's regime. */
export type CellRegime = z.infer<typeof CellRegimeSchema>;

/**
 * One cell: `index` = i + steps₀·j (i along the first axis, j along the second); cycle figures
 * of the mapped bed (s; null without a full cycle); its steady inflow from the pumps at the starting
 * levels (m³/s); the worst verdict of the run; `runId` once a full run of the cell was stored.
 */
export const SweepCellSchema = z.object({
  index: z.number().int().min(0),
  regime: CellRegimeSchema,
  cycles: z.number().int().nullable(),
  periodS: z.number().nullable(),
  floodS: z.number().nullable(),
  drainS: z.number().nullable(),
  inflowM3PerS: z.number().nullable(),
  verdict: VerdictStatusSchema.nullable(),
  error: z.string().optional(),
  runId: z.string().optional(),
});
/** One cell of a sweep. */
export type SweepCell = z.infer<typeof SweepCellSchema>;

/** `queued` → `running` → `completed`, `cancelled` (cells done so far kept) or `failed` (`error`). */
export const SweepStatusSchema = z.enum(['queued', 'running', 'completed', 'cancelled', 'failed']);
/** A sweep's status. */
export type SweepStatus = z.infer<typeof SweepStatusSchema>;

/** A sweep; `cells` (sorted by index) is left out of lists and of `?cells=0` reads. */
export const SweepSchema = z.object({
  id: z.string(),
  systemId: z.string(),
  status: SweepStatusSchema,
  parameters: SweepParametersSchema,
  cellsTotal: z.number().int(),
  cellsDone: z.number().int(),
  /** cellsDone / cellsTotal. */
  progress: z.number().min(0).max(1),
  error: z.string().nullable(),
  createdAt: z.string(),
  finishedAt: z.string().nullable(),
  cells: z.array(SweepCellSchema).optional(),
});
/** A sweep. */
export type Sweep = z.infer<typeof SweepSchema>;

/** `GET /api/systems/:id/sweeps`: newest first, without cells. */
export const SweepListSchema = z.object({ items: z.array(SweepSchema) });
/** A list of sweeps. */
export type SweepList = z.infer<typeof SweepListSchema>;

/** `GET /api/sweeps/:id` query: `cells=0` leaves the cells out (for polling progress). */
export const SweepGetQuerySchema = z.object({ cells: z.enum(['0', '1']).optional() });

/** `POST /api/sweeps/:id/cell-runs` body: the cell to open as a full run. */
export const CellRunRequestSchema = z.strictObject({
  index: z
    .number()
    .int()
    .min(0)
    .max(SWEEP_MAX_CELLS - 1),
});
/** `POST /api/sweeps/:id/cell-runs` body. */
export type CellRunRequest = z.infer<typeof CellRunRequestSchema>;

/** `POST /api/sweeps/:id/cell-runs` answer: the stored run of that cell. */
export const CellRunSchema = z.object({ runId: z.string() });
/** The stored run of a cell. */
export type CellRun = z.infer<typeof CellRunSchema>;

/** The regime a bed settles into at a steady inflow (from the flow balance). */
export const InflowRegimeSchema = z.enum([
  'idle',
  'spill-stall',
  'cycling',
  'siphon-lock',
  'rim-overflow',
]);

/**
 * One bell-siphon bed's inflow window, m³/s: it cycles for priming < inflow < breaking (the
 * `cyclingRange`, null when empty); above `rimOverflowInflowM3PerS` it spills over its rim.
 * `inflowM3PerS` is what the pumps deliver to it at the starting levels; `regime` what that gives.
 */
export const BedInflowWindowSchema = z.object({
  bedId: z.string(),
  primingInflowM3PerS: z.number(),
  breakingInflowM3PerS: z.number(),
  spillAtRimM3PerS: z.number(),
  siphonAtRimM3PerS: z.number(),
  rimOverflowInflowM3PerS: z.number(),
  cyclingRange: z.object({ lowM3PerS: z.number(), highM3PerS: z.number() }).nullable(),
  inflowM3PerS: z.number(),
  regime: InflowRegimeSchema,
  tailWaterM: z.number(),
});
/** One bed's inflow window. */
export type BedInflowWindow = z.infer<typeof BedInflowWindowSchema>;

/** `GET /api/systems/:id/inflow-window`: every bell-siphon bed's window. */
export const InflowWindowsSchema = z.object({ beds: z.array(BedInflowWindowSchema) });
/** Every bed's inflow window. */
export type InflowWindows = z.infer<typeof InflowWindowsSchema>;
