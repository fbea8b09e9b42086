import { z } from 'zod';
import { DischargeCoefficientSchema } from './pipe-input-schema';
import { quantitySchema } from './quantity-schema';

/** A hole of `diameter` at `elevation` (above the datum) in vessel `from`, open from `start`. */
export const LeakInputSchema = z.strictObject({
  from: z.string().min(1),
  elevation: quantitySchema('length', 'any'),
  diameter: quantitySchema('diameter'),
  start: quantitySchema('time', 'nonnegative').default(0),
  dischargeCoefficient: DischargeCoefficientSchema.optional(),
});

/** A timed switch of one pump, or a power cut / restoration of every pump. */
export const ScheduleEntryInputSchema = z.union([
  z.strictObject({
    at: quantitySchema('time', 'nonnegative'),
    pump: z.string().min(1),
    state: z.enum(['on', 'off']),
  }),
  z.strictObject({ at: quantitySchema('time', 'nonnegative'), power: z.enum(['on', 'off']) }),
]);

/**
 * A float switch in `vessel` that stops `pump` when the level (above that vessel's floor) falls
 * below `stopBelow` and lets it run again above `restartAbove`.
 */
export const ControlInputSchema = z.strictObject({
  kind: z.literal('float-switch'),
  pump: z.string().min(1),
  vessel: z.string().min(1),
  stopBelow: quantitySchema('length', 'nonnegative'),
  restartAbove: quantitySchema('length', 'nonnegative'),
});

/** A what-if fault: a drain partly blocked, or a worn pump whose flow is scaled down. */
export const FaultInputSchema = z.discriminatedUnion('kind', [
  z.strictObject({
    kind: z.literal('drain-blocked'),
    bed: z.string().min(1),
    fraction: z.number().min(0).lt(1),
  }),
  z.strictObject({
    kind: z.literal('pump-worn'),
    pump: z.string().min(1),
    flowScale: z.number().positive().max(1),
  }),
]);

/** How to run the simulation. */
export const RunInputSchema = z.strictObject({
  duration: quantitySchema('time').optional(),
  outputInterval: quantitySchema('time').optional(),
  tolerance: z.number().positive().max(1e-3).optional(),
  friction: z.enum(['darcy-weisbach', 'hazen-williams']).optional(),
});

/** Overrides of the minor-loss coefficients K used by every pipe of the scenario. */
export const LossCoefficientsInputSchema = z.strictObject({
  elbow90: z.number().nonnegative().optional(),
  elbow45: z.number().nonnegative().optional(),
  teeRun: z.number().nonnegative().optional(),
  teeBranch: z.number().nonnegative().optional(),
  ballValve: z.number().nonnegative().optional(),
  entrance: z.number().nonnegative().optional(),
  exit: z.number().nonnegative().optional(),
  bellReturn: z.number().nonnegative().optional(),
});
