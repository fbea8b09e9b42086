import { checkDrainRules } from './check-drain-rules';
import { checkPumpRules } from './check-pump-rules';
import { checkReferenceRules } from './check-reference-rules';
import type { RuleIssue } from './rule-issue';
import type { ScenarioFields } from './scenario-input-schema';

type VesselFields = ScenarioFields['vessels'][number];
type ShapeFields = VesselFields['shape'];

/** Highest water temperature accepted, °C: the water-property fits hold to 100 °C, fish far less. */
const MAX_WATER_TEMPERATURE_C = 50;

/**
 * Every cross-field rule of a scenario: references, vessel geometry, drains, pumps, leaks,
 * controls and run settings. Each broken rule is its own issue with the path of the field to fix.
 */
export function checkScenarioRules(fields: ScenarioFields): RuleIssue[] {
  const issues: RuleIssue[] = [...checkReferenceRules(fields)];
  fields.vessels.forEach((vessel, index) => {
    issues.push(...checkVesselRules(vessel, index));
    if (vessel.kind === 'bed') issues.push(...checkDrainRules(vessel, index));
  });
  issues.push(...checkPumpRules(fields), ...checkLevelRules(fields), ...checkSettingRules(fields));
  return issues;
}

function checkVesselRules(vessel: VesselFields, index: number): RuleIssue[] {
  const issues: RuleIssue[] = [];
  const at = (...path: (string | number)[]) => ['vessels', index, ...path];
  if (vessel.initialLevel > vessel.height) {
    issues.push({
      path: at('initialLevel'),
      message: `The initial level must be within the vessel (at most its height, ${vessel.height} m).`,
    });
  }
  if (vessel.minLevel !== undefined && vessel.minLevel >= vessel.height) {
    issues.push({
      path: at('minLevel'),
      message: `The minimum level must be below the vessel's height (${vessel.height} m).`,
    });
  }
  if (vessel.overflow !== undefined) {
    const { elevation } = vessel.overflow;
    if (elevation <= vessel.floorElevation || elevation > vessel.floorElevation + vessel.height) {
      issues.push({
        path: at('overflow', 'elevation'),
        message:
          'The overflow must sit above the vessel floor and no higher than its rim (elevations are above the datum).',
      });
    }
  }
  issues.push(...checkShapeRules(vessel.shape, at));
  if (
    vessel.kind === 'bed' &&
    vessel.media?.depth !== undefined &&
    vessel.media.depth > vessel.height
  ) {
    issues.push({
      path: at('media', 'depth'),
      message: `The media depth must not exceed the bed's height (${vessel.height} m).`,
    });
  }
  return issues;
}

function checkShapeRules(
  shape: ShapeFields,
  at: (...path: (string | number)[]) => (string | number)[],
): RuleIssue[] {
  if (shape.type !== 'table') return [];
  const issues: RuleIssue[] = [];
  if (shape.points[0]?.level !== 0) {
    issues.push({
      path: at('shape', 'points', 0, 'level'),
      message: 'A level-to-area table starts at level 0 (the floor).',
    });
  }
  shape.points.forEach((point, index) => {
    const previous = shape.points[index - 1];
    if (previous !== undefined && point.level <= previous.level) {
      issues.push({
        path: at('shape', 'points', index, 'level'),
        message: 'Table levels must increase from one point to the next.',
      });
    }
  });
  return issues;
}

function findVessel(fields: ScenarioFields, id: string): VesselFields | undefined {
  return fields.vessels.find((vessel) => vessel.id === id);
}

function checkLevelRules(fields: ScenarioFields): RuleIssue[] {
  const issues: RuleIssue[] = [];
  fields.leaks.forEach((leak, index) => {
    const vessel = findVessel(fields, leak.from);
    if (vessel === undefined) return;
    if (
      leak.elevation < vessel.floorElevation ||
      leak.elevation > vessel.floorElevation + vessel.height
    ) {
      issues.push({
        path: ['leaks', index, 'elevation'],
        message: `The leak must be on the wall of "${vessel.id}", between its floor and rim (elevations are above the datum).`,
      });
    }
  });
  fields.controls.forEach((control, index) => {
    const vessel = findVessel(fields, control.vessel);
    if (control.restartAbove <= control.stopBelow) {
      issues.push({
        path: ['controls', index, 'restartAbove'],
        message: 'The restart level must be above the stop level, so the switch cannot chatter.',
      });
    }
    if (vessel !== undefined && control.restartAbove >= vessel.height) {
      issues.push({
        path: ['controls', index, 'restartAbove'],
        message: `The restart level must be below the height of "${vessel.id}".`,
      });
    }
  });
  return issues;
}

function checkSettingRules(fields: ScenarioFields): RuleIssue[] {
  const issues: RuleIssue[] = [];
  const temperature = fields.water?.temperature;
  if (temperature !== undefined && (temperature <= 0 || temperature > MAX_WATER_TEMPERATURE_C)) {
    issues.push({
      path: ['water', 'temperature'],
      message: `The water temperature must be between 0 and ${MAX_WATER_TEMPERATURE_C} degC.`,
    });
  }
  const run = fields.run;
  if (
    run?.duration !== undefined &&
    run.outputInterval !== undefined &&
    run.outputInterval > run.duration
  ) {
    issues.push({
      path: ['run', 'outputInterval'],
      message: 'The output interval must not be longer than the run.',
    });
  }
  return issues;
}
