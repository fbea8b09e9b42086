import type { SystemModel } from '../system/system-model';
import { closeOpenStandpipeDrain, type BedCycleTally } from './bed-cycle-recorder';
import { summariseBellBed, summariseStandpipeBed } from './bed-summary';
import type { LevelExtremes } from './level-extremes';
import { massBalanceError } from './mass-balance';
import type { BedSummary, PumpSummary, SimulationResult, VesselSummary } from './run-result';
import { makeVerdicts } from './verdicts';

/** What the summary is built from, gathered during the run. */
export interface RunRecord {
  model: SystemModel;
  initialState: Float64Array;
  finalState: Float64Array;
  startS: number;
  endS: number;
  extremes: readonly LevelExtremes[];
  tallies: ReadonlyMap<string, BedCycleTally>;
}

/** Builds the summary, verdicts and mass-balance error of a run (series and stats are added by the caller). */
export function summariseRun(
  record: RunRecord,
): Pick<SimulationResult, 'summary' | 'verdicts' | 'massBalanceError'> {
  const { model, finalState, startS, endS } = record;
  const { layout, vessels, scenario } = model.parts;
  const durationS = endS - startS;
  const beds = summariseBeds(record, durationS);
  const vesselSummaries = vessels.map((vessel): VesselSummary => {
    const e = record.extremes[vessel.index] as LevelExtremes;
    const lost = layout.sinks
      .filter((s) => s.vesselId === vessel.vessel.id)
      .reduce((sum, s) => sum + (finalState[s.index] as number), 0);
    return {
      id: vessel.vessel.id,
      minLevel_m: e.minLevelM,
      minLevelAt_s: e.minAtS,
      maxLevel_m: e.maxLevelM,
      maxLevelAt_s: e.maxAtS,
      lost_m3: lost,
    };
  });
  const pumps = summarisePumps(record, durationS);
  const lostBy = (kind: 'rim' | 'overflow' | 'leak'): number =>
    layout.sinks
      .filter((s) => s.kind === kind)
      .reduce((sum, s) => sum + (finalState[s.index] as number), 0);
  const capacityM3 = vessels.reduce((sum, v) => sum + v.geometry.rimVolumeM3, 0);
  const error = massBalanceError(layout, record.initialState, finalState, capacityM3);
  const tankVolumeM3 = vessels
    .filter((v) => v.vessel.kind === 'tank')
    .reduce((sum, v) => sum + (record.initialState[v.index] as number), 0);
  const verdicts = makeVerdicts({
    scenario,
    beds,
    vessels: vesselSummaries,
    pumps,
    durationS,
    massBalanceError: error,
    tankVolumeM3,
    lostOverRimsM3: lostBy('rim'),
    lostThroughOverflowsM3: lostBy('overflow'),
    lostThroughLeaksM3: lostBy('leak'),
  });
  return { summary: { beds, vessels: vesselSummaries, pumps }, verdicts, massBalanceError: error };
}

function summariseBeds(record: RunRecord, durationS: number): BedSummary[] {
  const { model, endS, tallies, extremes } = record;
  const { bells, standpipes, vessels } = model.parts;
  const byId = new Map<string, BedSummary>();
  for (const bell of bells) {
    const bed = vessels[bell.wiring.bed.index];
    const tally = tallies.get(bell.bedId);
    if (bed && tally) byId.set(bell.bedId, summariseBellBed(bell, bed, tally, endS, durationS));
  }
  for (const standpipe of standpipes) {
    const tally = tallies.get(standpipe.bedId);
    const window = extremes[standpipe.wiring.bed.index];
    if (!tally || !window) continue;
    const crestM = standpipe.drain.standpipe.height;
    closeOpenStandpipeDrain(tally, window, crestM, standpipe.phase === 'spilling');
    byId.set(standpipe.bedId, summariseStandpipeBed(standpipe, tally, endS, durationS));
  }
  return model.parts.scenario.vessels.flatMap((v) => byId.get(v.id) ?? []);
}

function summarisePumps(record: RunRecord, durationS: number): PumpSummary[] {
  const { model, finalState, endS } = record;
  return model.parts.pumps.map((pump) => {
    const pumped = finalState[pump.wiring.pumpedIndex] as number;
    const energy = finalState[pump.wiring.energyIndex] as number;
    const dry = pump.dryTotalS + (pump.dry ? endS - pump.drySinceS : 0);
    return {
      id: pump.id,
      meanFlow_m3s: durationS > 0 ? pumped / durationS : 0,
      dry_s: dry,
      energy_J: energy,
      energyBasis: pump.pump.power === undefined ? 'water-power' : 'rated-power',
      energyPerDay_J: durationS > 0 ? (energy * 86400) / durationS : 0,
    };
  });
}
