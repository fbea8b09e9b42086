import type { BedVessel, Pump, Scenario, Shape, Vessel } from '../../../../../shared/scenario';

/** A rectangle in side elevation, metres: `x` its left edge, `z` its bottom above the datum. */
export interface ElevationBox {
  readonly kind: 'vessel' | 'water' | 'media' | 'standpipe' | 'bell' | 'guard' | 'pump';
  readonly id: string;
  readonly x: number;
  readonly z: number;
  readonly width: number;
  readonly height: number;
}

/** A pipe or a marker line through points (x, z) in metres; `widthM` is a pipe's bore. */
export interface ElevationLine {
  readonly kind: 'drain' | 'pump-line' | 'min-level' | 'intake' | 'overflow';
  readonly id: string;
  readonly points: readonly (readonly [number, number])[];
  readonly widthM: number;
}

/** A text placed at (x, z) metres. */
export interface ElevationLabel {
  readonly id: string;
  readonly x: number;
  readonly z: number;
  readonly text: string;
}

/** The whole drawing in metres, with the extent it covers. */
export interface ElevationLayout {
  readonly boxes: readonly ElevationBox[];
  readonly lines: readonly ElevationLine[];
  readonly labels: readonly ElevationLabel[];
  readonly xMin: number;
  readonly xMax: number;
  readonly zMin: number;
  readonly zMax: number;
}

/** Horizontal gap between neighbouring vessels, m. */
const GAP_M = 0.3;
/** Size of the drawn pump body, m (a symbol, not the real pump). */
const PUMP_BODY_M = 0.08;

/** The width a vessel shows in side elevation: a box's length, a cylinder's diameter. */
export function sideWidthM(shape: Shape): number {
  if (shape.type === 'box') return shape.length;
  if (shape.type === 'cylinder') return shape.diameter;
  const largest = Math.max(...shape.points.map((p) => p.area));
  return Math.sqrt(largest);
}

/**
 * Lays out the scenario in side elevation to scale: vessels side by side in file order, each at
 * its floor elevation with its water, media, standpipe, bell and guard; drain pipes from each bed
 * down to their outlet elevation and across to the receiving vessel; pump lines up from the
 * intake to a manifold above the highest outlet and down to each outlet.
 */
export function layoutElevation(scenario: Scenario): ElevationLayout {
  const boxes: ElevationBox[] = [];
  const lines: ElevationLine[] = [];
  const labels: ElevationLabel[] = [];
  const left = new Map<string, number>();
  let x = 0;
  for (const vessel of scenario.vessels) {
    left.set(vessel.id, x);
    layoutVessel(vessel, x, boxes, lines, labels);
    x += sideWidthM(vessel.shape) + GAP_M;
  }
  const centre = (id: string): number | null => {
    const vessel = scenario.vessels.find((v) => v.id === id);
    const at = left.get(id);
    return vessel && at !== undefined ? at + sideWidthM(vessel.shape) / 2 : null;
  };
  for (const vessel of scenario.vessels) {
    if (vessel.kind === 'bed') lines.push(...drainLine(vessel, centre));
  }
  for (const pump of scenario.pumps) layoutPump(pump, scenario, centre, boxes, lines);
  return withExtent(boxes, lines, labels);
}

function layoutVessel(
  vessel: Vessel,
  x: number,
  boxes: ElevationBox[],
  lines: ElevationLine[],
  labels: ElevationLabel[],
): void {
  const width = sideWidthM(vessel.shape);
  const floor = vessel.floorElevation;
  boxes.push({ kind: 'vessel', id: vessel.id, x, z: floor, width, height: vessel.height });
  labels.push({ id: vessel.id, x: x + width / 2, z: floor + vessel.height, text: vessel.id });
  if (vessel.kind === 'bed' && vessel.media.type !== 'none') {
    boxes.push({ kind: 'media', id: vessel.id, x, z: floor, width, height: vessel.media.depth });
  }
  if (vessel.initialLevel > 0) {
    boxes.push({ kind: 'water', id: vessel.id, x, z: floor, width, height: vessel.initialLevel });
  }
  if (vessel.minLevel !== undefined) {
    const z = floor + vessel.minLevel;
    lines.push({
      kind: 'min-level',
      id: vessel.id,
      points: [
        [x, z],
        [x + width, z],
      ],
      widthM: 0,
    });
  }
  if (vessel.overflow) {
    const z = vessel.overflow.elevation;
    lines.push({
      kind: 'overflow',
      id: vessel.id,
      points: [
        [x + width, z],
        [x + width + GAP_M / 2, z],
      ],
      widthM: vessel.overflow.diameter,
    });
  }
  if (vessel.kind === 'bed') layoutDrainParts(vessel, x + width / 2, boxes, lines);
}

