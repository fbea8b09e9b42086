import { describe, expect, it } from 'vitest';
import { parseScenario } from './parse-scenario';
import { withChanges } from './testing/with-changes';

function issuesAfter(changes: Record<string, unknown>): { path: string; message: string }[] {
  const result = parseScenario(withChanges(changes));
  return result.success ? [] : result.issues;
}

function pathsAfter(changes: Record<string, unknown>): string[] {
  return issuesAfter(changes).map((issue) => issue.path);
}

const floatSwitch = (pump: string, vessel: string, stopBelow: number, restartAbove: number) => [
  { kind: 'float-switch', pump, vessel, stopBelow, restartAbove },
];

describe('scenario cross-field rules', () => {
  it('accept the example as it is', () => {
    expect(pathsAfter({})).toEqual([]);
  });

  it.each([
    ['a duplicate vessel id', { 'vessels[1].id': 'tank' }, 'vessels[1].id'],
    ['a pump id used by a vessel', { 'pumps[0].id': 'tank' }, 'pumps[0].id'],
    ['the reserved id "out"', { 'vessels[0].id': 'out' }, 'vessels[0].id'],
  ])('reject %s', (_name, changes, path) => {
    expect(pathsAfter(changes)).toContain(path);
  });

  it.each([
    [
      'an overflow to a missing vessel',
      { 'vessels[0].overflow.to': 'pond' },
      'vessels[0].overflow.to',
    ],
    [
      'an overflow into its own vessel',
      { 'vessels[0].overflow.to': 'tank' },
      'vessels[0].overflow.to',
    ],
    ['a drain to a missing vessel', { 'vessels[1].drain.to': 'sump' }, 'vessels[1].drain.to'],
    ['a drain into a bed', { 'vessels[1].drain.to': 'bed-a' }, 'vessels[1].drain.to'],
    ['a pump in a missing vessel', { 'pumps[0].in': 'sump' }, 'pumps[0].in'],
    [
      'an outlet to a missing vessel',
      { 'pumps[0].outlets[0].to': 'bed-b' },
      'pumps[0].outlets[0].to',
    ],
    [
      'a leak from a missing vessel',
      { leaks: [{ from: 'sump', elevation: 0.1, diameter: 0.004 }] },
      'leaks[0].from',
    ],
    [
      'a schedule entry for a missing pump',
      { schedule: [{ at: 10, pump: 'p2', state: 'off' }] },
      'schedule[0].pump',
    ],
    [
      'a float switch on a missing pump',
      { controls: floatSwitch('p2', 'tank', 0.3, 0.4) },
      'controls[0].pump',
    ],
    [
      'a float switch in a missing vessel',
      { controls: floatSwitch('pump', 'sump', 0.3, 0.4) },
      'controls[0].vessel',
    ],
    [
      'a blocked drain on a tank',
      { faults: [{ kind: 'drain-blocked', bed: 'tank', fraction: 0.5 }] },
      'faults[0].bed',
    ],
    [
      'a worn pump that does not exist',
      { faults: [{ kind: 'pump-worn', pump: 'p2', flowScale: 0.5 }] },
      'faults[0].pump',
    ],
  ])('reject %s', (_name, changes, path) => {
    expect(pathsAfter(changes)).toEqual([path]);
  });

  it.each([
    [
      'an initial level above the rim',
      { 'vessels[0].initialLevel': '0.8 m' },
      'vessels[0].initialLevel',
    ],
    ['a minimum level at the rim', { 'vessels[0].minLevel': '0.7 m' }, 'vessels[0].minLevel'],
    [
      'an overflow above the rim',
      { 'vessels[0].overflow.elevation': '0.75 m' },
      'vessels[0].overflow.elevation',
    ],
    [
      'an overflow at the floor',
      { 'vessels[0].overflow.elevation': 0 },
      'vessels[0].overflow.elevation',
    ],
    ['media deeper than the bed', { 'vessels[1].media.depth': '0.4 m' }, 'vessels[1].media.depth'],
    [
      'a table that does not start at the floor',
      {
        'vessels[0].shape': {
          type: 'table',
          points: [
            { level: 0.1, area: 1 },
            { level: 0.7, area: 1 },
          ],
        },
      },
      'vessels[0].shape.points[0].level',
    ],
    [
      'a table whose levels go down',
      {
        'vessels[0].shape': {
          type: 'table',
          points: [
            { level: 0, area: 1 },
            { level: 0.5, area: 1 },
            { level: 0.4, area: 1 },
          ],
        },
      },
      'vessels[0].shape.points[2].level',
    ],
  ])('reject %s', (_name, changes, path) => {
    expect(pathsAfter(changes)).toEqual([path]);
  });

  const drain = 'vessels[1].drain';
  it.each([
    [
      'a standpipe wall of no thickness',
      { [`${drain}.standpipe.outerDiameter`]: '26.6 mm' },
      `${drain}.standpipe.outerDiameter`,
    ],
    [
      'a standpipe as tall as the bed',
      { [`${drain}.standpipe.height`]: '0.32 m' },
      `${drain}.standpipe.height`,
    ],
    [
      'a drain outlet above the bed floor',
      { [`${drain}.outletElevation`]: '0.85 m' },
      `${drain}.outletElevation`,
    ],
    [
      'a bell narrower than the standpipe',
      { [`${drain}.bell.innerDiameter`]: '30 mm' },
      `${drain}.bell.innerDiameter`,
    ],
    [
      'a bell outer diameter below its inner one',
      { [`${drain}.bell.outerDiameter`]: '70 mm' },
      `${drain}.bell.outerDiameter`,
    ],
    [
      'an intake above the standpipe top',
      { [`${drain}.bell.intakeHeight`]: '0.26 m' },
      `${drain}.bell.intakeHeight`,
    ],
    [
      'a snorkel inlet above the standpipe top',
      { [`${drain}.bell.snorkelHeight`]: '0.3 m' },
      `${drain}.bell.snorkelHeight`,
    ],
    [
      'a slot count without a slot width',
      { [`${drain}.bell.slotCount`]: 4 },
      `${drain}.bell.slotWidth`,
    ],
    [
      'slots wider than the bell',
      { [`${drain}.bell.slotCount`]: 20, [`${drain}.bell.slotWidth`]: '15 mm' },
      `${drain}.bell.slotCount`,
    ],
    [
      'a guard narrower than the bell',
      { [`${drain}.guard`]: { diameter: '60 mm' } },
      `${drain}.guard.diameter`,
    ],
    [
      'a guard wider than the bed',
      { [`${drain}.guard`]: { diameter: '0.7 m' } },
      `${drain}.guard.diameter`,
    ],
    [
      'a weep hole as wide as the bore',
      {
        [`${drain}.type`]: 'standpipe',
        [`${drain}.bell`]: undefined,
        [`${drain}.weepHole`]: { diameter: '30 mm' },
      },
      `${drain}.weepHole.diameter`,
    ],
  ])('reject %s', (_name, changes, path) => {
    expect(pathsAfter(changes)).toEqual([path]);
  });

  it('report each broken drain rule separately', () => {
    const paths = pathsAfter({
      [`${drain}.standpipe.height`]: '0.5 m',
      [`${drain}.bell.innerDiameter`]: '1 in',
      [`${drain}.outletElevation`]: '1 m',
    });
    expect(paths).toEqual([
      `${drain}.standpipe.height`,
      `${drain}.outletElevation`,
      `${drain}.bell.innerDiameter`,
    ]);
  });

  it.each([
    [
      'a pump with neither curve nor max head and flow',
      { 'pumps[0].curve': undefined },
      ['pumps[0].maxHead', 'pumps[0].maxFlow'],
    ],
    ['a curve of one point', { 'pumps[0].curve': [{ flow: 0, head: 2 }] }, ['pumps[0].curve']],
    [
      'a curve that does not start at zero flow',
      { 'pumps[0].curve[0].flow': '100 L/h' },
      ['pumps[0].curve[0].flow'],
    ],
    [
      'curve flows that do not increase',
      { 'pumps[0].curve[2].flow': '1200 L/h' },
      ['pumps[0].curve[2].flow'],
    ],
    ['curve heads that rise', { 'pumps[0].curve[1].head': '2.5 m' }, ['pumps[0].curve[1].head']],
    [
      'an intake above the source rim',
      { 'pumps[0].intakeHeight': '0.8 m' },
      ['pumps[0].intakeHeight'],
    ],
    [
      'a leak above the rim',
      { leaks: [{ from: 'tank', elevation: '0.9 m', diameter: '4 mm' }] },
      ['leaks[0].elevation'],
    ],
    [
      'a float switch restarting below its stop level',
      { controls: floatSwitch('pump', 'tank', 0.4, 0.3) },
      ['controls[0].restartAbove'],
    ],
    [
      'a float switch restarting above the rim',
      { controls: floatSwitch('pump', 'tank', 0.4, 0.9) },
      ['controls[0].restartAbove'],
    ],
    ['water too hot for fish', { water: { temperature: '90 degC' } }, ['water.temperature']],
    [
      'an output interval longer than the run',
      { run: { duration: '1 min', outputInterval: '2 min' } },
      ['run.outputInterval'],
    ],
  ])('reject %s', (_name, changes, paths) => {
    expect(pathsAfter(changes)).toEqual(paths);
  });

  it('explain what to change in the message', () => {
    const [issue] = issuesAfter({ [`${drain}.bell.innerDiameter`]: '30 mm' });
    expect(issue?.message).toBe(
      "The bell's inner diameter must be larger than the standpipe's outer diameter (0.0334 m).",
    );
  });
});
