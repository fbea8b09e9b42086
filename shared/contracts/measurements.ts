/**
 * `/api/systems/:id/measurements`, `/api/measurements/:mid` and `/api/systems/:id/calibrations`:
 * water levels logged on a real system (a CSV from a level sensor, or a stopwatch log of fill and
 * drain times), their comparison with a run, and the calibration of the model's coefficients.
 *
 * Uploads are `multipart/form-data` with a `file` part (the CSV, at most
 * `MEASUREMENT_MAX_FILE_BYTES`) and an `options` part (JSON, `CsvImportOptions`). Preview
 * (`POST .../measurements/preview`) parses without storing; create (`POST .../measurements`)
 * stores the original file and the parsed series. Levels are stored in metres above the floor of
 * the vessel they were measured in; times in seconds from the first sample, plus the absolute
 * start time when the file had absolute times.
 */
import { z } from 'zod';
import { quantitySchema } from '../scenario/quantity-schema';

/** Largest CSV accepted, bytes. */
export const MEASUREMENT_MAX_FILE_BYTES = 8 * 1024 * 1024;
/** Most data rows read from one CSV. */
export const MEASUREMENT_MAX_ROWS = 200_000;
/** At most this many rejected rows are kept with their reasons (the count is always kept). */
export const MEASUREMENT_MAX_REJECTED_KEPT = 500;

/**
 * How the time column is written. `iso`: ISO 8601 (`2024-05-31T14:03:22Z`, `2024-05-31 14:03`,
 * with or without an offset); `ymd` `2024/05/31 14:03:22`; `dmy` `31/05/2024 14:03:22` (also
 * `31.05.2024`, `31-05-2024`); `mdy` `05/31/2024 2:03:22 PM`; `epoch-s` / `epoch-ms` Unix time;
 * `elapsed-s` seconds since the logger started (or `h:mm:ss`). `auto` picks one from the values
 * and refuses to guess between `dmy` and `mdy` when every day is 12 or less.
 */
export const TimeFormatSchema = z.enum([
  'auto',
  'iso',
  'ymd',
  'dmy',
  'mdy',
  'epoch-s',
  'epoch-ms',
  'elapsed-s',
]);
/** A time format. */
export type TimeFormat = z.infer<typeof TimeFormatSchema>;

/** Length units a level or distance column may be in. */
export const LengthUnitSchema = z.enum(['m', 'cm', 'mm', 'in', 'ft']);
/** A length unit. */
export type LengthUnit = z.infer<typeof LengthUnitSchema>;

/** Pressure units a pressure column may be in. */
export const PressureUnitSchema = z.enum([
  'Pa',
  'kPa',
  'hPa',
  'mbar',
  'bar',
  'psi',
  'cmH2O',
  'inH2O',
]);
/** A pressure unit. */
export type PressureUnit = z.infer<typeof PressureUnitSchema>;

/** A column named by its header text (or its 1-based number, as text, when the file has no header). */
export const ColumnNameSchema = z.string().trim().min(1, { error: 'Choose a column.' }).max(200);

/** The level column is the water depth above the vessel floor (plus an optional sensor zero offset). */
export const LevelColumnSourceSchema = z.strictObject({
  kind: z.literal('level'),
  column: ColumnNameSchema,
  unit: LengthUnitSchema,
  /** Height of the sensor's zero above the vessel floor, added to every reading (default 0). */
  zeroOffset: quantitySchema('length', 'any').optional(),
});

/** A sensor above the water (ultrasonic, time of flight) reads its distance down to the surface. */
export const DistanceColumnSourceSchema = z.strictObject({
  kind: z.literal('distance'),
  column: ColumnNameSchema,
  unit: LengthUnitSchema,
  /** Height of the sensor's face above the vessel floor: level = mountingHeight − distance. */
  mountingHeight: quantitySchema('length', 'positive'),
});

