import type { BedCutList } from '../../../../shared/contracts/sizing';
import { bellWords, guardWords, standpipeWords } from './cut-words';

const bed: BedCutList = {
  bedId: 'bed-a',
  drainType: 'bell-siphon',
  standpipe: {
    innerDiameterM: 0.0266,
    outerDiameterM: 0.0334,
    size: '1 in Schedule 40',
    heightAboveFloorM: 0.25,
    fittingDepthM: 0.0222,
    fittingDepthSource: 'default',
    cutLengthM: 0.2722,
  },
  bell: {
    innerDiameterM: 0.0779,
    size: '3 in Schedule 40',
    lengthM: 0.275,
    capGapM: 0.025,
    standsOn: 'slots',
    intakeHeightM: 0.025,
    slotCount: 6,
    slotWidthM: 0.006,
    snorkelHeightM: null,
  },
  guard: null,
  weepHoleDiameterM: null,
  parts: [],
};

describe('cut list words', () => {
  it('gives the standpipe cut as its height above the floor plus the fitting depth, in millimetres or inches', () => {
    expect(standpipeWords(bed, 'metric')).toBe(
      'Cut the standpipe (1 in Schedule 40) to 272 mm: 250 mm above the bed floor plus 22.2 mm into the bulkhead fitting.',
    );
    expect(standpipeWords(bed, 'us')).toContain('to 10.7 in');
  });

  it('describes the bell on slots or on spacers, and no guard when there is none', () => {
    expect(bellWords(bed, 'metric')).toContain('with 6 slots 6.00 mm wide and 25.0 mm high');
    const raised = {
      ...bed,
      bell: bed.bell && {
        ...bed.bell,
        standsOn: 'spacers' as const,
        slotCount: null,
        slotWidthM: null,
      },
    };
    expect(bellWords(raised, 'metric')).toContain('raised 25.0 mm off the floor on spacers');
    expect(guardWords(bed, 'metric')).toBeNull();
    expect(bellWords({ ...bed, bell: null }, 'metric')).toBeNull();
  });
});
