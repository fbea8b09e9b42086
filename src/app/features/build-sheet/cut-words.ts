import type { BedCutList } from '../../../../shared/contracts/sizing';
import { type UnitSystem, formatQuantity } from '../../../../shared/scenario';

/** A cut length in mm (or inches): builders measure pipe in those. */
export const cutLength = (m: number, system: UnitSystem): string =>
  formatQuantity(m, 'diameter', system);

/** The standpipe line of a cut list in words. */
export function standpipeWords(bed: BedCutList, system: UnitSystem): string {
  const s = bed.standpipe;
  return `Cut the standpipe${s.size ? ` (${s.size})` : ''} to ${cutLength(s.cutLengthM, system)}: ${cutLength(s.heightAboveFloorM, system)} above the bed floor plus ${cutLength(s.fittingDepthM, system)} into the bulkhead fitting.`;
}

/** The bell line in words; null for a plain standpipe. */
export function bellWords(bed: BedCutList, system: UnitSystem): string | null {
  const b = bed.bell;
  if (!b) return null;
  const stands =
    b.standsOn === 'slots'
      ? `standing on the floor, with ${b.slotCount ?? 0} slots ${cutLength(b.slotWidthM ?? 0, system)} wide and ${cutLength(b.intakeHeightM, system)} high cut into its foot`
      : `raised ${cutLength(b.intakeHeightM, system)} off the floor on spacers (the gap is its intake)`;
  const snorkel =
    b.snorkelHeightM === null
      ? ''
      : ` A snorkel takes air in at ${cutLength(b.snorkelHeightM, system)} above the floor.`;
  return `Cut the bell${b.size ? ` (${b.size})` : ''} to ${cutLength(b.lengthM, system)} and cap it, leaving ${cutLength(b.capGapM, system)} between the standpipe top and the cap; ${stands}.${snorkel}`;
}

/** The media guard line in words; null without a guard. */
export function guardWords(bed: BedCutList, system: UnitSystem): string | null {
  const g = bed.guard;
  if (!g) return null;
  return `Media guard${g.size ? ` (${g.size})` : ` ${cutLength(g.diameterM, system)} across`}: cut to ${cutLength(g.lengthM, system)}, the bed's rim, with holes smaller than the smallest media.`;
}