/**
 * A pressure sensor at the bottom reads the water column: level = p_gauge / (ρ·g) + sensorHeight.
 * An `absolute` sensor needs the air pressure, from a barometric column or a constant.
 */
export const PressureColumnSourceSchema = z.strictObject({
  kind: z.literal('pressure'),
  column: ColumnNameSchema,
  unit: PressureUnitSchema,
  reference: z.enum(['gauge', 'absolute']),
  barometricColumn: ColumnNameSchema.optional(),
  /** Unit of the barometric column; the pressure column's unit when absent. */
  barometricUnit: PressureUnitSchema.optional(),
  /** A constant air pressure, in `unit`, when there is no barometric column. */
  barometricPressure: z.number().positive().optional(),
  /** Height of the sensing port above the vessel floor (default 0). */
  sensorHeight: quantitySchema('length', 'nonnegative').optional(),
  /** Water temperature, degrees Celsius, for the density (default 20). */
  waterTemperatureC: z.number().min(0).max(50).optional(),
});

/** Where the level comes from. */
export const LevelSourceSchema = z.discriminatedUnion('kind', [
  LevelColumnSourceSchema,
  DistanceColumnSourceSchema,
  PressureColumnSourceSchema,
]);
/** Where the level comes from. */
export type LevelSource = z.input<typeof LevelSourceSchema>;

/** How to read one CSV. Either `bedColumn` (a vessel id per row) or `bed` (one vessel for all rows). */
export const CsvImportOptionsSchema = z.strictObject({
  /** The measurement's name; the file name when absent. */
  name: z.string().trim().min(1).max(200).optional(),
  delimiter: z.enum(['auto', ',', ';', '\t', '|']).default('auto'),
  decimal: z.enum(['.', ',']).default('.'),
  /** Line number (from 1) of the header; absent = the first line that starts the table. */
  headerLine: z.number().int().min(1).max(1000).optional(),
  /** False when the file has no header: columns are then named "1", "2", ... */
  hasHeader: z.boolean().default(true),
  time: z.strictObject({
    column: ColumnNameSchema,
    format: TimeFormatSchema.default('auto'),
    /** IANA zone ("Europe/Lisbon"), "UTC" or an offset ("+02:00") for times written without one. */
    timeZone: z.string().trim().min(1).max(64).default('UTC'),
  }),
  level: LevelSourceSchema,
  /** A column holding the vessel id of each row. */
  bedColumn: ColumnNameSchema.optional(),
  /** The vessel every row was measured in (when there is no `bedColumn`). */
  bed: z.string().trim().min(1).max(100).optional(),
});
/** How to read one CSV, as sent. */
export type CsvImportOptionsInput = z.input<typeof CsvImportOptionsSchema>;
/** How to read one CSV, parsed (lengths in m). */
export type CsvImportOptions = z.output<typeof CsvImportOptionsSchema>;

/** One vessel's measured levels: `t_s` strictly increasing from the measurement's start. */
export const MeasuredBedSeriesSchema = z.object({
  bed: z.string(),
  t_s: z.array(z.number()),
  level_m: z.array(z.number()),
});
/** One vessel's measured levels. */
export type MeasuredBedSeries = z.infer<typeof MeasuredBedSeriesSchema>;

/** The parsed levels of a CSV: per vessel; `startTime` is the absolute time of t = 0, if known. */
export const MeasuredSeriesSchema = z.object({
  startTime: z.iso.datetime({ offset: true }).nullable(),
  beds: z.array(MeasuredBedSeriesSchema),
});
/** The parsed levels of a CSV. */
export type MeasuredSeries = z.infer<typeof MeasuredSeriesSchema>;

/** A data row that was not used, with its line number in the file and why. */
export const RejectedRowSchema = z.object({
  line: z.number().int(),
  reason: z.string(),
  raw: z.string(),
});
/** A rejected row. */
export type RejectedRow = z.infer<typeof RejectedRowSchema>;

