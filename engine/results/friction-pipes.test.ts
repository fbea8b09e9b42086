import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseScenario, type Scenario } from '../../shared/scenario';
import { frictionPipes } from './friction-pipes';

/** Parses a scenario file after `edit` changes its raw JSON. */
function load(name: string, edit: (raw: Record<string, unknown>) => void = () => {}): Scenario {
  const raw = JSON.parse(readFileSync(join(__dirname, '../../scenarios', name), 'utf8')) as Record<
    string,
    unknown
  >;
  edit(raw);
  const parsed = parseScenario(raw);
  if (!parsed.success) throw new Error(parsed.issues.map((i) => i.message).join('; '));
  return parsed.scenario;
}

/** The timer-driven standpipe bed rebuilt with 52.5 mm pipes everywhere and a larger pump. */
function largePipeScenario(): Scenario {
  return load('timer-standpipe-bed.json', (raw) => {
    const json = JSON.stringify(raw)
      .replaceAll('"innerDiameter":"20.9 mm"', '"innerDiameter":"52.5 mm"')
      .replaceAll('"innerDiameter":"15.8 mm"', '"innerDiameter":"52.5 mm"')
      .replaceAll('"innerDiameter":"26.6 mm"', '"innerDiameter":"52.5 mm"')
      .replaceAll('"outerDiameter":"33.4 mm"', '"outerDiameter":"60.3 mm"')
      .replaceAll('"maxFlow":"1800 L/h"', '"maxFlow":"12000 L/h"');
    Object.assign(raw, JSON.parse(json), { run: { friction: 'hazen-williams' } });
  });
}

const G = 9.80665;
const disc = (d: number): number => (Math.PI / 4) * d * d;
/** Hazen–Williams SI, h = 10.67·L·Q^1.852/(C^1.852·D^4.8704) (EPANET 2 manual, Table 3.1). */
const hw = (lengthM: number, flow: number, c: number, d: number): number =>
  (10.67 * lengthM * flow ** 1.852) / (c ** 1.852 * d ** 4.8704);

function pipe(pipes: ReturnType<typeof frictionPipes>, name: string) {
  const found = pipes.find((p) => p.name === name);
  if (!found) throw new Error(`no pipe ${name}`);
  return found;
}

describe('frictionPipes', () => {
  it('lists every pipe the engine applies friction to, with its bore', () => {
    const scenario = load('greenhouse-three-beds.json');
    const expected: [string, number][] = [];
    for (const pump of scenario.pumps) {
      expected.push([`${pump.id} main pipe`, pump.main.innerDiameter]);
      for (const o of pump.outlets)
        expected.push([`${pump.id} outlet to ${o.to}`, o.pipe.innerDiameter]);
    }
    for (const v of scenario.vessels) {
      if (v.kind !== 'bed') continue;
      if (v.drain.type === 'bell-siphon')
        expected.push([
          `${v.id} bell annulus`,
          v.drain.bell.innerDiameter - v.drain.standpipe.outerDiameter,
        ]);
      expected.push([`${v.id} standpipe`, v.drain.standpipe.innerDiameter]);
      expected.push([`${v.id} drain pipe`, v.drain.pipe.innerDiameter]);
    }
    const pipes = frictionPipes(scenario);
    expect(pipes.map((p) => [p.name, p.diameterM])).toEqual(expected);
    expect(pipes).toHaveLength(14);
    for (const p of pipes) expect(p.velocityMPerS).toBeGreaterThan(0);
  });

  it("gives a pump line its operating flow: the curve's head there equals lift plus losses", () => {
    const scenario = largePipeScenario();
    const pump = scenario.pumps[0];
    const outlet = pump?.outlets[0];
    const tank = scenario.vessels.find((v) => v.id === pump?.in);
    const bed = scenario.vessels.find((v) => v.id === outlet?.to);
    if (!pump || !outlet || !tank || !bed || pump.maxHead === undefined || !pump.maxFlow)
      throw new Error('scenario changed');
    const k = scenario.lossCoefficients;
    const v = pipe(frictionPipes(scenario), 'pump main pipe').velocityMPerS;
    expect(pipe(frictionPipes(scenario), 'pump outlet to bed').velocityMPerS).toBeCloseTo(v, 12);
    const q = v * disc(0.0525);
    const velocityHead = (v * v) / (2 * G);
    // Parabola H = H0·(1 − (Q/Q0)²); main: entrance + one elbow; outlet: two elbows + exit.
    const pumpHeadM = pump.maxHead * (1 - (q / pump.maxFlow) ** 2);
    const liftM =
      Math.max(outlet.elevation, bed.floorElevation + bed.initialLevel) -
      (tank.floorElevation + tank.initialLevel);
    const lossesM =
      hw(pump.main.length, q, pump.main.hazenWilliamsC, 0.0525) +
      hw(outlet.pipe.length, q, outlet.pipe.hazenWilliamsC, 0.0525) +
      (k.entrance + 3 * k.elbow90 + k.exit) * velocityHead;
    expect(v).toBeGreaterThan(0.3);
    expect((liftM + lossesM) / pumpHeadM).toBeCloseTo(1, 8);
  });

  it('gives a drain its full-bore flow at standpipe height: its losses use the whole drop', () => {
    const scenario = largePipeScenario();
    const bed = scenario.vessels.find((v) => v.kind === 'bed');
    if (bed?.kind !== 'bed') throw new Error('scenario changed');
    const { drain } = bed;
    const k = scenario.lossCoefficients;
    const v = pipe(frictionPipes(scenario), 'bed drain pipe').velocityMPerS;
    expect(pipe(frictionPipes(scenario), 'bed standpipe').velocityMPerS).toBeCloseTo(v, 12);
    const q = v * disc(0.0525);
    const velocityHead = (v * v) / (2 * G);
    const dropM = bed.floorElevation + drain.standpipe.height - drain.outletElevation;
    // Entrance at the bore, standpipe and drain-pipe friction, two elbows, exit.
    const lossesM =
      k.exit * velocityHead +
      drain.dischargeLossMultiplier *
        ((k.entrance + 2 * k.elbow90) * velocityHead +
          hw(drain.standpipe.height + drain.pipe.length, q, drain.pipe.hazenWilliamsC, 0.0525));
    expect(lossesM / dropM).toBeCloseTo(1, 8);
  });
});
