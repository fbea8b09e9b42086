import { describe, expect, it } from 'vitest';
import { parseScenario, type Scenario, type ScenarioFile } from '../../shared/scenario';
import { simulate, type RunEvent, type SimulationResult } from '../index';

function parsed(file: ScenarioFile): Scenario {
  const result = parseScenario(file);
  if (!result.success) throw new Error(JSON.stringify(result.issues));
  return result.scenario;
}

const box = (length: number, width: number) => ({ type: 'box' as const, length, width });
const pipe = (length: number, innerDiameter: number) => ({ length, innerDiameter });
const kinds = (result: SimulationResult, kind: string): RunEvent[] =>
  result.events.filter((e) => e.kind === kind);
const channel = (result: SimulationResult, id: string): number[] =>
  result.series.channels.find((c) => c.id === id)?.values ?? [];

/** A pump lifting water from `low` into `high`, a tank whose only way out is a drain pipe to `sump`. */
function transferFile(
  extra: Partial<ScenarioFile> = {},
  pumpExtra: Record<string, unknown> = {},
): ScenarioFile {
  return {
    format: 'scenario/1',
    name: 'pump transfer',
    vessels: [
      { id: 'low', kind: 'tank', shape: box(0.6, 0.5), height: 0.6, initialLevel: 0.4 },
      {
        id: 'high',
        kind: 'tank',
        shape: box(1, 1),
        floorElevation: 0.8,
        height: 0.6,
        initialLevel: 0.1,
      },
    ],
    pumps: [
      {
        id: 'p',
        in: 'low',
        intakeHeight: 0.1,
        maxHead: 2.5,
        maxFlow: '1500 L/h',
        main: pipe(0.8, 0.0209),
        outlets: [{ to: 'high', elevation: 1.5, pipe: pipe(1, 0.0158) }],
        ...pumpExtra,
      },
    ],
    run: { duration: 1800, outputInterval: 5 },
    ...extra,
  };
}

describe('pump line', () => {
  it('runs dry with its source exactly at the intake and stays dry while the level does not recover', () => {
    const scenario = parsed(transferFile());
    const { result } = simulate(scenario);
    const dry = kinds(result, 'pump-dry');
    expect(dry).toHaveLength(1);
    const low = result.summary.vessels.find((v) => v.id === 'low');
    expect(low?.minLevel_m).toBeCloseTo(0.1, 7);
    expect(result.summary.pumps[0]?.dry_s).toBeCloseTo(1800 - (dry[0]?.t_s ?? 0), 6);
    expect(kinds(result, 'pump-restart')).toHaveLength(0);
  });

  it('fills its pipes from the source at the start and lets them drain back at a power cut without a check valve', () => {
    const file = transferFile({ schedule: [{ at: 60, power: 'off' }] });
    const { result } = simulate(parsed(file));
    const volume = channel(result, 'volume:low');
    // At a transition the series holds the state just before and just after, in that order.
    const after = result.series.t_s.lastIndexOf(60);
    const lineM3 = (Math.PI / 4) * (0.0209 ** 2 * 0.8 + 0.0158 ** 2 * 1);
    expect(kinds(result, 'pump-off').map((e) => e.t_s)).toEqual([60]);
    expect((volume[after] as number) - (volume[after - 1] as number)).toBeCloseTo(lineM3, 12);
  });

  it('keeps its pipes full at a power cut with a check valve', () => {
    const { result } = simulate(
      parsed(transferFile({ schedule: [{ at: 60, power: 'off' }] }, { checkValve: true })),
    );
    const volume = channel(result, 'volume:low');
    const after = result.series.t_s.lastIndexOf(60);
    expect(result.series.t_s[after - 1]).toBe(60);
    expect(volume[after]).toBe(volume[after - 1]);
    expect(kinds(result, 'pump-off').map((e) => e.t_s)).toEqual([60]);
  });

  it('back-siphons through a drowned outlet after a power cut until the outlet is uncovered', () => {
    const file: ScenarioFile = {
      format: 'scenario/1',
      name: 'sump pump into a tank through a drowned outlet',
      vessels: [
        {
          id: 'sump',
          kind: 'sump',
          shape: box(1, 1),
          floorElevation: -0.8,
          height: 0.7,
          initialLevel: 0.3,
        },
        {
          id: 'tank',
          kind: 'tank',
          shape: box(1, 0.8),
          height: 0.7,
          initialLevel: 0.55,
          overflow: { elevation: 0.6, diameter: 0.04, to: 'sump' },
        },
      ],
      pumps: [
        {
          id: 'p',
          in: 'sump',
          intakeHeight: 0.05,
          maxHead: 2.5,
          maxFlow: '1500 L/h',
          main: pipe(1, 0.0209),
          outlets: [{ to: 'tank', elevation: 0.4, pipe: pipe(1, 0.0209) }],
        },
      ],
      schedule: [{ at: 120, power: 'off' }],
      run: { duration: 1800, outputInterval: 5 },
    };
    const { result } = simulate(parsed(file));
    const start = kinds(result, 'back-siphon-start');
    const end = kinds(result, 'back-siphon-end');
    expect(start.map((e) => e.t_s)).toEqual([120]);
    expect(end).toHaveLength(1);
    const level = channel(result, 'level:tank');
    const endIndex = result.series.t_s.lastIndexOf(end[0]?.t_s ?? -1);
    expect(level[endIndex]).toBeCloseTo(0.4, 6);
    expect(result.massBalanceError).toBeLessThan(1e-12);
  });

  it('is held off by a float switch below its stop level and released above its restart level', () => {
    const file = transferFile({
      controls: [
        { kind: 'float-switch', pump: 'p', vessel: 'low', stopBelow: 0.2, restartAbove: 0.3 },
      ],
    });
    const { result } = simulate(parsed(file));
    const off = kinds(result, 'pump-off');
    expect(off).toHaveLength(1);
    expect(off[0]?.detail).toContain('float switch');
    expect(result.summary.vessels.find((v) => v.id === 'low')?.minLevel_m).toBeCloseTo(0.2, 7);
    expect(result.summary.pumps[0]?.dry_s).toBe(0);
  });
});