/** A row as read: its time (ISO when absolute), seconds from the start, vessel and level. */
export const ParsedRowSchema = z.object({
  line: z.number().int(),
  time: z.string(),
  t_s: z.number(),
  bed: z.string(),
  level_m: z.number(),
});
/** A row as read. */
export type ParsedRow = z.infer<typeof ParsedRowSchema>;

/** Per vessel: sample count (cycles for a stopwatch log), span and level range (null when unknown). */
export const MeasuredBedOverviewSchema = z.object({
  bed: z.string(),
  samples: z.number().int(),
  durationS: z.number(),
  minLevel_m: z.number().nullable(),
  maxLevel_m: z.number().nullable(),
});
/** Per-vessel overview. */
export type MeasuredBedOverview = z.infer<typeof MeasuredBedOverviewSchema>;

/**
 * `POST /api/systems/:id/measurements/preview`: the columns, the first raw records, the options
 * used (the given ones, or guesses when `options` was absent), the detected time format, the first
 * parsed rows and the first rejected rows with their reasons. `problem` is set (and the parsed
 * parts empty) when these options cannot read the file at all.
 */
export const CsvPreviewSchema = z.object({
  columns: z.array(z.string()),
  headerLine: z.number().int().nullable(),
  delimiter: z.string(),
  rawRows: z.array(z.array(z.string())),
  options: z.record(z.string(), z.unknown()),
  timeFormat: TimeFormatSchema.nullable(),
  rows: z.array(ParsedRowSchema),
  acceptedCount: z.number().int(),
  rejected: z.array(RejectedRowSchema),
  rejectedCount: z.number().int(),
  beds: z.array(MeasuredBedOverviewSchema),
  problem: z.object({ code: z.string(), message: z.string() }).nullable(),
});
/** A preview. */
export type CsvPreview = z.infer<typeof CsvPreviewSchema>;

const STOPWATCH_READING = /^(?:(\d+):)?(\d{1,2}):(\d{2}(?:\.\d+)?)$/;

/** A stopwatch reading: "m:ss" or "h:mm:ss(.s)" as a stopwatch shows it, or a time with a unit ("250 s", "4.2 min"). */
export const StopwatchTimeSchema = z.preprocess(
  (value) => {
    if (typeof value !== 'string') return value;
    const m = STOPWATCH_READING.exec(value.trim());
    return m ? Number(m[1] ?? '0') * 3600 + Number(m[2]) * 60 + Number(m[3]) : value;
  },
  quantitySchema('time', 'positive'),
);

/** One observed cycle of a bed, timed by hand. Marks are levels above the bed floor. */
export const StopwatchEntrySchema = z.strictObject({
  bed: z.string().trim().min(1).max(100),
  /** From the siphon breaking (the bed starts to fill) to the siphon starting. */
  fillTime: StopwatchTimeSchema,
  /** From the siphon starting to it breaking. */
  drainTime: StopwatchTimeSchema,
  highMark: quantitySchema('length', 'nonnegative').optional(),
  lowMark: quantitySchema('length', 'nonnegative').optional(),
});
/** One observed cycle, parsed (s, m). */
export type StopwatchEntry = z.output<typeof StopwatchEntrySchema>;

/** `POST /api/systems/:id/measurements/stopwatch` body: one or more observed cycles. */
export const CreateStopwatchRequestSchema = z.strictObject({
  name: z.string().trim().min(1, { error: 'Give the log a name.' }).max(200),
  entries: z.array(StopwatchEntrySchema).min(1, { error: 'Enter at least one cycle.' }).max(500),
});
/** `POST .../measurements/stopwatch` body as sent. */
export type CreateStopwatchRequest = z.input<typeof CreateStopwatchRequestSchema>;

