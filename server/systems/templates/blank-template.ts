/** Template "blank": a single fish tank and nothing else, to build a system from scratch. */
import type { ScenarioFile } from '../../../shared/scenario/index';

/** The blank template (scenario file format). */
export const BLANK_TEMPLATE: ScenarioFile = {
  format: 'scenario/1',
  name: 'New system',
  vessels: [
    {
      id: 'tank',
      kind: 'tank',
      shape: { type: 'box', length: '1.0 m', width: '0.6 m' },
      floorElevation: '0 m',
      height: '0.6 m',
      initialLevel: '0.5 m',
    },
  ],
  run: { duration: '6 h', outputInterval: '5 s' },
};
