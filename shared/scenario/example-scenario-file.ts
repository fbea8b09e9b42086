import type { ScenarioFile } from './scenario-input-schema';

/**
 * A small valid scenario file with units written as people write them: a 1.2 × 0.8 m fish tank,
 * one gravel bed with a 1-inch bell siphon, one pump. Used by tests and as a starting template.
 */
export const EXAMPLE_SCENARIO_FILE: ScenarioFile = {
  format: 'scenario/1',
  name: 'One bed on a 670 L tank',
  water: { temperature: '24 degC' },
  vessels: [
    {
      id: 'tank',
      kind: 'tank',
      shape: { type: 'box', length: '1.2 m', width: '0.8 m' },
      floorElevation: '0 m',
      height: '0.7 m',
      initialLevel: '0.55 m',
      minLevel: '0.40 m',
      overflow: { elevation: '0.62 m', diameter: '40 mm', to: 'out' },
    },
    {
      id: 'bed-a',
      kind: 'bed',
      shape: { type: 'box', length: '1.0 m', width: '0.6 m' },
      floorElevation: '0.8 m',
      height: '0.32 m',
      initialLevel: '0 m',
      media: { type: 'gravel', depth: '0.30 m' },
      drain: {
        type: 'bell-siphon',
        to: 'tank',
        standpipe: { innerDiameter: '26.6 mm', outerDiameter: '33.4 mm', height: '0.25 m' },
        bell: { innerDiameter: '77.9 mm', capGap: '25 mm', intakeHeight: '25 mm' },
        pipe: { length: '0.7 m', innerDiameter: '26.6 mm', fittings: { elbow90: 2 } },
        outletElevation: '0.65 m',
      },
    },
  ],
  pumps: [
    {
      id: 'pump',
      in: 'tank',
      intakeHeight: '0.30 m',
      curve: [
        { flow: '0 L/h', head: '2.2 m' },
        { flow: '1200 L/h', head: '1.4 m' },
        { flow: '2000 L/h', head: '0 m' },
      ],
      power: '35 W',
      checkValve: false,
      main: { length: '0.5 m', innerDiameter: '20.9 mm', material: 'pvc' },
      outlets: [
        {
          to: 'bed-a',
          elevation: '1.2 m',
          valveOpening: 1,
          pipe: {
            length: '1.5 m',
            innerDiameter: '15.8 mm',
            material: 'pvc',
            fittings: { elbow90: 3 },
          },
        },
      ],
    },
  ],
  run: { duration: '6 h', outputInterval: '5 s' },
};
