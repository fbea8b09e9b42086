import { z } from 'zod';
import { DischargeCoefficientSchema, PipeInputSchema } from './pipe-input-schema';
import { quantitySchema } from './quantity-schema';

const length = quantitySchema('length', 'nonnegative');
const diameter = quantitySchema('diameter');

/** Plan shape of a vessel: a box, an upright cylinder, or a table of level → plan area. */
export const ShapeInputSchema = z.discriminatedUnion('type', [
  z.strictObject({
    type: z.literal('box'),
    length: quantitySchema('length'),
    width: quantitySchema('length'),
  }),
  z.strictObject({ type: z.literal('cylinder'), diameter: quantitySchema('length') }),
  z.strictObject({
    type: z.literal('table'),
    points: z
      .array(z.strictObject({ level: length, area: quantitySchema('area') }))
      .min(2, { error: 'A level-to-area table needs at least two points.' }),
  }),
]);

/** An opening in a vessel's wall; `elevation` is above the common datum, `to` a vessel id or "out". */
export const OverflowInputSchema = z.strictObject({
  elevation: quantitySchema('length', 'any'),
  diameter,
  to: z.string().min(1),
  dischargeCoefficient: DischargeCoefficientSchema.optional(),
  weirCoefficient: z.number().positive().optional(),
});

const StandpipeInputSchema = z.strictObject({
  innerDiameter: diameter,
  outerDiameter: diameter,
  height: quantitySchema('length'),
  weirCoefficient: z.number().positive().optional(),
  dischargeCoefficient: DischargeCoefficientSchema.optional(),
});

const BellInputSchema = z.strictObject({
  innerDiameter: diameter,
  outerDiameter: diameter.optional(),
  capGap: quantitySchema('length'),
  intakeHeight: quantitySchema('length'),
  slotCount: z.number().int().positive().optional(),
  slotWidth: diameter.optional(),
  snorkelHeight: quantitySchema('length').optional(),
});

const drainCommon = {
  to: z.string().min(1),
  pipe: PipeInputSchema,
  outletElevation: quantitySchema('length', 'any'),
  dischargeLossMultiplier: z.number().positive().optional(),
  guard: z.strictObject({ diameter }).optional(),
};

/** How a bed drains: a bell siphon, or a plain standpipe (optionally with a weep hole). */
export const DrainInputSchema = z.discriminatedUnion('type', [
  z.strictObject({
    type: z.literal('bell-siphon'),
    ...drainCommon,
    standpipe: StandpipeInputSchema,
    bell: BellInputSchema,
    primingCoefficient: z.number().positive().optional(),
  }),
  z.strictObject({
    type: z.literal('standpipe'),
    ...drainCommon,
    standpipe: StandpipeInputSchema,
    weepHole: z
      .strictObject({ diameter, dischargeCoefficient: DischargeCoefficientSchema.optional() })
      .optional(),
  }),
]);

/** Bed media: type, porosity (defaults by type) and depth (defaults to the bed's height). */
export const MediaInputSchema = z.strictObject({
  type: z.enum(['gravel', 'expanded-clay', 'lava-rock', 'none']),
  porosity: z.number().gt(0).max(1).optional(),
  depth: length.optional(),
});

const vesselCommon = {
  id: z
    .string()
    .min(1)
    .refine((id) => id !== 'out', { error: '"out" is reserved for water leaving the system.' }),
  shape: ShapeInputSchema,
  floorElevation: quantitySchema('length', 'any').default(0),
  height: quantitySchema('length'),
  initialLevel: length.default(0),
  minLevel: length.optional(),
  overflow: OverflowInputSchema.optional(),
};

/** A fish tank, a sump, or a grow bed (with media and a drain). */
export const VesselInputSchema = z.discriminatedUnion('kind', [
  z.strictObject({ kind: z.literal('tank'), ...vesselCommon }),
  z.strictObject({ kind: z.literal('sump'), ...vesselCommon }),
  z.strictObject({
    kind: z.literal('bed'),
    ...vesselCommon,
    media: MediaInputSchema.optional(),
    drain: DrainInputSchema,
  }),
]);
