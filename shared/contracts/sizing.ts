/**
 * Sizing checks and the build sheet of a system: `GET /api/systems/:id/sizing` (designer checks,
 * each a verdict with its value, limit and source, from what-if runs and mass balances) and
 * `GET /api/systems/:id/build-sheet` (cut lengths, parts and the pump's duty point).
 */
import { z } from 'zod';
import { VerdictStatusSchema } from './systems';

/** Units a check's value and limit are given in (SI, or a plain ratio). */
export const CheckUnitSchema = z.enum(['m', 'm3', 's', 'per-hour', 'ratio', 'count', 'kg', 'Pa']);

/**
 * One check: a stable `check` name, what it is about (`subject`: a vessel, bed or pump id, or
 * `system`), a plain title, the verdict, the measured `value` against the `limit` in `unit`, where
 * the limit comes from, and a sentence with the numbers.
 */
export const SizingCheckSchema = z.object({
  check: z.string(),
  subject: z.string(),
  title: z.string(),
  status: VerdictStatusSchema,
  value: z.number().nullable(),
  limit: z.number().nullable(),
  unit: CheckUnitSchema,
  source: z.string(),
  detail: z.string(),
});
/** One sizing check. */
export type SizingCheck = z.infer<typeof SizingCheckSchema>;

/** Wet media and water on a bed's supports, kg (and the force, N, and pressure on its footprint, Pa). */
export const BedLoadSchema = z.object({
  bedId: z.string(),
  footprintM2: z.number(),
  mediaVolumeM3: z.number(),
  wetMediaKg: z.number(),
  waterAtFloodKg: z.number(),
  waterAtRimKg: z.number(),
  totalAtFloodKg: z.number(),
  totalAtRimKg: z.number(),
  loadAtRimN: z.number(),
  pressureAtRimPa: z.number(),
  densitySource: z.string(),
});
/** One bed's load. */
export type BedLoad = z.infer<typeof BedLoadSchema>;

/** The what-if runs behind the checks: when the power was cut and for how long, the leak size, s and m. */
export const SizingAssumptionsSchema = z.object({
  coldStartDurationS: z.number(),
  powerCutAtS: z.number(),
  powerCutDurationS: z.number(),
  leakDiameterM: z.number(),
  leakStartS: z.number(),
});

/** `GET /api/systems/:id/sizing` query: the power cut's length and the leak's diameter (numbers SI, or strings with units). */
export const SizingQuerySchema = z.object({
  cutDuration: z.string().min(1).max(40).optional(),
  leakDiameter: z.string().min(1).max(40).optional(),
});

/** `GET /api/systems/:id/sizing`. */
export const SizingReportSchema = z.object({
  systemId: z.string(),
  checks: z.array(SizingCheckSchema),
  loads: z.array(BedLoadSchema),
  assumptions: SizingAssumptionsSchema,
});
/** The sizing report of a system. */
export type SizingReport = z.infer<typeof SizingReportSchema>;

/** A pipe size in words ("1 in Schedule 40") or null for a size that matches no listed pipe. */
const NominalSizeSchema = z.string().nullable();

/** One line of a parts list. */
export const PartLineSchema = z.object({
  item: z.string(),
  quantity: z.number().int(),
  size: NominalSizeSchema,
  /** Cut length, m, for pipe. */
  lengthM: z.number().nullable(),
  note: z.string().optional(),
});
/** One line of a parts list. */
export type PartLine = z.infer<typeof PartLineSchema>;

/**
 * The cut list of one bed's drain, m: the standpipe's cut length = its height above the bed floor
 * + the depth it sits into the bulkhead fitting; the bell's length (standing on the floor with
 * slots, or on spacers); slots or the spacer gap; the media guard; and the parts.
 */
export const BedCutListSchema = z.object({
  bedId: z.string(),
  drainType: z.enum(['bell-siphon', 'standpipe']),
  standpipe: z.object({
    innerDiameterM: z.number(),
    outerDiameterM: z.number(),
    size: NominalSizeSchema,
    heightAboveFloorM: z.number(),
    fittingDepthM: z.number(),
    fittingDepthSource: z.string(),
    cutLengthM: z.number(),
  }),
  bell: z
    .object({
      innerDiameterM: z.number(),
      size: NominalSizeSchema,
      lengthM: z.number(),
      capGapM: z.number(),
      standsOn: z.enum(['slots', 'spacers']),
      intakeHeightM: z.number(),
      slotCount: z.number().int().nullable(),
      slotWidthM: z.number().nullable(),
      snorkelHeightM: z.number().nullable(),
    })
    .nullable(),
  guard: z
    .object({ diameterM: z.number(), size: NominalSizeSchema, lengthM: z.number() })
    .nullable(),
  weepHoleDiameterM: z.number().nullable(),
  parts: z.array(PartLineSchema),
});
/** One bed's cut list. */
export type BedCutList = z.infer<typeof BedCutListSchema>;

/** A pump's duty point at the starting levels on its curve (flow m³/s, head m). */
export const PumpDutySchema = z.object({
  pumpId: z.string(),
  flowM3PerS: z.number(),
  headM: z.number(),
  dry: z.boolean(),
  curve: z.array(z.object({ flowM3PerS: z.number(), headM: z.number() })),
  outlets: z.array(z.object({ to: z.string(), flowM3PerS: z.number() })),
});
/** A pump's duty point. */
export type PumpDuty = z.infer<typeof PumpDutySchema>;

/** `GET /api/systems/:id/build-sheet` query: the bulkhead fitting depth for every standpipe (string with a unit). */
export const BuildSheetQuerySchema = z.object({
  fittingDepth: z.string().min(1).max(40).optional(),
});

/** `GET /api/systems/:id/build-sheet`. */
export const BuildSheetSchema = z.object({
  systemId: z.string(),
  name: z.string(),
  beds: z.array(BedCutListSchema),
  pumps: z.array(PumpDutySchema),
});
/** A system's build sheet. */
export type BuildSheet = z.infer<typeof BuildSheetSchema>;
