/**
 * A one-bed test system whose pump delivers an almost constant flow: a pump with a 40 m shut-off
 * head lifting water about 1 m, so its flow changes by well under 0.1 % as the tank level moves.
 * The bed's inflow is then a clean sweep variable for comparing the engine with the window solver.
 */
import { parseScenario, type Scenario } from '../../shared/scenario';
import { withChanges } from '../../shared/scenario/testing/with-changes';

/** The scenario file of the test system (units as people write them). */
export const ONE_BED_SYSTEM_FILE = {
  format: 'scenario/1',
  name: 'One gravel bed on a near-constant pump',
  water: { temperature: '20 degC' },
  vessels: [
    {
      id: 'tank',
      kind: 'tank',
      shape: { type: 'box', length: '1.0 m', width: '0.6 m' },
      height: '0.6 m',
      initialLevel: '0.45 m',
    },
    {
      id: 'bed',
      kind: 'bed',
      shape: { type: 'box', length: '0.8 m', width: '0.5 m' },
      floorElevation: '0.8 m',
      height: '0.3 m',
      initialLevel: '0 m',
      media: { type: 'gravel', depth: '0.28 m' },
      drain: {
        type: 'bell-siphon',
        to: 'tank',
        standpipe: { innerDiameter: '26.6 mm', outerDiameter: '33.4 mm', height: '0.22 m' },
        bell: { innerDiameter: '77.9 mm', capGap: '25 mm', intakeHeight: '25 mm' },
        pipe: { length: '0.6 m', innerDiameter: '26.6 mm', fittings: { elbow90: 1 } },
        outletElevation: '0.6 m',
      },
    },
  ],
  pumps: [
    {
      id: 'pump',
      in: 'tank',
      intakeHeight: '0.05 m',
      maxHead: '40 m',
      maxFlow: '1000 L/h',
      main: { length: '0.5 m', innerDiameter: '26.6 mm' },
      outlets: [
        { to: 'bed', elevation: '1.2 m', pipe: { length: '1.0 m', innerDiameter: '26.6 mm' } },
      ],
    },
  ],
  run: { duration: '2 h', outputInterval: '10 s' },
};

/** The test system with `changes` applied at their paths (see `withChanges`), normalised. */
export function oneBedSystem(changes: Record<string, unknown> = {}): Scenario {
  const parsed = parseScenario(withChanges(changes, ONE_BED_SYSTEM_FILE));
  if (!parsed.success) throw new Error(`Invalid test system: ${JSON.stringify(parsed.issues)}`);
  return parsed.scenario;
}

/** The same scenario with the pump's flows scaled by `flowScale` (its curve stretched along the flow axis). */
export function withPumpFlowScale(scenario: Scenario, flowScale: number): Scenario {
  return { ...scenario, pumps: scenario.pumps.map((pump) => ({ ...pump, flowScale })) };
}
