/**
 * `/api/systems/:id/calibrations`, `/api/calibrations/:cid/apply` and `/api/systems/:id/calibration`:
 * fits of the model's coefficients to a system's measurements (kept as history), and the
 * calibrated values applied to the system, which every later run uses.
 */
import { z } from 'zod';

/** What a calibration may fit: per measured bed k_p and the drain-loss multiplier; per pump the flow scale. */
export const CalibrationParameterKeySchema = z.enum([
  'primingCoefficient',
  'dischargeLossMultiplier',
  'flowScale',
]);
/** A calibrated coefficient. */
export type CalibrationParameterKey = z.infer<typeof CalibrationParameterKeySchema>;

/** `POST /api/systems/:id/calibrations` body. Answer: 201 `Calibration` (not yet applied unless `apply`). */
export const StartCalibrationRequestSchema = z.strictObject({
  measurementIds: z.array(z.uuid()).min(1, { error: 'Choose at least one measurement.' }).max(10),
  fit: z
    .strictObject({
      primingCoefficient: z.boolean().default(true),
      dischargeLossMultiplier: z.boolean().default(true),
      flowScale: z.boolean().default(false),
    })
    .default({ primingCoefficient: true, dischargeLossMultiplier: true, flowScale: false }),
  /** Keep the fitted values on the system straight away. */
  apply: z.boolean().default(false),
});
/** A calibration request as sent. */
export type StartCalibrationRequest = z.input<typeof StartCalibrationRequestSchema>;

/** One fitted coefficient of one bed or pump: the start, the fit, its standard error and bounds. */
export const CalibratedParameterSchema = z.object({
  key: CalibrationParameterKeySchema,
  target: z.string(),
  initial: z.number(),
  fitted: z.number(),
  standardError: z.number().nullable(),
  lower: z.number(),
  upper: z.number(),
});
/** One fitted coefficient. */
export type CalibratedParameter = z.infer<typeof CalibratedParameterSchema>;

/** One residual of the fit: a measured figure against the model before and after. */
export const CalibrationResidualSchema = z.object({
  measurementId: z.uuid(),
  bed: z.string(),
  metric: z.enum(['flood', 'drain', 'high', 'period', 'low']),
  unit: z.enum(['s', 'm']),
  measured: z.number(),
  sigma: z.number(),
  before: z.number().nullable(),
  after: z.number().nullable(),
  /** (after − measured) / sigma. */
  normalised: z.number().nullable(),
  /** False for figures shown but not fitted (the period repeats flood + drain; the low mark is geometry). */
  fitted: z.boolean(),
});
/** One residual. */
export type CalibrationResidual = z.infer<typeof CalibrationResidualSchema>;

/** How the fit went: status, χ² before and after, RMS of the normalised residuals, effort. */
export const CalibrationFitSchema = z.object({
  status: z.enum(['converged', 'max-iterations', 'time-limit', 'failed']),
  message: z.string(),
  iterations: z.number().int(),
  evaluations: z.number().int(),
  chiSquareBefore: z.number().nullable(),
  chiSquareAfter: z.number().nullable(),
  rmsNormalisedResidual: z.number().nullable(),
  degreesOfFreedom: z.number().int(),
  wallMs: z.number(),
  residuals: z.array(CalibrationResidualSchema),
});
/** How the fit went. */
export type CalibrationFit = z.infer<typeof CalibrationFitSchema>;

/** A calibration (history row). */
export const CalibrationSchema = z.object({
  id: z.uuid(),
  systemId: z.uuid(),
  measurementIds: z.array(z.uuid()),
  parameters: z.array(CalibratedParameterSchema),
  fit: CalibrationFitSchema,
  applied: z.boolean(),
  createdBy: z.uuid().nullable(),
  createdByName: z.string().nullable(),
  createdAt: z.iso.datetime({ offset: true }),
});
/** A calibration. */
export type Calibration = z.infer<typeof CalibrationSchema>;

/** `GET /api/systems/:id/calibrations`: newest first. */
export const CalibrationListSchema = z.object({ items: z.array(CalibrationSchema) });
/** The calibrations of a system. */
export type CalibrationList = z.infer<typeof CalibrationListSchema>;

/**
 * The calibrated values kept on a system (`systems.calibration`, `System.calibration`), applied
 * to every later run: per bed k_p and the drain-loss multiplier, per pump the flow scale, and
 * who applied them when.
 */
export const SystemCalibrationSchema = z.object({
  calibrationId: z.uuid(),
  beds: z.array(
    z.object({
      bed: z.string(),
      primingCoefficient: z.number().positive().optional(),
      dischargeLossMultiplier: z.number().positive().optional(),
    }),
  ),
  pumps: z.array(z.object({ pump: z.string(), flowScale: z.number().positive() })),
  appliedAt: z.iso.datetime({ offset: true }),
  appliedBy: z.object({ id: z.uuid(), name: z.string() }),
});
/** The calibrated values kept on a system. */
export type SystemCalibration = z.infer<typeof SystemCalibrationSchema>;

/** `GET /api/systems/:id/calibration`: the applied values, or null. */
export const CurrentCalibrationSchema = z.object({
  calibration: SystemCalibrationSchema.nullable(),
});
/** The applied values, or null. */
export type CurrentCalibration = z.infer<typeof CurrentCalibrationSchema>;
