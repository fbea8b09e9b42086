import type { BedVessel, Shape, Vessel } from '../../shared/scenario/index';

/** Level ↔ volume of one vessel (levels m above its floor, volumes m³ of water). */
export interface Storage {
  /** Water volume with the surface at `levelM`, m³; linear (bottom area) below 0, top area above the rim. */
  volumeAtLevelM3(levelM: number): number;
  /** Exact inverse of `volumeAtLevelM3`. */
  levelAtVolumeM(volumeM3: number): number;
  /** Storage area dV/dh at `levelM` (porosity and drain parts included), m². */
  areaAtLevelM2(levelM: number): number;
  /** Volume at the rim, m³. */
  readonly maxVolumeM3: number;
}

/** A layer where the storage area is linear in height: A(z) = areaM2 + slopeM · (z − fromM). */
interface Layer {
  fromM: number;
  toM: number;
  areaM2: number;
  slopeM: number;
  volumeBelowM3: number;
}

/** A disc of the bed with no media: `footprintM2` its plan area, `solidM2` the pipe walls in it. */
interface OpenZone {
  toM: number;
  footprintM2: number;
  solidM2: number;
}

const disc = (diameterM: number): number => (Math.PI / 4) * diameterM * diameterM;

/** Plan area of the shape at height z, m² (tables are linear between points, constant above). */
function planAreaM2(shape: Shape, z: number): number {
  if (shape.type === 'box') return shape.length * shape.width;
  if (shape.type === 'cylinder') return disc(shape.diameter);
  const { points } = shape;
  for (let i = 1; i < points.length; i += 1) {
    const a = points[i - 1];
    const b = points[i];
    if (a !== undefined && b !== undefined && z <= b.level) {
      return a.area + ((b.area - a.area) * (z - a.level)) / (b.level - a.level);
    }
  }
  return points[points.length - 1]?.area ?? 0;
}

/**
 * Zones of a bed without media, nested round its drain: the standpipe (solid: wall and dry bore) up
 * to its top; for a bell siphon the bell (open inside, solid wall) up to its cap; the media guard
 * (open) up to the media top.
 */
function openZones(bed: BedVessel): OpenZone[] {
  const { drain } = bed;
  const standpipe = {
    toM: drain.standpipe.height,
    footprintM2: disc(drain.standpipe.outerDiameter),
    solidM2: disc(drain.standpipe.outerDiameter),
  };
  const zones: OpenZone[] = [standpipe];
  if (drain.type === 'bell-siphon') {
    const { bell } = drain;
    const wall = disc(bell.outerDiameter) - disc(bell.innerDiameter);
    zones.push({
      toM: drain.standpipe.height + bell.capGap,
      footprintM2: disc(bell.outerDiameter),
      solidM2: wall,
    });
  }
  if (drain.guard !== undefined)
    zones.push({ toM: bed.media.depth, footprintM2: disc(drain.guard.diameter), solidM2: 0 });
  return zones;
}

/** Storage area just above height z, from its constant parts, with the plan area passed in. */
function storageAreaM2(vessel: Vessel, zones: OpenZone[], z: number, planM2: number): number {
  if (vessel.kind !== 'bed') return planM2;
  let footprint = 0;
  let solid = 0;
  for (const zone of zones) {
    if (z >= zone.toM) continue;
    footprint = Math.max(footprint, zone.footprintM2);
    solid += zone.solidM2;
  }
  if (footprint >= planM2) return 0;
  const porosity = z < vessel.media.depth ? vessel.media.porosity : 1;
  return porosity * (planM2 - footprint) + (footprint - solid);
}

/** Heights where the storage area changes its formula, sorted, within [0, height]. */
function breakpoints(vessel: Vessel, zones: OpenZone[]): number[] {
  const levels = [0, vessel.height, ...zones.map((zone) => zone.toM)];
  if (vessel.kind === 'bed') levels.push(vessel.media.depth);
  if (vessel.shape.type === 'table')
    levels.push(...vessel.shape.points.map((point) => point.level));
  return [...new Set(levels.filter((z) => z >= 0 && z <= vessel.height))].sort((a, b) => a - b);
}

