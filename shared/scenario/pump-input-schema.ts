import { z } from 'zod';
import { PipeInputSchema } from './pipe-input-schema';
import { quantitySchema } from './quantity-schema';

/** One datasheet point of a pump curve: flow and the head the pump gives at that flow. */
export const PumpCurvePointInputSchema = z.strictObject({
  flow: quantitySchema('flow', 'nonnegative'),
  head: quantitySchema('length', 'nonnegative'),
});

/** One outlet of a pump line, ending at `elevation` (above the datum) over the vessel `to`. */
export const PumpOutletInputSchema = z.strictObject({
  to: z.string().min(1),
  elevation: quantitySchema('length', 'any'),
  valveOpening: z.number().min(0).max(1).default(1),
  pipe: PipeInputSchema,
});

/**
 * A pump sitting in vessel `in`, its curve (datasheet points, or `maxHead` and `maxFlow` for the
 * parabola H = H0·(1 − (Q/Q0)²)), its main pipe up to a manifold, and its outlets.
 */
export const PumpInputSchema = z.strictObject({
  id: z.string().min(1),
  in: z.string().min(1),
  intakeHeight: quantitySchema('length', 'nonnegative').default(0),
  curveKind: z.enum(['points', 'parabola']).optional(),
  curve: z.array(PumpCurvePointInputSchema).optional(),
  maxHead: quantitySchema('length').optional(),
  maxFlow: quantitySchema('flow').optional(),
  power: quantitySchema('power', 'nonnegative').optional(),
  checkValve: z.boolean().default(false),
  flowScale: z.number().positive().max(1.5).optional(),
  initialState: z.enum(['on', 'off']).default('on'),
  main: PipeInputSchema,
  outlets: z.array(PumpOutletInputSchema).min(1, { error: 'A pump needs at least one outlet.' }),
});
