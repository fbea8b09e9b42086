import { brokenRules, type RuleIssue } from './rule-issue';
import type { ScenarioFields } from './scenario-input-schema';

type BedFields = Extract<ScenarioFields['vessels'][number], { kind: 'bed' }>;
type BellDrainFields = Extract<BedFields['drain'], { type: 'bell-siphon' }>;
type At = (...path: (string | number)[]) => (string | number)[];

/** The smallest width across a bed's plan (m), or undefined for a level-to-area table. */
function planWidthM(bed: BedFields): number | undefined {
  if (bed.shape.type === 'box') return Math.min(bed.shape.length, bed.shape.width);
  if (bed.shape.type === 'cylinder') return bed.shape.diameter;
  return undefined;
}

/**
 * Geometry of a bed's drain: standpipe wall, standpipe shorter than the bed, outlet below the bed
 * floor, weep hole smaller than the bore, and for a bell siphon: bell wider than the standpipe,
 * intake and snorkel below the standpipe top, slots that fit round the bell; guard wider than the
 * bell; all of it inside the bed.
 */
export function checkDrainRules(bed: BedFields, index: number): RuleIssue[] {
  const at: At = (...path) => ['vessels', index, 'drain', ...path];
  const { drain } = bed;
  const { standpipe } = drain;
  const weepHole = drain.type === 'standpipe' ? drain.weepHole : undefined;
  return [
    ...brokenRules([
      [
        standpipe.outerDiameter <= standpipe.innerDiameter,
        at('standpipe', 'outerDiameter'),
        'The standpipe outer diameter must be larger than its inner diameter.',
      ],
      [
        standpipe.height >= bed.height,
        at('standpipe', 'height'),
        `The standpipe must be shorter than the bed (${bed.height} m), or the bed overflows its rim before it drains.`,
      ],
      [
        drain.outletElevation >= bed.floorElevation,
        at('outletElevation'),
        `The drain outlet must be below the bed floor (elevation ${bed.floorElevation} m above the datum).`,
      ],
      [
        weepHole !== undefined && weepHole.diameter >= standpipe.innerDiameter,
        at('weepHole', 'diameter'),
        'The weep hole must be smaller than the standpipe bore.',
      ],
    ]),
    ...(drain.type === 'bell-siphon' ? checkBellRules(drain, at) : []),
    ...checkFitRules(bed, at),
  ];
}

/** The guard surrounds the bell (or standpipe), and the widest part fits inside the bed. */
function checkFitRules(bed: BedFields, at: At): RuleIssue[] {
  const { drain } = bed;
  const bell = drain.type === 'bell-siphon';
  const outerM = bell
    ? (drain.bell.outerDiameter ?? drain.bell.innerDiameter)
    : drain.standpipe.outerDiameter;
  const widthM = planWidthM(bed);
  const widestM = drain.guard?.diameter ?? outerM;
  const widestPath =
    drain.guard !== undefined
      ? at('guard', 'diameter')
      : bell
        ? at('bell', 'innerDiameter')
        : at('standpipe', 'outerDiameter');
  return brokenRules([
    [
      drain.guard !== undefined && drain.guard.diameter <= outerM,
      at('guard', 'diameter'),
      'The media guard must be wider than the bell (or standpipe) it surrounds.',
    ],
    [
      widthM !== undefined && widestM >= widthM,
      widestPath,
      `The drain parts must fit inside the bed (narrowest plan width ${widthM} m).`,
    ],
  ]);
}

function checkBellRules(drain: BellDrainFields, at: At): RuleIssue[] {
  const { bell, standpipe } = drain;
  const slotsHalfGiven = (bell.slotCount === undefined) !== (bell.slotWidth === undefined);
  const slotsTooWide =
    bell.slotCount !== undefined &&
    bell.slotWidth !== undefined &&
    bell.slotCount * bell.slotWidth >= Math.PI * bell.innerDiameter;
  return brokenRules([
    [
      bell.innerDiameter <= standpipe.outerDiameter,
      at('bell', 'innerDiameter'),
      `The bell's inner diameter must be larger than the standpipe's outer diameter (${standpipe.outerDiameter} m).`,
    ],
    [
      bell.outerDiameter !== undefined && bell.outerDiameter < bell.innerDiameter,
      at('bell', 'outerDiameter'),
      "The bell's outer diameter must not be smaller than its inner diameter.",
    ],
    [
      bell.intakeHeight >= standpipe.height,
      at('bell', 'intakeHeight'),
      `The bell intake must be below the standpipe top (${standpipe.height} m above the bed floor).`,
    ],
    [
      bell.snorkelHeight !== undefined && bell.snorkelHeight >= standpipe.height,
      at('bell', 'snorkelHeight'),
      'The snorkel inlet must be below the standpipe top.',
    ],
    [
      slotsHalfGiven,
      at('bell', bell.slotCount === undefined ? 'slotCount' : 'slotWidth'),
      'Give both the slot count and the slot width, or neither.',
    ],
    [
      slotsTooWide,
      at('bell', 'slotCount'),
      "The slots are wider in total than the bell's circumference.",
    ],
  ]);
}
