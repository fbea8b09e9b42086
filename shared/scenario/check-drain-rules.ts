import type { RuleIssue } from './rule-issue';
import type { ScenarioFields } from './scenario-input-schema';

type BedFields = Extract<ScenarioFields['vessels'][number], { kind: 'bed' }>;

/** The smallest width across a bed's plan (m), or undefined for a level-to-area table. */
function planWidthM(bed: BedFields): number | undefined {
  if (bed.shape.type === 'box') return Math.min(bed.shape.length, bed.shape.width);
  if (bed.shape.type === 'cylinder') return bed.shape.diameter;
  return undefined;
}

/**
 * Geometry of a bed's drain: standpipe wall, standpipe shorter than the bed, outlet below the bed
 * floor, and for a bell siphon: bell wider than the standpipe, intake and snorkel below the
 * standpipe top, slots that fit round the bell, guard wider than the bell, all inside the bed.
 */
export function checkDrainRules(bed: BedFields, index: number): RuleIssue[] {
  const issues: RuleIssue[] = [];
  const at = (...path: (string | number)[]) => ['vessels', index, 'drain', ...path];
  const { drain } = bed;
  const { standpipe } = drain;
  if (standpipe.outerDiameter <= standpipe.innerDiameter) {
    issues.push({
      path: at('standpipe', 'outerDiameter'),
      message: 'The standpipe outer diameter must be larger than its inner diameter.',
    });
  }
  if (standpipe.height >= bed.height) {
    issues.push({
      path: at('standpipe', 'height'),
      message: `The standpipe must be shorter than the bed (${bed.height} m), or the bed overflows its rim before it drains.`,
    });
  }
  if (drain.outletElevation >= bed.floorElevation) {
    issues.push({
      path: at('outletElevation'),
      message: `The drain outlet must be below the bed floor (elevation ${bed.floorElevation} m above the datum).`,
    });
  }
  if (
    drain.type === 'standpipe' &&
    drain.weepHole !== undefined &&
    drain.weepHole.diameter >= standpipe.innerDiameter
  ) {
    issues.push({
      path: at('weepHole', 'diameter'),
      message: 'The weep hole must be smaller than the standpipe bore.',
    });
  }
  const outerM =
    drain.type === 'bell-siphon'
      ? (drain.bell.outerDiameter ?? drain.bell.innerDiameter)
      : standpipe.outerDiameter;
  if (drain.type === 'bell-siphon') issues.push(...checkBellRules(drain, at));
  if (drain.guard !== undefined && drain.guard.diameter <= outerM) {
    issues.push({
      path: at('guard', 'diameter'),
      message: 'The media guard must be wider than the bell (or standpipe) it surrounds.',
    });
  }
  const widthM = planWidthM(bed);
  const widestM = drain.guard?.diameter ?? outerM;
  if (widthM !== undefined && widestM >= widthM) {
    const path =
      drain.guard !== undefined
        ? at('guard', 'diameter')
        : drain.type === 'bell-siphon'
          ? at('bell', 'innerDiameter')
          : at('standpipe', 'outerDiameter');
    issues.push({
      path,
      message: `The drain parts must fit inside the bed (narrowest plan width ${widthM} m).`,
    });
  }
  return issues;
}

type BellDrainFields = Extract<BedFields['drain'], { type: 'bell-siphon' }>;

function checkBellRules(
  drain: BellDrainFields,
  at: (...path: (string | number)[]) => (string | number)[],
): RuleIssue[] {
  const issues: RuleIssue[] = [];
  const { bell, standpipe } = drain;
  if (bell.innerDiameter <= standpipe.outerDiameter) {
    issues.push({
      path: at('bell', 'innerDiameter'),
      message: `The bell's inner diameter must be larger than the standpipe's outer diameter (${standpipe.outerDiameter} m).`,
    });
  }
  if (bell.outerDiameter !== undefined && bell.outerDiameter < bell.innerDiameter) {
    issues.push({
      path: at('bell', 'outerDiameter'),
      message: "The bell's outer diameter must not be smaller than its inner diameter.",
    });
  }
  if (bell.intakeHeight >= standpipe.height) {
    issues.push({
      path: at('bell', 'intakeHeight'),
      message: `The bell intake must be below the standpipe top (${standpipe.height} m above the bed floor).`,
    });
  }
  if (bell.snorkelHeight !== undefined && bell.snorkelHeight >= standpipe.height) {
    issues.push({
      path: at('bell', 'snorkelHeight'),
      message: 'The snorkel inlet must be below the standpipe top.',
    });
  }
  if ((bell.slotCount === undefined) !== (bell.slotWidth === undefined)) {
    issues.push({
      path: at('bell', bell.slotCount === undefined ? 'slotCount' : 'slotWidth'),
      message: 'Give both the slot count and the slot width, or neither.',
    });
  } else if (
    bell.slotCount !== undefined &&
    bell.slotWidth !== undefined &&
    bell.slotCount * bell.slotWidth >= Math.PI * bell.innerDiameter
  ) {
    issues.push({
      path: at('bell', 'slotCount'),
      message: "The slots are wider in total than the bell's circumference.",
    });
  }
  return issues;
}
