import { describe, expect, it } from 'vitest';
import { parseScenario, type Scenario, type ScenarioFile } from '../../shared/scenario';
import { simulate, type RunEvent } from '../index';

/** One gravel bed with a 1-inch bell siphon over a tank, fed at about 18 L/min. */
function bedFile(
  drainExtra: Record<string, unknown> = {},
  bellExtra: Record<string, unknown> = {},
  faults: ScenarioFile['faults'] = [],
): ScenarioFile {
  return {
    format: 'scenario/1',
    name: 'one bell siphon',
    vessels: [
      {
        id: 'tank',
        kind: 'tank',
        shape: { type: 'box', length: 1.2, width: 0.8 },
        height: 0.7,
        initialLevel: 0.55,
      },
      {
        id: 'bed',
        kind: 'bed',
        shape: { type: 'box', length: 1, width: 0.6 },
        floorElevation: 0.8,
        height: 0.32,
        initialLevel: 0,
        media: { type: 'gravel', depth: 0.3 },
        drain: {
          type: 'bell-siphon',
          to: 'tank',
          standpipe: { innerDiameter: 0.0266, outerDiameter: 0.0334, height: 0.25 },
          bell: { innerDiameter: 0.0779, capGap: 0.025, intakeHeight: 0.025, ...bellExtra },
          pipe: { length: 0.7, innerDiameter: 0.0266, fittings: { elbow90: 2 } },
          outletElevation: 0.65,
          ...drainExtra,
        },
      },
    ],
    pumps: [
      {
        id: 'pump',
        in: 'tank',
        intakeHeight: 0.3,
        curve: [
          { flow: 0, head: 2.2 },
          { flow: '1200 L/h', head: 1.4 },
          { flow: '2000 L/h', head: 0 },
        ],
        main: { length: 0.5, innerDiameter: 0.0209 },
        outlets: [
          {
            to: 'bed',
            elevation: 1.2,
            pipe: { length: 1.5, innerDiameter: 0.0158, fittings: { elbow90: 3 } },
          },
        ],
      },
    ],
    faults,
    run: { duration: 3600, outputInterval: 5 },
  };
}

function parsed(file: ScenarioFile): Scenario {
  const result = parseScenario(file);
  if (!result.success) throw new Error(JSON.stringify(result.issues));
  return result.scenario;
}

const first = (events: readonly RunEvent[], kind: string): RunEvent => {
  const found = events.find((e) => e.kind === kind);
  if (!found) throw new Error(`no ${kind} event`);
  return found;
};
const value = (event: RunEvent, key: string): number => event.values?.[key] ?? Number.NaN;

describe('bell siphon phases', () => {
  it('primes at the level where the rim spill reaches Q_prime = k_p·√(g·D_s⁵)', () => {
    const scenario = parsed(bedFile());
    const { events } = simulate(scenario).result;
    const primed = first(events, 'primed');
    const drain = scenario.vessels[1]?.kind === 'bed' ? scenario.vessels[1].drain : undefined;
    if (drain?.type !== 'bell-siphon') throw new Error('no bell');
    const qPrime =
      drain.primingCoefficient * Math.sqrt(9.80665 * drain.standpipe.innerDiameter ** 5);
    expect(value(primed, 'primingFlowM3PerS')).toBeCloseTo(qPrime, 15);
    // The spill is the smaller of weir and bore flow, so the head for a flow is the larger of the
    // two inversions: weir H = (Q/(C_w·π·D_o))^(2/3), bore H = (Q/(C_d·π·D_i²/4))²/(2g).
    const { weirCoefficient, outerDiameter, dischargeCoefficient, innerDiameter } = drain.standpipe;
    const weirHeadM = (qPrime / (weirCoefficient * Math.PI * outerDiameter)) ** (2 / 3);
    const boreHeadM =
      (qPrime / (dischargeCoefficient * (Math.PI / 4) * innerDiameter ** 2)) ** 2 / (2 * 9.80665);
    const headM = Math.max(weirHeadM, boreHeadM);
    expect(value(primed, 'levelM')).toBeCloseTo(drain.standpipe.height + headM, 7);
    expect(value(primed, 'spillNumber')).toBeCloseTo(drain.primingCoefficient, 9);
  });

  it('breaks at the intake height and sends the water held in its pipes to the tank', () => {
    const { events } = simulate(parsed(bedFile())).result;
    const broken = first(events, 'siphon-break');
    expect(value(broken, 'levelM')).toBeCloseTo(0.025, 7);
    const pipeVolumeM3 = (Math.PI / 4) * (0.0266 ** 2 * 0.25 + 0.0266 ** 2 * 0.7);
    expect(value(broken, 'heldM3')).toBeCloseTo(pipeVolumeM3, 12);
  });

  it('breaks at the snorkel inlet when a snorkel is fitted', () => {
    const { events } = simulate(parsed(bedFile({}, { snorkelHeight: 0.06 }))).result;
    expect(value(first(events, 'siphon-break'), 'levelM')).toBeCloseTo(0.06, 7);
  });

  it('primes later (higher) with a larger priming coefficient', () => {
    const low = simulate(parsed(bedFile({ primingCoefficient: 0.5 }))).result.events;
    const high = simulate(parsed(bedFile({ primingCoefficient: 0.7 }))).result.events;
    expect(value(first(high, 'primed'), 'levelM')).toBeGreaterThan(
      value(first(low, 'primed'), 'levelM'),
    );
    expect(first(high, 'primed').t_s).toBeGreaterThan(first(low, 'primed').t_s);
  });

  it('drains more slowly with a partly blocked drain', () => {
    const clear = simulate(parsed(bedFile())).result.summary.beds[0];
    const blocked = simulate(
      parsed(bedFile({}, {}, [{ kind: 'drain-blocked', bed: 'bed', fraction: 0.2 }])),
    ).result.summary.beds[0];
    expect(blocked?.drainMean_s).toBeGreaterThan((clear?.drainMean_s ?? Infinity) * 1.2);
  });

  it('records the priming and break instants as phases 2 and 4 in the series', () => {
    const { series } = simulate(parsed(bedFile())).result;
    const phase = series.channels.find((c) => c.id === 'phase:bed');
    expect(phase?.values).toContain(2);
    expect(phase?.values).toContain(4);
    expect(new Set(phase?.values)).toEqual(new Set([0, 1, 2, 3, 4]));
  });
});
