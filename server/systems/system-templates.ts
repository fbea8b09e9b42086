/**
 * The starting points of "New system". The greenhouse and tabletop templates are the example
 * scenario files in `scenarios/` (each run by the scenario tests); timer-bed and blank are ours here.
 */
import { readFileSync } from 'node:fs';
import type { SystemTemplate } from '../../shared/contracts/systems';
import type { ScenarioFile } from '../../shared/scenario/index';
import { BLANK_TEMPLATE } from './templates/blank-template';
import { TIMER_BED_TEMPLATE } from './templates/timer-bed-template';

/** Example files used as templates, relative to `scenarios/`. */
export const TEMPLATE_FILES = {
  greenhouse: 'greenhouse-three-beds.json',
  tabletop: 'tabletop-classroom.json',
} as const;

/** Reads one of the example scenario files (a fresh copy each time). */
export function readExampleScenario(fileName: string): Record<string, unknown> {
  const text = readFileSync(new URL(`../../scenarios/${fileName}`, import.meta.url), 'utf8');
  const parsed: unknown = JSON.parse(text);
  if (typeof parsed !== 'object' || parsed === null || Array.isArray(parsed)) {
    throw new Error(`scenarios/${fileName} is not a JSON object.`);
  }
  return parsed as Record<string, unknown>;
}

/** A deep copy of the template's scenario document. */
export function templateScenario(template: SystemTemplate): Record<string, unknown> {
  switch (template) {
    case 'greenhouse':
    case 'tabletop':
      return readExampleScenario(TEMPLATE_FILES[template]);
    case 'timer-bed':
      return structuredClone(TIMER_BED_TEMPLATE) as ScenarioFile & Record<string, unknown>;
    case 'blank':
      return structuredClone(BLANK_TEMPLATE) as ScenarioFile & Record<string, unknown>;
  }
}
