/**
 * A small scenario document for specs and the blank editor: a 400 L tank feeding two gravel beds
 * with bell siphons (our own example system).
 */
export const EXAMPLE_TWO_BED_SCENARIO = {
  format: 'scenario/1',
  name: 'Two beds on a 400 L tank',
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
      media: { type: 'gravel', porosity: 0.42, depth: '0.30 m' },
      drain: {
        type: 'bell-siphon',
        to: 'tank',
        standpipe: { innerDiameter: '26.6 mm', outerDiameter: '33.4 mm', height: '0.25 m' },
        bell: { innerDiameter: '77.9 mm', capGap: '25 mm', intakeHeight: '25 mm' },
        pipe: {
          length: '0.7 m',
          innerDiameter: '26.6 mm',
          roughness: '0.0015 mm',
          fittings: { elbow90: 2 },
        },
        outletElevation: '0.65 m',
      },
    },
    {
      id: 'bed-b',
      kind: 'bed',
      shape: { type: 'box', length: '0.8 m', width: '0.6 m' },
      floorElevation: '0.8 m',
      height: '0.3 m',
      initialLevel: '0 m',
      media: { type: 'expanded-clay', depth: '0.28 m' },
      drain: {
        type: 'bell-siphon',
        to: 'tank',
        standpipe: { innerDiameter: '26.6 mm', outerDiameter: '33.4 mm', height: '0.22 m' },
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
      main: { length: '0.5 m', innerDiameter: '20.9 mm', material: 'pvc' },
      outlets: [
        {
          to: 'bed-a',
          elevation: '1.2 m',
          valveOpening: 1,
          pipe: { length: '1.5 m', innerDiameter: '15.8 mm', fittings: { elbow90: 3 } },
        },
        {
          to: 'bed-b',
          elevation: '1.2 m',
          valveOpening: 0.8,
          pipe: { length: '2.5 m', innerDiameter: '15.8 mm', fittings: { elbow90: 3 } },
        },
      ],
    },
  ],
  run: { duration: '2 h', outputInterval: '5 s' },
} as const;
