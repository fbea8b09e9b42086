import type { BedVessel, Media, Shape } from '../../shared/scenario/index';
import { makeStorage } from '../components/vessel-storage';
import { STANDARD_GRAVITY_M_PER_S2 as G } from '../hydraulics/standard-gravity';
import { waterDensityKgPerM3 } from '../hydraulics/water-properties';

/** Dry bulk density of a bed medium and the water its grains soak up, with where the numbers come from. */
export interface MediaDensity {
  /** Dry bulk density (grains and the voids between them), kg/m³. */
  dryBulkKgPerM3: number;
  /** Water held inside the grains when soaked, as a fraction of the dry mass. */
  absorbedFraction: number;
  source: string;
}

/**
 * Dry bulk densities and absorption of bed media. Gravel 1600 kg/m³ (crushed stone and pea gravel
 * are sold at about 1400–1700 kg/m³; common practice, no source), absorbing about 1 % (from
 * memory). Expanded clay 400 kg/m³ (lightweight expanded clay aggregate about 300–500 kg/m³; from
 * memory), soaking up about 25 % of its dry mass (from memory). Lava rock (scoria) 900 kg/m³
 * (about 700–1100 kg/m³; from memory), soaking up about 20 % (from memory). No media: nothing.
 */
export const MEDIA_DENSITIES: Readonly<Record<Media['type'], MediaDensity>> = {
  gravel: {
    dryBulkKgPerM3: 1600,
    absorbedFraction: 0.01,
    source: 'common practice, no source (gravel sold at 1400–1700 kg/m³); absorption from memory',
  },
  'expanded-clay': {
    dryBulkKgPerM3: 400,
    absorbedFraction: 0.25,
    source: 'from memory (expanded clay 300–500 kg/m³, soaks up about a quarter of its mass)',
  },
  'lava-rock': {
    dryBulkKgPerM3: 900,
    absorbedFraction: 0.2,
    source: 'from memory (scoria 700–1100 kg/m³, soaks up about a fifth of its mass)',
  },
  none: { dryBulkKgPerM3: 0, absorbedFraction: 0, source: 'no media' },
};

/** The weight a bed puts on its supports (water and wet media; the container itself excluded). */
export interface BedStructuralLoad {
  bedId: string;
  /** Plan area at the floor, m². */
  footprintM2: number;
  /** Volume of media (outside the guard or bell), m³. */
  mediaVolumeM3: number;
  /** Wet media: dry mass plus the water soaked into the grains, kg. */
  wetMediaKg: number;
  /** Water in the bed with the level at the standpipe top (the highest it reaches in use), kg. */
  waterAtFloodKg: number;
  /** Water in the bed filled to its rim (a blocked drain), kg. */
  waterAtRimKg: number;
  /** Wet media plus water at the rim, kg; and as a force, N; and per footprint area, Pa. */
  totalAtRimKg: number;
  loadAtRimN: number;
  pressureAtRimPa: number;
  /** Wet media plus water at flood level, kg. */
  totalAtFloodKg: number;
  density: MediaDensity;
}

const disc = (diameterM: number): number => (Math.PI / 4) * diameterM * diameterM;

/** Plan volume of a shape from its floor up to `depthM` (tables: linear areas, constant above the last point). */
function planVolumeM3(shape: Shape, depthM: number): number {
  if (shape.type === 'box') return shape.length * shape.width * depthM;
  if (shape.type === 'cylinder') return disc(shape.diameter) * depthM;
  const n = 64;
  let volume = 0;
  for (let k = 0; k < n; k += 1)
    volume += planAreaAt(shape, ((k + 0.5) * depthM) / n) * (depthM / n);
  return volume;
}

function planAreaAt(shape: Extract<Shape, { type: 'table' }>, z: number): number {
  const points = shape.points;
  for (let i = 1; i < points.length; i += 1) {
    const a = points[i - 1];
    const b = points[i];
    if (a && b && z <= b.level)
      return a.area + ((b.area - a.area) * (z - a.level)) / (b.level - a.level);
  }
  return points[points.length - 1]?.area ?? 0;
}

/** Plan area at the floor, m². */
function floorAreaM2(shape: Shape): number {
  if (shape.type === 'box') return shape.length * shape.width;
  if (shape.type === 'cylinder') return disc(shape.diameter);
  return planAreaAt(shape, 0);
}

/** Plan area kept clear of media round the drain: the guard, else the bell, else the standpipe, m². */
function clearFootprintM2(bed: BedVessel): number {
  const { drain } = bed;
  if (drain.guard) return disc(drain.guard.diameter);
  if (drain.type === 'bell-siphon') return disc(drain.bell.outerDiameter);
  return disc(drain.standpipe.outerDiameter);
}

/**
 * The load of a bed on its supports: W = g·(m_media·(1 + a) + ρ_w·V_w), with m_media the dry bulk
 * mass of the media (bulk density × media volume), a the water soaked into the grains, and V_w
 * the water the bed holds at a level (the pores of the media and the open water above it and in
 * the guard and bell, from the bed's storage). Given at flood level (standpipe top) and with the
 * bed full to its rim (the worst case: a blocked drain). ρ_w at the run's water temperature.
 * Densities: {@link MEDIA_DENSITIES}. A design aid only: supports and decks need a qualified check.
 */
export function bedStructuralLoad(bed: BedVessel, waterTemperatureC: number): BedStructuralLoad {
  const density = MEDIA_DENSITIES[bed.media.type];
  const storage = makeStorage(bed);
  const rho = waterDensityKgPerM3(waterTemperatureC);
  const footprintM2 = floorAreaM2(bed.shape);
  const mediaVolumeM3 = Math.max(
    0,
    planVolumeM3(bed.shape, bed.media.depth) - clearFootprintM2(bed) * bed.media.depth,
  );
  const wetMediaKg = density.dryBulkKgPerM3 * mediaVolumeM3 * (1 + density.absorbedFraction);
  const waterAtFloodKg = rho * storage.volumeAtLevelM3(bed.drain.standpipe.height);
  const waterAtRimKg = rho * storage.maxVolumeM3;
  const totalAtRimKg = wetMediaKg + waterAtRimKg;
  return {
    bedId: bed.id,
    footprintM2,
    mediaVolumeM3,
    wetMediaKg,
    waterAtFloodKg,
    waterAtRimKg,
    totalAtRimKg,
    loadAtRimN: totalAtRimKg * G,
    pressureAtRimPa: (totalAtRimKg * G) / footprintM2,
    totalAtFloodKg: wetMediaKg + waterAtFloodKg,
    density,
  };
}
