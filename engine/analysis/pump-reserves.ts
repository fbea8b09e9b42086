import type { Scenario, Vessel } from '../../shared/scenario/index';
import { makeStorage } from '../components/vessel-storage';

/** What filling every bed a pump feeds takes from its source, against what the source can give. */
export interface PumpReserve {
  pumpId: string;
  sourceId: string;
  /** Beds the pump feeds. */
  bedIds: string[];
  /**
   * Water needed to bring every fed bed from its starting level to its standpipe top at once,
   * plus the pump's pipes, m³ (nothing flows back meanwhile: the worst case).
   */
  floodVolumeM3: number;
  /** Water in the source above the pump intake at the starting level, m³. */
  aboveIntakeM3: number;
  /** Water in the source above its fish-safe minimum, m³; null when it has none. */
  aboveMinimumM3: number | null;
}

const pipeVolumeM3 = (p: { length: number; innerDiameter: number }): number =>
  (Math.PI / 4) * p.innerDiameter ** 2 * p.length;

/** Water in `vessel` between `fromM` and the higher level `toM` (m above its floor), m³; 0 when `toM ≤ fromM`. */
function volumeBetweenM3(vessel: Vessel, fromM: number, toM: number): number {
  if (toM <= fromM) return 0;
  const storage = makeStorage(vessel);
  return storage.volumeAtLevelM3(toM) - storage.volumeAtLevelM3(fromM);
}

/**
 * For every pump: the water that filling all the beds it feeds to their standpipe tops at the same
 * moment would draw (bed storage by the engine's level–volume relation, porosity included, plus the
 * main and outlet pipes), against the water its source holds above the intake and above the
 * fish-safe minimum. A mass balance with no return flow: the worst case of a cold start.
 */
export function pumpReserves(scenario: Scenario): PumpReserve[] {
  const byId = new Map(scenario.vessels.map((v) => [v.id, v]));
  return scenario.pumps.map((pump) => {
    const source = byId.get(pump.in);
    if (!source) throw new Error(`Pump ${pump.id} draws from an unknown vessel "${pump.in}".`);
    const beds = [...new Set(pump.outlets.map((o) => o.to))]
      .map((id) => byId.get(id))
      .filter((v): v is Vessel => v?.kind === 'bed');
    let floodVolumeM3 =
      pipeVolumeM3(pump.main) + pump.outlets.reduce((sum, o) => sum + pipeVolumeM3(o.pipe), 0);
    for (const bed of beds) {
      if (bed.kind === 'bed')
        floodVolumeM3 += volumeBetweenM3(bed, bed.initialLevel, bed.drain.standpipe.height);
    }
    return {
      pumpId: pump.id,
      sourceId: source.id,
      bedIds: beds.map((b) => b.id),
      floodVolumeM3,
      aboveIntakeM3: volumeBetweenM3(source, pump.intakeHeight, source.initialLevel),
      aboveMinimumM3:
        source.minLevel === undefined
          ? null
          : volumeBetweenM3(source, source.minLevel, source.initialLevel),
    };
  });
}
