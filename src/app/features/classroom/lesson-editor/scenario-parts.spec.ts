import { EXAMPLE_SCENARIO_FILE } from '../../../../../shared/scenario';
import { scenarioParts } from './scenario-parts';

describe('scenarioParts', () => {
  it('splits the example system into its bed and its tank', () => {
    expect(scenarioParts({ ...EXAMPLE_SCENARIO_FILE })).toEqual({
      beds: ['bed-a'],
      stores: ['tank'],
    });
  });

  it('skips vessels without an id or kind, and a document without vessels', () => {
    const document = {
      vessels: [{ id: 'sump', kind: 'sump' }, { kind: 'bed' }, null, { id: 'b2', kind: 'bed' }],
    };
    expect(scenarioParts(document)).toEqual({ beds: ['b2'], stores: ['sump'] });
    expect(scenarioParts({})).toEqual({ beds: [], stores: [] });
  });
});