function layoutDrainParts(
  bed: BedVessel,
  centreX: number,
  boxes: ElevationBox[],
  lines: ElevationLine[],
): void {
  const floor = bed.floorElevation;
  const { standpipe } = bed.drain;
  const od = standpipe.outerDiameter;
  boxes.push({
    kind: 'standpipe',
    id: bed.id,
    x: centreX - od / 2,
    z: floor,
    width: od,
    height: standpipe.height,
  });
  if (bed.drain.guard) {
    const d = bed.drain.guard.diameter;
    boxes.push({
      kind: 'guard',
      id: bed.id,
      x: centreX - d / 2,
      z: floor,
      width: d,
      height: bed.height,
    });
  }
  if (bed.drain.type !== 'bell-siphon') return;
  const bell = bed.drain.bell;
  const bellTop = standpipe.height + bell.capGap;
  boxes.push({
    kind: 'bell',
    id: bed.id,
    x: centreX - bell.outerDiameter / 2,
    z: floor,
    width: bell.outerDiameter,
    height: bellTop,
  });
  const intake = floor + (bell.snorkelHeight ?? bell.intakeHeight);
  const half = bell.outerDiameter / 2;
  lines.push({
    kind: 'intake',
    id: bed.id,
    points: [
      [centreX - half * 1.6, intake],
      [centreX + half * 1.6, intake],
    ],
    widthM: 0,
  });
}

function drainLine(bed: BedVessel, centre: (id: string) => number | null): ElevationLine[] {
  const from = centre(bed.id);
  const to = centre(bed.drain.to);
  if (from === null) return [];
  const outlet = bed.drain.outletElevation;
  const points: [number, number][] = [
    [from, bed.floorElevation],
    [from, outlet],
  ];
  if (to !== null) points.push([to, outlet]);
  return [{ kind: 'drain', id: bed.id, points, widthM: bed.drain.pipe.innerDiameter }];
}

function layoutPump(
  pump: Pump,
  scenario: Scenario,
  centre: (id: string) => number | null,
  boxes: ElevationBox[],
  lines: ElevationLine[],
): void {
  const source = scenario.vessels.find((v) => v.id === pump.in);
  const sourceX = centre(pump.in);
  if (!source || sourceX === null) return;
  const pumpX = sourceX + sideWidthM(source.shape) / 4;
  const intakeZ = source.floorElevation + pump.intakeHeight;
  boxes.push({
    kind: 'pump',
    id: pump.id,
    x: pumpX - PUMP_BODY_M / 2,
    z: intakeZ,
    width: PUMP_BODY_M,
    height: PUMP_BODY_M,
  });
  const manifoldZ = Math.max(...pump.outlets.map((o) => o.elevation)) + 0.08;
  pump.outlets.forEach((outlet, index) => {
    const targetX = centre(outlet.to);
    if (targetX === null) return;
    const outletX = targetX - 0.15;
    const points: [number, number][] = [
      [pumpX, intakeZ + PUMP_BODY_M],
      [pumpX, manifoldZ],
      [outletX, manifoldZ],
      [outletX, outlet.elevation],
    ];
    lines.push({
      kind: 'pump-line',
      id: `${pump.id}:${index}`,
      points,
      widthM: outlet.pipe.innerDiameter,
    });
  });
}

function withExtent(
  boxes: ElevationBox[],
  lines: ElevationLine[],
  labels: ElevationLabel[],
): ElevationLayout {
  const xs = [
    ...boxes.flatMap((b) => [b.x, b.x + b.width]),
    ...lines.flatMap((l) => l.points.map((p) => p[0])),
  ];
  const zs = [
    0,
    ...boxes.flatMap((b) => [b.z, b.z + b.height]),
    ...lines.flatMap((l) => l.points.map((p) => p[1])),
  ];
  return {
    boxes,
    lines,
    labels,
    xMin: Math.min(0, ...xs),
    xMax: Math.max(0.5, ...xs),
    zMin: Math.min(...zs),
    zMax: Math.max(...zs),
  };
}
