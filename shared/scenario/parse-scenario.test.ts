import { describe, expect, it } from 'vitest';
import { parseScenario } from './parse-scenario';
import type { BedVessel, Scenario } from './scenario';
import { withChanges } from './testing/with-changes';

function parsed(file: unknown): Scenario {
  const result = parseScenario(file);
  if (!result.success) throw new Error(JSON.stringify(result.issues));
  return result.scenario;
}

function bedOf(scenario: Scenario): BedVessel {
  const bed = scenario.vessels.find((vessel): vessel is BedVessel => vessel.kind === 'bed');
  if (bed === undefined) throw new Error('no bed');
  return bed;
}

describe('parseScenario', () => {
  it('reads every dimensional field into SI numbers', () => {
    const scenario = parsed(withChanges({}));
    const bed = bedOf(scenario);
    expect(scenario.water.temperature).toBe(24);
    expect(bed.drain.standpipe).toMatchObject({
      innerDiameter: 0.0266,
      outerDiameter: 0.0334,
      height: 0.25,
    });
    expect(scenario.pumps[0]?.curve[1]?.flow).toBeCloseTo(1.2 / 3600, 17);
    expect(scenario.pumps[0]?.curve[1]?.head).toBe(1.4);
    expect(scenario.run).toEqual({
      duration: 21600,
      outputInterval: 5,
      tolerance: 1e-8,
      friction: 'darcy-weisbach',
    });
  });

  it('fills and shows every default', () => {
    const scenario = parsed(withChanges({ run: undefined, water: undefined }));
    const bed = bedOf(scenario);
    expect(scenario.run).toEqual({
      duration: 21600,
      outputInterval: 5,
      tolerance: 1e-8,
      friction: 'darcy-weisbach',
    });
    expect(scenario.water.temperature).toBe(20);
    expect(bed.media).toEqual({ type: 'gravel', porosity: 0.4, depth: 0.3 });
    expect(bed.drain.pipe).toMatchObject({
      material: 'pvc',
      roughness: 1.5e-6,
      hazenWilliamsC: 150,
    });
    expect(bed.drain.pipe.fittings).toEqual({
      elbow90: 2,
      elbow45: 0,
      teeRun: 0,
      teeBranch: 0,
      ballValve: 0,
    });
    expect(bed.drain.standpipe).toMatchObject({
      weirCoefficient: 1.838,
      dischargeCoefficient: 0.61,
    });
    expect(bed.drain.dischargeLossMultiplier).toBe(1);
    expect(bed.drain.type === 'bell-siphon' && bed.drain.primingCoefficient).toBe(0.7);
    expect(bed.drain.type === 'bell-siphon' && bed.drain.bell.outerDiameter).toBe(0.0779);
    expect(scenario.lossCoefficients).toEqual({
      elbow90: 0.9,
      elbow45: 0.42,
      teeRun: 0.6,
      teeBranch: 1.8,
      ballValve: 0.08,
      entrance: 0.5,
      exit: 1,
      bellReturn: 1.5,
    });
    expect(scenario.pumps[0]).toMatchObject({
      checkValve: false,
      flowScale: 1,
      initialState: 'on',
      curveKind: 'points',
    });
    expect(scenario.vessels[0]?.overflow).toMatchObject({
      dischargeCoefficient: 0.61,
      weirCoefficient: 1.838,
    });
    expect([scenario.leaks, scenario.schedule, scenario.controls, scenario.faults]).toEqual([
      [],
      [],
      [],
      [],
    ]);
  });

  it('sets porosity by media type and roughness and C by material unless given', () => {
    const scenario = parsed(
      withChanges({
        'vessels[1].media': { type: 'lava-rock' },
        'vessels[1].drain.pipe.material': 'steel',
        'pumps[0].main.hazenWilliamsC': 140,
        'pumps[0].main.roughness': '0.01 mm',
      }),
    );
    const bed = bedOf(scenario);
    expect(bed.media).toEqual({ type: 'lava-rock', porosity: 0.45, depth: 0.32 });
    expect(bed.drain.pipe).toMatchObject({ roughness: 4.5e-5, hazenWilliamsC: 120 });
    expect(scenario.pumps[0]?.main).toMatchObject({ roughness: 1e-5, hazenWilliamsC: 140 });
    const clay = parsed(
      withChanges({ 'vessels[1].media': { type: 'expanded-clay', porosity: 0.5 } }),
    );
    expect(bedOf(clay).media.porosity).toBe(0.5);
    expect(
      bedOf(parsed(withChanges({ 'vessels[1].media': { type: 'expanded-clay' } }))).media.porosity,
    ).toBe(0.42);
  });

  it('turns a max-head/max-flow pump into sampled points of H0(1 - (Q/Q0)^2) and keeps the parabola', () => {
    const file = withChanges({
      'pumps[0].curve': undefined,
      'pumps[0].maxHead': '2 m',
      'pumps[0].maxFlow': '30 L/min',
    });
    const pump = parsed(file).pumps[0];
    expect(pump?.curveKind).toBe('parabola');
    expect(pump?.maxHead).toBe(2);
    expect(pump?.maxFlow).toBe(5e-4);
    expect(pump?.curve).toHaveLength(11);
    expect(pump?.curve[0]).toEqual({ flow: 0, head: 2 });
    expect(pump?.curve[5]?.head).toBeCloseTo(2 * (1 - 0.25), 15);
    expect(pump?.curve[10]?.head).toBe(0);
  });

  it('parses a normalised scenario back to itself', () => {
    const once = parsed(withChanges({}));
    expect(parsed(JSON.parse(JSON.stringify(once)))).toEqual(once);
    const parabola = parsed(
      withChanges({ 'pumps[0].curve': undefined, 'pumps[0].maxHead': 2, 'pumps[0].maxFlow': 5e-4 }),
    );
    expect(parsed(JSON.parse(JSON.stringify(parabola)))).toEqual(parabola);
  });

  it('sorts the schedule by time and keeps optional controls and faults', () => {
    const scenario = parsed(
      withChanges({
        schedule: [
          { at: '3 h', power: 'on' },
          { at: '2 h', pump: 'pump', state: 'off' },
        ],
        controls: [
          {
            kind: 'float-switch',
            pump: 'pump',
            vessel: 'tank',
            stopBelow: '0.35 m',
            restartAbove: '0.45 m',
          },
        ],
        faults: [
          { kind: 'drain-blocked', bed: 'bed-a', fraction: 0.3 },
          { kind: 'pump-worn', pump: 'pump', flowScale: 0.8 },
        ],
      }),
    );
    expect(scenario.schedule).toEqual([
      { at: 7200, pump: 'pump', state: 'off' },
      { at: 10800, power: 'on' },
    ]);
    expect(scenario.controls[0]).toEqual({
      kind: 'float-switch',
      pump: 'pump',
      vessel: 'tank',
      stopBelow: 0.35,
      restartAbove: 0.45,
    });
    expect(scenario.faults).toHaveLength(2);
  });

  it('names the path of a wrong dimension deep inside the document', () => {
    const result = parseScenario(
      withChanges({
        'vessels[1].drain.standpipe.height': '2 h',
        'pumps[0].outlets[0].pipe.innerDiameter': '3 L/min',
      }),
    );
    expect(result.success).toBe(false);
    if (result.success) return;
    expect(result.issues.map((issue) => issue.path)).toEqual([
      'vessels[1].drain.standpipe.height',
      'pumps[0].outlets[0].pipe.innerDiameter',
    ]);
    expect(result.issues[0]?.message).toContain('which is a time');
    expect(result.issues[1]?.message).toContain('which is a flow rate');
  });

  it('rejects unknown fields, a wrong format and non-objects without throwing', () => {
    const result = parseScenario(withChanges({ 'vessels[1].drain.standpipe.hieght': '0.2 m' }));
    expect(!result.success && result.issues[0]).toEqual({
      path: 'vessels[1].drain.standpipe.hieght',
      message: expect.stringContaining('"hieght"'),
    });
    expect(parseScenario(withChanges({ format: 'scenario/9' }))).toMatchObject({
      success: false,
      issues: [{ path: 'format' }],
    });
    expect(parseScenario(null).success).toBe(false);
    expect(parseScenario('{}').success).toBe(false);
  });

  it('rejects a negative diameter and a non-integer fitting count at their paths', () => {
    const result = parseScenario(
      withChanges({
        'vessels[0].overflow.diameter': -0.04,
        'vessels[1].drain.pipe.fittings.elbow90': 1.5,
      }),
    );
    const paths = result.success ? [] : result.issues.map((issue) => issue.path);
    expect(paths).toEqual([
      'vessels[0].overflow.diameter',
      'vessels[1].drain.pipe.fittings.elbow90',
    ]);
  });
});