function buildLayers(vessel: Vessel): Layer[] {
  const zones = vessel.kind === 'bed' ? openZones(vessel) : [];
  const levels = breakpoints(vessel, zones);
  const layers: Layer[] = [];
  let volumeBelowM3 = 0;
  for (let i = 1; i < levels.length; i += 1) {
    const fromM = levels[i - 1] as number;
    const toM = levels[i] as number;
    const planFrom = planAreaM2(vessel.shape, fromM);
    const planSlope = (planAreaM2(vessel.shape, toM) - planFrom) / (toM - fromM);
    const areaM2 = storageAreaM2(vessel, zones, fromM, planFrom);
    const slopeM =
      vessel.kind === 'bed' && fromM < vessel.media.depth
        ? planSlope * vessel.media.porosity
        : planSlope;
    if (areaM2 <= 0 || areaM2 + slopeM * (toM - fromM) <= 0) {
      throw new Error(
        `Vessel "${vessel.id}" has no storage area between ${fromM} m and ${toM} m; check its shape and drain sizes.`,
      );
    }
    layers.push({ fromM, toM, areaM2, slopeM, volumeBelowM3 });
    volumeBelowM3 += (areaM2 + 0.5 * slopeM * (toM - fromM)) * (toM - fromM);
  }
  return layers;
}

function layerAtLevel(layers: Layer[], levelM: number): Layer {
  for (const layer of layers) if (levelM <= layer.toM) return layer;
  return layers[layers.length - 1] as Layer;
}

function layerAtVolume(layers: Layer[], volumeM3: number): Layer {
  for (let i = layers.length - 1; i >= 0; i -= 1) {
    const layer = layers[i] as Layer;
    if (volumeM3 >= layer.volumeBelowM3) return layer;
  }
  return layers[0] as Layer;
}

/**
 * Level ↔ volume of a vessel. Tanks and sumps: V(h) = ∫₀ʰ A(z) dz with A the plan area (constant
 * for a box or cylinder, linear between the points of a table). Beds: within the media the area
 * holds water only in its pores, A·φ, above the media all of it; the standpipe (wall and dry bore),
 * the bell wall and cap, and the inside of the bell and of the media guard (open water, no media)
 * are accounted for up to their tops. The area is piecewise linear in height, so V is piecewise
 * quadratic and the inverse is solved in closed form on each layer (exact, no iteration).
 * Source: continuity (V = ∫A dz); porosity as storage fraction of media (StormTech Tech Sheet #1).
 */
export function makeStorage(vessel: Vessel): Storage {
  const layers = buildLayers(vessel);
  const first = layers[0] as Layer;
  const last = layers[layers.length - 1] as Layer;
  const maxVolumeM3 =
    last.volumeBelowM3 +
    (last.areaM2 + 0.5 * last.slopeM * (last.toM - last.fromM)) * (last.toM - last.fromM);
  const topAreaM2 = last.areaM2 + last.slopeM * (last.toM - last.fromM);
  return {
    maxVolumeM3,
    areaAtLevelM2: (levelM) => {
      if (levelM <= 0) return first.areaM2;
      if (levelM >= vessel.height) return topAreaM2;
      const layer = layerAtLevel(layers, levelM);
      return layer.areaM2 + layer.slopeM * (levelM - layer.fromM);
    },
    volumeAtLevelM3: (levelM) => {
      if (levelM <= 0) return levelM * first.areaM2;
      if (levelM >= vessel.height) return maxVolumeM3 + (levelM - vessel.height) * topAreaM2;
      const layer = layerAtLevel(layers, levelM);
      const dz = levelM - layer.fromM;
      return layer.volumeBelowM3 + (layer.areaM2 + 0.5 * layer.slopeM * dz) * dz;
    },
    levelAtVolumeM: (volumeM3) => {
      if (volumeM3 <= 0) return volumeM3 / first.areaM2;
      if (volumeM3 >= maxVolumeM3) return vessel.height + (volumeM3 - maxVolumeM3) / topAreaM2;
      const layer = layerAtVolume(layers, volumeM3);
      const dv = volumeM3 - layer.volumeBelowM3;
      // Root of (slope/2)·dz² + area·dz − dv = 0 written without cancellation.
      const dz =
        (2 * dv) / (layer.areaM2 + Math.sqrt(layer.areaM2 * layer.areaM2 + 2 * layer.slopeM * dv));
      return Math.min(layer.fromM + dz, layer.toM);
    },
  };
}
