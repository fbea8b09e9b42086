import { brokenRules, type RuleIssue } from './rule-issue';
import type { ScenarioFields } from './scenario-input-schema';

type PumpFields = ScenarioFields['pumps'][number];

/**
 * A pump has a curve (points, or max head and flow), its points start at zero flow with flows
 * rising and heads falling, and its intake sits below the rim of its source vessel.
 */
export function checkPumpRules(fields: ScenarioFields): RuleIssue[] {
  return fields.pumps.flatMap((pump, index) => {
    const source = fields.vessels.find((vessel) => vessel.id === pump.in);
    const intakeTooHigh = source !== undefined && pump.intakeHeight >= source.height;
    const parabola =
      pump.curveKind === 'parabola' || (pump.curve === undefined && pump.curveKind === undefined);
    return [
      ...(parabola ? checkParabolaRules(pump, index) : checkCurveRules(pump.curve ?? [], index)),
      ...brokenRules([
        [
          intakeTooHigh,
          ['pumps', index, 'intakeHeight'],
          `The pump intake must be below the height of "${pump.in}" (${source?.height} m).`,
        ],
      ]),
    ];
  });
}

function checkParabolaRules(pump: PumpFields, index: number): RuleIssue[] {
  const message = 'Give the pump curve as points, or give both maxHead and maxFlow.';
  return brokenRules([
    [pump.maxHead === undefined, ['pumps', index, 'maxHead'], message],
    [pump.maxFlow === undefined, ['pumps', index, 'maxFlow'], message],
  ]);
}

function checkCurveRules(curve: NonNullable<PumpFields['curve']>, index: number): RuleIssue[] {
  const at = (...path: (string | number)[]) => ['pumps', index, 'curve', ...path];
  if (curve.length < 2) return [{ path: at(), message: 'A pump curve needs at least two points.' }];
  const issues = brokenRules([
    [
      curve[0]?.flow !== 0,
      at(0, 'flow'),
      'The first curve point is the shut-off head, at zero flow.',
    ],
  ]);
  curve.forEach((point, pointIndex) => {
    const previous = curve[pointIndex - 1];
    if (previous === undefined) return;
    issues.push(
      ...brokenRules([
        [
          point.flow <= previous.flow,
          at(pointIndex, 'flow'),
          'Curve flows must increase from one point to the next.',
        ],
        [
          point.head >= previous.head,
          at(pointIndex, 'head'),
          'Curve heads must fall as the flow rises.',
        ],
      ]),
    );
  });
  return issues;
}