/** A stored measurement (without its series): what the list and the detail show. */
export const MeasurementSchema = z.object({
  id: z.uuid(),
  systemId: z.uuid(),
  kind: z.enum(['csv', 'stopwatch']),
  name: z.string(),
  originalFilename: z.string().nullable(),
  sizeBytes: z.number().int().nullable(),
  options: z.record(z.string(), z.unknown()).nullable(),
  beds: z.array(MeasuredBedOverviewSchema),
  startTime: z.iso.datetime({ offset: true }).nullable(),
  rejectedCount: z.number().int(),
  stopwatch: z
    .array(
      z.object({
        bed: z.string(),
        fillTime: z.number(),
        drainTime: z.number(),
        highMark: z.number().optional(),
        lowMark: z.number().optional(),
      }),
    )
    .nullable(),
  createdBy: z.uuid().nullable(),
  createdByName: z.string().nullable(),
  createdAt: z.iso.datetime({ offset: true }),
});
/** A stored measurement. */
export type Measurement = z.infer<typeof MeasurementSchema>;

/** `GET /api/systems/:id/measurements`: newest first. */
export const MeasurementListSchema = z.object({ items: z.array(MeasurementSchema) });
/** The measurements of a system. */
export type MeasurementList = z.infer<typeof MeasurementListSchema>;

/** `GET /api/measurements/:mid/series?maxPoints=`: the parsed levels (evenly thinned when long). */
export const MeasurementSeriesQuerySchema = z.object({
  maxPoints: z.coerce.number().int().min(2).max(1_000_000).optional(),
});

/** `GET /api/measurements/:mid/rejected`: every kept rejected row. */
export const RejectedListSchema = z.object({
  items: z.array(RejectedRowSchema),
  total: z.number().int(),
});

/** Cycle figures of one bed (s, m); null when not measured or no full cycle was seen. */
export const CycleFiguresSchema = z.object({
  cycles: z.number().int(),
  periodS: z.number().nullable(),
  floodS: z.number().nullable(),
  drainS: z.number().nullable(),
  highLevelM: z.number().nullable(),
  lowLevelM: z.number().nullable(),
});
/** Cycle figures of one bed. */
export type CycleFigures = z.infer<typeof CycleFiguresSchema>;

/** One compared figure: `difference` = simulated − measured, `relative` = difference / measured. */
export const ComparisonRowSchema = z.object({
  metric: z.enum(['period', 'flood', 'drain', 'high', 'low']),
  unit: z.enum(['s', 'm']),
  measured: z.number().nullable(),
  simulated: z.number().nullable(),
  difference: z.number().nullable(),
  relative: z.number().nullable(),
});
/** One compared figure. */
export type ComparisonRow = z.infer<typeof ComparisonRowSchema>;

/** `GET /api/measurements/:mid/compare?run=<runId>&bed=<vesselId>&maxPoints=`. */
export const CompareQuerySchema = z.object({
  run: z.uuid(),
  bed: z.string().min(1).max(100).optional(),
  maxPoints: z.coerce.number().int().min(50).max(20_000).default(2000),
});

/**
 * A measurement against a run for one bed. Measured times are shifted onto the run's clock by
 * `offsetS` (run time = measured time + offsetS) so that the first complete measured cycle starts
 * with the run's second cycle (its first steady one); the series are ready to overlay.
 */
export const MeasurementComparisonSchema = z.object({
  measurementId: z.uuid(),
  runId: z.uuid(),
  bed: z.string(),
  beds: z.array(z.string()),
  offsetS: z.number(),
  measured: CycleFiguresSchema,
  simulated: CycleFiguresSchema,
  rows: z.array(ComparisonRowSchema),
  measuredSeries: z.object({ t_s: z.array(z.number()), level_m: z.array(z.number()) }).nullable(),
  simulatedSeries: z.object({ t_s: z.array(z.number()), level_m: z.array(z.number()) }),
});
/** A measurement compared with a run. */
export type MeasurementComparison = z.infer<typeof MeasurementComparisonSchema>;

// Calibrations are their own contract; measurement pages use both, so they travel together.
export * from './calibrations';
