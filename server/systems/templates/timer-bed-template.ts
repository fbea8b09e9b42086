/**
 * Template "timer-bed": one gravel bed flooded by a pump on a timer (15 minutes on at the top of
 * each hour) and drained by a plain standpipe with a weep hole at its foot, over a 450 L tank.
 * Our own example values; 3/4-inch Schedule 40 PVC sizes (ASTM D1785: OD 26.7 mm, ID 20.9 mm).
 */
import type { ScenarioFile } from '../../../shared/scenario/index';

const HOURS = 6;
const schedule = Array.from({ length: HOURS }, (_, hour) => [
  { at: `${hour} h`, pump: 'pump', state: 'on' as const },
  { at: `${hour * 60 + 15} min`, pump: 'pump', state: 'off' as const },
]).flat();

/** The timer-driven bed template (scenario file format). */
export const TIMER_BED_TEMPLATE: ScenarioFile = {
  format: 'scenario/1',
  name: 'Timer-flooded bed',
  description:
    'A pump on a timer floods one gravel bed; a standpipe caps the level and a weep hole drains it.',
  water: { temperature: '22 degC' },
  vessels: [
    {
      id: 'tank',
      kind: 'tank',
      shape: { type: 'box', length: '1.0 m', width: '0.75 m' },
      floorElevation: '0 m',
      height: '0.65 m',
      initialLevel: '0.55 m',
      minLevel: '0.40 m',
      overflow: { elevation: '0.60 m', diameter: '40 mm', to: 'out' },
    },
    {
      id: 'bed',
      kind: 'bed',
      shape: { type: 'box', length: '1.2 m', width: '0.6 m' },
      floorElevation: '0.75 m',
      height: '0.30 m',
      initialLevel: '0 m',
      media: { type: 'gravel', depth: '0.28 m' },
      drain: {
        type: 'standpipe',
        to: 'tank',
        standpipe: { innerDiameter: '20.9 mm', outerDiameter: '26.7 mm', height: '0.22 m' },
        weepHole: { diameter: '5 mm' },
        pipe: {
          length: '0.6 m',
          innerDiameter: '20.9 mm',
          material: 'pvc',
          fittings: { elbow90: 1 },
        },
        outletElevation: '0.65 m',
      },
    },
  ],
  pumps: [
    {
      id: 'pump',
      in: 'tank',
      intakeHeight: '0.05 m',
      maxHead: '1.8 m',
      maxFlow: '1000 L/h',
      power: '20 W',
      main: { length: '0.4 m', innerDiameter: '15.8 mm', material: 'pvc' },
      outlets: [
        {
          to: 'bed',
          elevation: '1.15 m',
          pipe: {
            length: '1.0 m',
            innerDiameter: '15.8 mm',
            material: 'pvc',
            fittings: { elbow90: 2 },
          },
        },
      ],
    },
  ],
  schedule,
  run: { duration: `${HOURS} h`, outputInterval: '5 s' },
};
