import { z } from 'zod';
import { quantitySchema } from './quantity-schema';

const fittingCount = z
  .number()
  .int({ error: 'A fitting count must be a whole number.' })
  .nonnegative();

/** Counts of fittings on one pipe, by kind; missing kinds count zero. */
export const FittingsInputSchema = z.strictObject({
  elbow90: fittingCount.default(0),
  elbow45: fittingCount.default(0),
  teeRun: fittingCount.default(0),
  teeBranch: fittingCount.default(0),
  ballValve: fittingCount.default(0),
});

/** Pipe materials known to the schema; each sets Hazen–Williams C and roughness by default. */
export const PipeMaterialSchema = z.enum(['pvc', 'pe', 'steel', 'copper']);

/**
 * A pipe run: length along its axis, inner (bore) diameter, material and fittings.
 * `roughness` (absolute, m) and `hazenWilliamsC` override the material's values.
 */
export const PipeInputSchema = z.strictObject({
  length: quantitySchema('length', 'nonnegative'),
  innerDiameter: quantitySchema('diameter'),
  material: PipeMaterialSchema.optional(),
  roughness: quantitySchema('diameter', 'nonnegative').optional(),
  hazenWilliamsC: z.number().positive().max(200).optional(),
  fittings: FittingsInputSchema.optional(),
});

/** A circular sharp-edged opening's discharge coefficient C_d (0 < C_d ≤ 1). */
export const DischargeCoefficientSchema = z.number().positive().max(1);
