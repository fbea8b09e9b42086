/** The weight of each bed on its supports (water plus wet media), with the caution that supports need a qualified check. */
import { bedStructuralLoad, type BedStructuralLoad } from '../../engine/index';
import type { BedLoad, SizingCheck } from '../../shared/contracts/sizing';
import type { Scenario } from '../../shared/scenario/index';
import { sizingCheck, type CheckWords } from './check-words';

/**
 * Uniform live load residential floors are commonly designed for, Pa: 40 lb/ft² = 1.92 kPa (from
 * memory: ASCE 7 minimum design loads, table of uniform live loads, dwellings).
 */
export const RESIDENTIAL_FLOOR_LOAD_PA = 1915;

function toBedLoad(load: BedStructuralLoad): BedLoad {
  const { density, ...figures } = load;
  return { ...figures, densitySource: density.source };
}

/** Every bed's load. */
export function bedLoads(scenario: Scenario): BedLoad[] {
  return scenario.vessels.flatMap((v) =>
    v.kind === 'bed' ? [toBedLoad(bedStructuralLoad(v, scenario.water.temperature))] : [],
  );
}

/**
 * One check per bed: its pressure on its footprint when full to the rim, against a home floor's
 * design load; numbers in `words`' units.
 */
export function loadChecks(loads: readonly BedLoad[], words: CheckWords): SizingCheck[] {
  return loads.map((load) => {
    const heavy = load.pressureAtRimPa > RESIDENTIAL_FLOOR_LOAD_PA;
    return sizingCheck({
      check: 'bed-load',
      subject: load.bedId,
      title: `Weight of ${load.bedId} on its supports`,
      status: heavy ? 'warning' : 'ok',
      value: load.pressureAtRimPa,
      limit: RESIDENTIAL_FLOOR_LOAD_PA,
      unit: 'Pa',
      source:
        'from memory: ASCE 7 uniform live load of dwelling floors, 40 lb/ft²; media densities as listed',
      detail:
        `Full to its rim (a blocked drain), ${load.bedId} weighs ${words.mass(load.totalAtRimKg)}: ${words.mass(load.wetMediaKg)} of wet media and ${words.mass(load.waterAtRimKg)} of water, ` +
        `${words.pressure(load.pressureAtRimPa)} over its ${words.area(load.footprintM2)} footprint (${words.mass(load.totalAtFloodKg)} at flood level). ` +
        (heavy
          ? `That is more than the ${words.pressure(RESIDENTIAL_FLOOR_LOAD_PA)} a home floor is commonly designed for. `
          : '') +
        'Stands, decks and floors under beds need a check by a qualified person.',
    });
  });
}
