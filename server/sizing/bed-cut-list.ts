/** The cut list of a bed's drain: what to cut, how long, and what to buy. */
import type { BedCutList, PartLine } from '../../shared/contracts/sizing';
import type { BedVessel, BellSiphonDrain, Fittings } from '../../shared/scenario/index';
import { defaultFittingDepthM, nominalPipeSize } from './pipe-sizes';

const FITTING_NAMES: Readonly<Record<keyof Fittings, string>> = {
  elbow90: '90° elbow',
  elbow45: '45° elbow',
  teeRun: 'Tee (through the run)',
  teeBranch: 'Tee (through the branch)',
  ballValve: 'Ball valve',
};

function bellPart(bed: BedVessel, drain: BellSiphonDrain): NonNullable<BedCutList['bell']> {
  const { bell, standpipe } = drain;
  const slotted = bell.slotCount !== undefined && bell.slotWidth !== undefined;
  // Slotted, the bell stands on the floor; otherwise spacers lift it by the intake height.
  const lengthM = standpipe.height + bell.capGap - (slotted ? 0 : bell.intakeHeight);
  return {
    innerDiameterM: bell.innerDiameter,
    size: nominalPipeSize({ insideM: bell.innerDiameter }),
    lengthM,
    capGapM: bell.capGap,
    standsOn: slotted ? 'slots' : 'spacers',
    intakeHeightM: bell.intakeHeight,
    slotCount: bell.slotCount ?? null,
    slotWidthM: bell.slotWidth ?? null,
    snorkelHeightM: bell.snorkelHeight ?? null,
  };
}

function drainParts(
  bed: BedVessel,
  cut: Pick<BedCutList, 'standpipe' | 'bell' | 'guard'>,
): PartLine[] {
  const { drain } = bed;
  const pipeSize = nominalPipeSize({ insideM: drain.pipe.innerDiameter });
  const parts: PartLine[] = [
    {
      item: 'Bulkhead fitting through the bed floor',
      quantity: 1,
      size: cut.standpipe.size,
      lengthM: null,
      note: 'sized for the standpipe',
    },
    { item: 'Standpipe', quantity: 1, size: cut.standpipe.size, lengthM: cut.standpipe.cutLengthM },
  ];
  if (cut.bell) {
    parts.push(
      { item: 'Bell', quantity: 1, size: cut.bell.size, lengthM: cut.bell.lengthM },
      { item: 'Bell end cap', quantity: 1, size: cut.bell.size, lengthM: null },
    );
  }
  if (cut.guard)
    parts.push({
      item: 'Media guard (perforated pipe)',
      quantity: 1,
      size: cut.guard.size,
      lengthM: cut.guard.lengthM,
      note: 'holes smaller than the smallest media',
    });
  parts.push({
    item: 'Drain pipe below the bed',
    quantity: 1,
    size: pipeSize,
    lengthM: drain.pipe.length,
  });
  for (const key of Object.keys(FITTING_NAMES) as (keyof Fittings)[]) {
    const count = drain.pipe.fittings[key];
    if (count > 0)
      parts.push({ item: FITTING_NAMES[key], quantity: count, size: pipeSize, lengthM: null });
  }
  return parts;
}

/**
 * The cut list of a bed's drain. Standpipe cut length = its height above the bed floor + the depth
 * it sits into the bulkhead fitting below the floor (`fittingDepthM`, else the socket depth of its
 * size). Bell length = standpipe height + cap gap when it stands on slots, less the intake height
 * when it stands on spacers (the cap's socket takes the pipe end). Media guard cut to the bed's rim
 * so media cannot fall in (common practice, no source).
 */
export function bedCutList(bed: BedVessel, fittingDepthM?: number): BedCutList {
  const { drain } = bed;
  const { standpipe } = drain;
  const depthM = fittingDepthM ?? defaultFittingDepthM(standpipe.outerDiameter);
  const size = nominalPipeSize({
    insideM: standpipe.innerDiameter,
    outsideM: standpipe.outerDiameter,
  });
  const cut = {
    standpipe: {
      innerDiameterM: standpipe.innerDiameter,
      outerDiameterM: standpipe.outerDiameter,
      size,
      heightAboveFloorM: standpipe.height,
      fittingDepthM: depthM,
      fittingDepthSource:
        fittingDepthM === undefined
          ? 'Schedule 40 socket depth of its size (ASTM D2466, from memory); measure your fitting'
          : 'entered',
      cutLengthM: standpipe.height + depthM,
    },
    bell: drain.type === 'bell-siphon' ? bellPart(bed, drain) : null,
    guard: drain.guard
      ? {
          diameterM: drain.guard.diameter,
          size: nominalPipeSize({ insideM: drain.guard.diameter, outsideM: drain.guard.diameter }),
          lengthM: bed.height,
        }
      : null,
  };
  return {
    bedId: bed.id,
    drainType: drain.type,
    ...cut,
    weepHoleDiameterM: drain.type === 'standpipe' ? (drain.weepHole?.diameter ?? null) : null,
    parts: drainParts(bed, cut),
  };
}
