import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseScenario, type Scenario } from '../../shared/scenario';
import { siphonFullBoreFlowM3PerS } from '../components/siphon-flow';
import { waterKinematicViscosityM2PerS } from '../hydraulics/water-properties';
import { simulate } from '../simulate';
import { frictionPipes } from './friction-pipes';
import { hazenWilliamsRangeVerdicts } from './hazen-williams-range-verdicts';
import type { Verdict } from './run-result';

/** Parses a scenario file with the run's friction model set, after `edit` changes its raw JSON. */
function load(
  name: string,
  friction: 'hazen-williams' | 'darcy-weisbach',
  edit: (json: string) => string = (json) => json,
): Scenario {
  const text = edit(readFileSync(join(__dirname, '../../scenarios', name), 'utf8'));
  const raw = JSON.parse(text) as Record<string, unknown>;
  const parsed = parseScenario({ ...raw, run: { ...(raw['run'] as object), friction } });
  if (!parsed.success) throw new Error(parsed.issues.map((i) => i.message).join('; '));
  return parsed.scenario;
}

/** The timer-driven standpipe bed with 52.5 mm pipes everywhere and a pump to match. */
const largePipes = (json: string): string =>
  json
    .replace(/"innerDiameter": "(20\.9|15\.8|26\.6) mm"/g, '"innerDiameter": "52.5 mm"')
    .replace('"outerDiameter": "33.4 mm"', '"outerDiameter": "60.3 mm"')
    .replace('"maxFlow": "1800 L/h"', '"maxFlow": "12000 L/h"');

const rangeChecks = (verdicts: readonly Verdict[]): Verdict[] =>
  verdicts.filter((v) => v.check.startsWith('Hazen–Williams used within its range:'));

function verdictsOf(scenario: Scenario): Verdict[] {
  const outcome = simulate(scenario, { durationS: 120 });
  expect(outcome.status).toBe('completed');
  return outcome.result.verdicts;
}

describe('hazenWilliamsRangeVerdicts', () => {
  it('warns about a run in small pipes, naming the narrowest pipe and the slowest flow', () => {
    const scenario = load('greenhouse-three-beds.json', 'hazen-williams');
    const [bore, velocity] = rangeChecks(verdictsOf(scenario));
    const bores = [
      ...scenario.pumps.flatMap((p) => [
        p.main.innerDiameter,
        ...p.outlets.map((o) => o.pipe.innerDiameter),
      ]),
      ...scenario.vessels.flatMap((v) =>
        v.kind !== 'bed'
          ? []
          : [
              v.drain.standpipe.innerDiameter,
              v.drain.pipe.innerDiameter,
              v.drain.type === 'bell-siphon'
                ? v.drain.bell.innerDiameter - v.drain.standpipe.outerDiameter
                : Infinity,
            ],
      ),
    ];
    // The first pipe of that bore in the list (pumps before drains) is named.
    expect(Math.min(...bores)).toBe(0.0209);
    expect(bore).toEqual({
      check:
        'Hazen–Williams used within its range: narrowest pipe, sump-pump outlet to tank (bore, m)',
      status: 'warning',
      value: 0.0209,
      limit: 0.05,
      source: expect.stringContaining('Darcy–Weisbach, the default, holds for small pipes'),
    });
    // The north bed's bell annulus at the drain's full-bore flow with the bed at standpipe height.
    const north = scenario.vessels.find((v) => v.id === 'bed-north');
    if (north?.kind !== 'bed' || north.drain.type !== 'bell-siphon') throw new Error('changed');
    const { drain } = north;
    const flow = siphonFullBoreFlowM3PerS(
      drain,
      north.floorElevation + drain.standpipe.height - drain.outletElevation,
      'hazen-williams',
      waterKinematicViscosityM2PerS(scenario.water.temperature),
    );
    const annulusM2 =
      (Math.PI / 4) * (drain.bell.innerDiameter ** 2 - drain.standpipe.outerDiameter ** 2);
    expect(velocity).toMatchObject({
      check:
        'Hazen–Williams used within its range: bed-north bell annulus at its working flow (velocity, m/s)',
      status: 'warning',
      value: Number((flow / annulusM2).toPrecision(4)),
      limit: '0.3–3',
    });
    expect(velocity?.value).toBeLessThan(0.3);
  });

  it('passes a run whose pipes are all 50 mm or larger at 0.3–3 m/s', () => {
    const scenario = load('timer-standpipe-bed.json', 'hazen-williams', largePipes);
    const pipes = frictionPipes(scenario);
    expect(pipes.map((p) => p.diameterM)).toEqual([0.0525, 0.0525, 0.0525, 0.0525]);
    const [bore, velocity] = rangeChecks(verdictsOf(scenario));
    expect(bore).toMatchObject({ status: 'ok', value: 0.0525, limit: 0.05 });
    expect(bore?.check).toContain('narrowest pipe, pump main pipe (bore, m)');
    expect(velocity?.status).toBe('ok');
    expect(velocity?.value).toBeGreaterThanOrEqual(0.3);
    expect(velocity?.value).toBeLessThanOrEqual(3);
  });

  it('adds no range check to a Darcy–Weisbach run, and keeps the temperature check to Hazen–Williams', () => {
    const darcy = verdictsOf(load('greenhouse-three-beds.json', 'darcy-weisbach'));
    expect(darcy.filter((v) => v.check.includes('Hazen–Williams'))).toEqual([]);
    const hazen = verdictsOf(load('greenhouse-three-beds.json', 'hazen-williams'));
    expect(hazen.filter((v) => v.check.includes('Hazen–Williams')).map((v) => v.check)).toEqual([
      'Hazen–Williams used within its range (water temperature, °C)',
      'Hazen–Williams used within its range: narrowest pipe, sump-pump outlet to tank (bore, m)',
      'Hazen–Williams used within its range: bed-north bell annulus at its working flow (velocity, m/s)',
    ]);
  });

  it('flags the velocity furthest outside the range on either side, ignoring pipes without flow', () => {
    const pipe = (name: string, velocityMPerS: number) => ({
      name,
      diameterM: 0.06,
      velocityMPerS,
    });
    const verdicts = hazenWilliamsRangeVerdicts([
      pipe('slow', 0.25),
      pipe('idle', 0),
      pipe('fast', 4),
      pipe('fine', 1),
    ]);
    // 4 m/s is 4/3 = 1.33 times the upper limit; 0.25 m/s is 0.3/0.25 = 1.2 times too slow.
    expect(verdicts.map((v) => [v.check, v.status, v.value])).toEqual([
      ['Hazen–Williams used within its range: narrowest pipe, slow (bore, m)', 'ok', 0.06],
      [
        'Hazen–Williams used within its range: fast at its working flow (velocity, m/s)',
        'warning',
        4,
      ],
    ]);
    expect(hazenWilliamsRangeVerdicts([pipe('idle', 0)]).map((v) => v.check)).toEqual([
      'Hazen–Williams used within its range: narrowest pipe, idle (bore, m)',
    ]);
    expect(hazenWilliamsRangeVerdicts([])).toEqual([]);
  });
});
