/**
 * `/api/systems`: designed systems, their scenario documents, templates, import/export and shares.
 *
 * A system stores its scenario exactly as written (the scenario file format: numbers in SI or
 * strings with units). The server checks it with `parseScenario` from `shared/scenario` on every
 * create, save and import; a failure is a 400 `VALIDATION_FAILED` whose `fields[].path` names the
 * scenario field (prefixed `scenario.` when the scenario is nested in the request body).
 */
import { z } from 'zod';
import { EmailSchema } from './auth';

/** A scenario document in the file format (validated on the server by `parseScenario`). */
export const ScenarioDocumentSchema = z.record(z.string(), z.unknown());
/** A scenario document in the file format. */
export type ScenarioDocument = z.infer<typeof ScenarioDocumentSchema>;

/** What the signed-in user may do with a system: `owner` > `editor` > `viewer`. */
export const SystemAccessSchema = z.enum(['owner', 'editor', 'viewer']);
/** What the signed-in user may do with a system. */
export type SystemAccess = z.infer<typeof SystemAccessSchema>;

/** A verdict's status, best to worst. */
export const VerdictStatusSchema = z.enum(['ok', 'warning', 'fails']);
/** A verdict's status. */
export type VerdictStatus = z.infer<typeof VerdictStatusSchema>;

/** The starting points offered by "New system". */
export const SystemTemplateSchema = z.enum(['tabletop', 'greenhouse', 'timer-bed', 'blank']);
/** A template name. */
export type SystemTemplate = z.infer<typeof SystemTemplateSchema>;

/** A system's name as people type it. */
export const SystemNameSchema = z
  .string()
  .trim()
  .min(1, { error: 'Give the system a name.' })
  .max(200, { error: 'Use at most 200 characters.' });

/**
 * One row of `GET /api/systems`. `pumpSummary` reads e.g. "1 pump, up to 2000 L/h";
 * `pumpsMaxFlowM3PerS` is the sum of the pumps' free-flow maxima (m³/s) for display in other units.
 */
export const SystemListItemSchema = z.object({
  id: z.uuid(),
  name: z.string(),
  bedsCount: z.number().int().nonnegative(),
  pumpsCount: z.number().int().nonnegative(),
  pumpSummary: z.string(),
  pumpsMaxFlowM3PerS: z.number().nullable(),
  /** Worst verdict status of the latest completed run; null before any run. */
  lastVerdict: VerdictStatusSchema.nullable(),
  ownerName: z.string(),
  access: SystemAccessSchema,
  updatedAt: z.iso.datetime({ offset: true }),
});
/** One row of the systems table. */
export type SystemListItem = z.infer<typeof SystemListItemSchema>;

/** `GET /api/systems`: mine first, then shared with me; each group newest first. */
export const SystemListSchema = z.object({ items: z.array(SystemListItemSchema) });
/** The systems table. */
export type SystemList = z.infer<typeof SystemListSchema>;

/**
 * `GET /api/systems/:id` and the body of every create/save answer. The scenario's `name` always
 * equals the system's `name` (the server writes it on every save).
 */
export const SystemSchema = z.object({
  id: z.uuid(),
  name: z.string(),
  /** Optimistic-lock version; send it back with PUT. Starts at 1, +1 per save. */
  version: z.number().int().positive(),
  scenario: ScenarioDocumentSchema,
  ownerId: z.uuid(),
  ownerName: z.string(),
  access: SystemAccessSchema,
  lastVerdict: VerdictStatusSchema.nullable(),
  /** Calibrated values kept by the measurements feature; null when never calibrated. */
  calibration: z.record(z.string(), z.unknown()).nullable(),
  createdAt: z.iso.datetime({ offset: true }),
  updatedAt: z.iso.datetime({ offset: true }),
});
/** A system with its scenario. */
export type System = z.infer<typeof SystemSchema>;

/** `POST /api/systems` with a scenario document. */
export const CreateSystemFromScenarioSchema = z.strictObject({
  name: SystemNameSchema,
  scenario: ScenarioDocumentSchema,
});
/** `POST /api/systems` from a template; the template's scenario is renamed to `name`. */
export const CreateSystemFromTemplateSchema = z.strictObject({
  template: SystemTemplateSchema,
  name: SystemNameSchema,
});
/** `POST /api/systems` body: either a scenario or a template. Answer: 201 `System`. */
export const CreateSystemRequestSchema = z.union([
  CreateSystemFromScenarioSchema,
  CreateSystemFromTemplateSchema,
]);
/** `POST /api/systems` body. */
export type CreateSystemRequest = z.infer<typeof CreateSystemRequestSchema>;

/**
 * `PUT /api/systems/:id` body: the version the editor loaded plus what changed. A version that is
 * not the current one answers 409 with code `STALE_VERSION` (reload, then save again).
 */
export const UpdateSystemRequestSchema = z.strictObject({
  version: z.number().int().positive(),
  name: SystemNameSchema.optional(),
  scenario: ScenarioDocumentSchema.optional(),
});
/** `PUT /api/systems/:id` body. */
export type UpdateSystemRequest = z.infer<typeof UpdateSystemRequestSchema>;

/** `POST /api/systems/:id/duplicate` body (optional): the copy's name, default "<name> (copy)". */
export const DuplicateSystemRequestSchema = z.strictObject({ name: SystemNameSchema.optional() });
/** `POST /api/systems/:id/duplicate` body. */
export type DuplicateSystemRequest = z.infer<typeof DuplicateSystemRequestSchema>;

/**
 * `POST /api/systems/import`: the body IS a scenario file (what `GET .../scenario.json` gives).
 * The system takes the file's `name` (or "Imported system"); `?name=` overrides it. Errors name
 * paths inside the file (no `scenario.` prefix). Answer: 201 `System`.
 */
export const ImportSystemQuerySchema = z.object({ name: SystemNameSchema.optional() });

/** `POST /api/systems/:id/shares` body (owner only). Sharing again changes the access. */
export const ShareRequestSchema = z.strictObject({
  email: EmailSchema,
  access: z.enum(['viewer', 'editor']),
});
/** `POST /api/systems/:id/shares` body. */
export type ShareRequest = z.infer<typeof ShareRequestSchema>;

/** One person a system is shared with. */
export const ShareSchema = z.object({
  userId: z.uuid(),
  email: z.string(),
  name: z.string(),
  access: z.enum(['viewer', 'editor']),
  createdAt: z.iso.datetime({ offset: true }),
});
/** One share. */
export type Share = z.infer<typeof ShareSchema>;

/** `GET /api/systems/:id/shares` (owner only); `POST` answers 201 with one `Share`. */
export const ShareListSchema = z.object({ items: z.array(ShareSchema) });
/** The shares of a system. */
export type ShareList = z.infer<typeof ShareListSchema>;
