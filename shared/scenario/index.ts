/** Scenario file format: schema, units, defaults and the normalised `Scenario` type. */
export type { Dimension } from './dimension';
export { DIMENSION_INFO } from './dimension';
export { DISPLAY_UNITS, type DisplayUnit, type UnitSystem } from './display-units';
export { formatQuantity } from './format-quantity';
export { fromDisplay, DisplayUnitError } from './from-display';
export { issuesFromZod } from './issues-from-zod';
export { normaliseScenario } from './normalise-scenario';
export { parseQuantity, type QuantityResult } from './parse-quantity';
export { parseScenario, type ParseScenarioResult } from './parse-scenario';
export { quantitySchema } from './quantity-schema';
export type * from './scenario';
export { SCENARIO_DEFAULTS } from './scenario-defaults';
export {
  ScenarioFieldsSchema,
  ScenarioInputSchema,
  type ScenarioFields,
  type ScenarioFile,
} from './scenario-input-schema';
export { formatIssuePath, type ScenarioIssue } from './scenario-issue';
export { toDisplay } from './to-display';
export { EXAMPLE_SCENARIO_FILE } from './example-scenario-file';
