import { z } from 'zod';
import {
  ControlInputSchema,
  FaultInputSchema,
  LeakInputSchema,
  LossCoefficientsInputSchema,
  RunInputSchema,
  ScheduleEntryInputSchema,
} from './event-input-schemas';
import { PumpInputSchema } from './pump-input-schema';
import { quantitySchema } from './quantity-schema';
import { checkScenarioRules } from './check-scenario-rules';
import { VesselInputSchema } from './vessel-input-schema';

/** The scenario file's fields with units read into SI, before cross-field rules and defaults. */
export const ScenarioFieldsSchema = z.strictObject({
  format: z.literal('scenario/1', { error: 'The format must be "scenario/1".' }),
  name: z.string().min(1, { error: 'Give the scenario a name.' }),
  description: z.string().optional(),
  water: z
    .strictObject({ temperature: quantitySchema('temperature', 'any').optional() })
    .optional(),
  vessels: z.array(VesselInputSchema).min(1, { error: 'A scenario needs at least one vessel.' }),
  pumps: z.array(PumpInputSchema).default([]),
  leaks: z.array(LeakInputSchema).default([]),
  schedule: z.array(ScheduleEntryInputSchema).default([]),
  controls: z.array(ControlInputSchema).default([]),
  faults: z.array(FaultInputSchema).default([]),
  lossCoefficients: LossCoefficientsInputSchema.optional(),
  run: RunInputSchema.optional(),
});

/** A scenario with units read into SI and optional fields still optional (before defaults). */
export type ScenarioFields = z.output<typeof ScenarioFieldsSchema>;

/** What a scenario file may contain (numbers or strings with units), as people write it. */
export type ScenarioFile = z.input<typeof ScenarioFieldsSchema>;

/**
 * The scenario file format: every field, units read by mathjs, and the cross-field rules (ids
 * unique, references exist, geometry possible), each broken rule an issue at its field's path.
 */
export const ScenarioInputSchema = ScenarioFieldsSchema.superRefine((fields, ctx) => {
  for (const issue of checkScenarioRules(fields)) {
    ctx.addIssue({ code: 'custom', path: issue.path, message: issue.message });
  }
});
