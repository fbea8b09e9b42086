import type { RuleIssue } from './rule-issue';
import type { ScenarioFields } from './scenario-input-schema';

type PumpFields = ScenarioFields['pumps'][number];

/**
 * A pump has a curve (points, or max head and flow), its points start at zero flow with flows
 * rising and heads falling, and its intake sits below the rim of its source vessel.
 */
export function checkPumpRules(fields: ScenarioFields): RuleIssue[] {
  const issues: RuleIssue[] = [];
  fields.pumps.forEach((pump, index) => {
    issues.push(...checkCurveRules(pump, index));
    const source = fields.vessels.find((vessel) => vessel.id === pump.in);
    if (source !== undefined && pump.intakeHeight >= source.height) {
      issues.push({
        path: ['pumps', index, 'intakeHeight'],
        message: `The pump intake must be below the height of "${source.id}" (${source.height} m).`,
      });
    }
  });
  return issues;
}

function checkCurveRules(pump: PumpFields, index: number): RuleIssue[] {
  const at = (...path: (string | number)[]) => ['pumps', index, ...path];
  const parabola =
    pump.curveKind === 'parabola' || (pump.curve === undefined && pump.curveKind === undefined);
  if (parabola) {
    const issues: RuleIssue[] = [];
    if (pump.maxHead === undefined)
      issues.push({
        path: at('maxHead'),
        message: 'Give the pump curve as points, or give both maxHead and maxFlow.',
      });
    if (pump.maxFlow === undefined)
      issues.push({
        path: at('maxFlow'),
        message: 'Give the pump curve as points, or give both maxHead and maxFlow.',
      });
    return issues;
  }
  const curve = pump.curve ?? [];
  if (curve.length < 2)
    return [{ path: at('curve'), message: 'A pump curve needs at least two points.' }];
  const issues: RuleIssue[] = [];
  if (curve[0]?.flow !== 0) {
    issues.push({
      path: at('curve', 0, 'flow'),
      message: 'The first curve point is the shut-off head, at zero flow.',
    });
  }
  curve.forEach((point, pointIndex) => {
    const previous = curve[pointIndex - 1];
    if (previous === undefined) return;
    if (point.flow <= previous.flow) {
      issues.push({
        path: at('curve', pointIndex, 'flow'),
        message: 'Curve flows must increase from one point to the next.',
      });
    }
    if (point.head >= previous.head) {
      issues.push({
        path: at('curve', pointIndex, 'head'),
        message: 'Curve heads must fall as the flow rises.',
      });
    }
  });
  return issues;
}
