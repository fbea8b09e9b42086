import { type AbstractControl, FormArray, FormControl, FormGroup } from '@angular/forms';
import { SCENARIO_DEFAULTS, ScenarioFieldsSchema } from '../../../../../shared/scenario';

/** A form group whose children are known only at run time (the scenario's shape varies). */
export type DynamicGroup = FormGroup<Record<string, AbstractControl>>;
/** A form array of groups (vessels, pumps, outlets...). */
export type DynamicArray = FormArray<AbstractControl>;

type Json = null | boolean | number | string | Json[] | { [key: string]: Json };

/** Optional fields the editor always offers: created empty (null) when the file leaves them out. */
const OPTIONAL_FIELDS = {
  vessel: ['minLevel'],
  pump: ['power'],
  bell: ['slotCount', 'slotWidth'],
  media: ['porosity', 'depth'],
  pipe: ['material'],
  lossCoefficients: Object.keys(SCENARIO_DEFAULTS.lossCoefficients),
} as const;

/**
 * Turns a stored scenario document into what the editor edits: every dimensional value read into
 * SI by the shared schema (so fields show them in the reader's units), defaults of the file format
 * filled, and the optional fields the editor offers present as null. A document the schema
 * refuses is edited as it is, so its problems can be fixed in the form.
 */
export function editableScenario(document: unknown): Record<string, Json> {
  const parsed = ScenarioFieldsSchema.safeParse(document);
  const source = parsed.success ? parsed.data : document;
  const copy = JSON.parse(JSON.stringify(source ?? {})) as Record<string, Json>;
  copy['water'] = isObject(copy['water']) ? copy['water'] : {};
  fill(copy['water'], ['temperature']);
  copy['run'] = isObject(copy['run']) ? copy['run'] : {};
  fill(copy['run'], ['duration', 'outputInterval', 'friction']);
  for (const key of ['leaks', 'schedule', 'controls', 'faults'])
    copy[key] = Array.isArray(copy[key]) ? copy[key] : [];
  copy['lossCoefficients'] = isObject(copy['lossCoefficients']) ? copy['lossCoefficients'] : {};
  fill(copy['lossCoefficients'], OPTIONAL_FIELDS.lossCoefficients);
  for (const vessel of asObjects(copy['vessels'])) {
    fill(vessel, OPTIONAL_FIELDS.vessel);
    if (vessel['kind'] !== 'bed') continue;
    vessel['media'] = isObject(vessel['media']) ? vessel['media'] : { type: 'gravel' };
    fill(vessel['media'], OPTIONAL_FIELDS.media);
    const drain = vessel['drain'];
    if (!isObject(drain)) continue;
    if (isObject(drain['bell'])) fill(drain['bell'], OPTIONAL_FIELDS.bell);
    if (isObject(drain['pipe'])) completePipe(drain['pipe']);
  }
  for (const pump of asObjects(copy['pumps'])) {
    fill(pump, OPTIONAL_FIELDS.pump);
    if (isObject(pump['main'])) completePipe(pump['main']);
    for (const outlet of asObjects(pump['outlets']))
      if (isObject(outlet['pipe'])) completePipe(outlet['pipe']);
  }
  return copy;
}

/** Fills in a pipe's optional material and a full set of fitting counts. */
export function completePipe(pipe: { [key: string]: Json }): void {
  fill(pipe, OPTIONAL_FIELDS.pipe);
  const fittings = isObject(pipe['fittings']) ? pipe['fittings'] : {};
  for (const key of ['elbow90', 'elbow45', 'teeRun', 'teeBranch', 'ballValve']) fittings[key] ??= 0;
  pipe['fittings'] = fittings;
}

/** Builds nested form groups, arrays and controls mirroring a JSON value. */
export function toControl(value: unknown): AbstractControl {
  if (Array.isArray(value)) return new FormArray<AbstractControl>(value.map(toControl));
  if (isObject(value)) {
    const controls: Record<string, AbstractControl> = {};
    for (const [key, child] of Object.entries(value)) controls[key] = toControl(child);
    return new FormGroup(controls);
  }
  return new FormControl(value ?? null);
}

/**
 * The scenario document of the form's value: empty (null) optional fields are left out, so the
 * shared schema applies its defaults or names a missing required field.
 */
export function documentFromForm(value: unknown): Record<string, unknown> {
  const cleaned = withoutNulls(value);
  return isObject(cleaned) ? cleaned : {};
}

function withoutNulls(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(withoutNulls);
  if (!isObject(value)) return value;
  const out: Record<string, unknown> = {};
  for (const [key, child] of Object.entries(value)) {
    if (child === null || child === undefined || child === '') continue;
    out[key] = withoutNulls(child);
  }
  return out;
}

/** The child group at `key`; throws when the form's shape is not what the template expects. */
export function childGroup(group: AbstractControl, key: string | number): DynamicGroup {
  const child = group.get([key]);
  if (!(child instanceof FormGroup))
    throw new Error(`The scenario form has no group at "${String(key)}".`);
  return child as DynamicGroup;
}

/** The child array at `key` (created empty when missing, e.g. a file without leaks). */
export function childArray(group: DynamicGroup, key: string): DynamicArray {
  const child = group.get(key);
  if (child instanceof FormArray) return child;
  const created = new FormArray<AbstractControl>([]);
  group.setControl(key, created);
  return created;
}

function fill(target: { [key: string]: Json }, keys: readonly string[]): void {
  for (const key of keys) target[key] ??= null;
}

function asObjects(value: Json | undefined): { [key: string]: Json }[] {
  return Array.isArray(value) ? value.filter(isObject) : [];
}

function isObject(value: unknown): value is { [key: string]: Json } {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}
