import type { Scenario } from '../../shared/scenario';

/** Where water can end up outside the vessels: a named sink that counts the volume lost there. */
export interface LossSink {
  /** State index of the running total, m³. */
  index: number;
  /** The vessel the water left. */
  vesselId: string;
  /** How it left: over the rim, through an overflow to "out", or through a leak. */
  kind: 'rim' | 'overflow' | 'leak';
  /** A label such as "tank rim" or "leak[0]". */
  label: string;
}

/**
 * Positions of every quantity in the state vector. Volumes, not levels, are the state, so water is
 * conserved by construction: every flow is taken from one component and added to another.
 *   [vessel volumes | water held in drain pipes and pump lines | water lost per sink |
 *    pumped volume per pump | pump energy per pump]
 */
export interface StateLayout {
  readonly size: number;
  /** Vessel id → state index of its volume (m³); vessels come first, in scenario order. */
  readonly vesselIndex: ReadonlyMap<string, number>;
  readonly vesselCount: number;
  /** Bell-siphon bed id → state index of the water held in its standpipe and drain pipe, m³. */
  readonly drainHeldIndex: ReadonlyMap<string, number>;
  /** Pump id → state index of the water held in its pipes, m³. */
  readonly lineHeldIndex: ReadonlyMap<string, number>;
  readonly sinks: readonly LossSink[];
  /** Pump id → state index of the volume it has pumped, m³. */
  readonly pumpedIndex: ReadonlyMap<string, number>;
  /** Pump id → state index of the energy it has used, J. */
  readonly energyIndex: ReadonlyMap<string, number>;
  /** Every index that holds water (vessels, held water, sinks): their sum is conserved. */
  readonly waterIndices: readonly number[];
}

/** Lays out the state vector of a scenario. */
export function makeStateLayout(scenario: Scenario): StateLayout {
  let next = 0;
  const take = (): number => next++;
  const vesselIndex = new Map(scenario.vessels.map((vessel) => [vessel.id, take()]));
  const drainHeldIndex = new Map<string, number>();
  for (const vessel of scenario.vessels) {
    if (vessel.kind === 'bed' && vessel.drain.type === 'bell-siphon')
      drainHeldIndex.set(vessel.id, take());
  }
  const lineHeldIndex = new Map(scenario.pumps.map((pump) => [pump.id, take()]));
  const sinks: LossSink[] = [];
  for (const vessel of scenario.vessels) {
    sinks.push({ index: take(), vesselId: vessel.id, kind: 'rim', label: `${vessel.id} rim` });
    if (vessel.overflow?.to === 'out') {
      sinks.push({
        index: take(),
        vesselId: vessel.id,
        kind: 'overflow',
        label: `${vessel.id} overflow`,
      });
    }
  }
  scenario.leaks.forEach((leak, k) => {
    sinks.push({ index: take(), vesselId: leak.from, kind: 'leak', label: `leak[${k}]` });
  });
  const waterCount = next;
  const pumpedIndex = new Map(scenario.pumps.map((pump) => [pump.id, take()]));
  const energyIndex = new Map(scenario.pumps.map((pump) => [pump.id, take()]));
  return {
    size: next,
    vesselIndex,
    vesselCount: scenario.vessels.length,
    drainHeldIndex,
    lineHeldIndex,
    sinks,
    pumpedIndex,
    energyIndex,
    waterIndices: Array.from({ length: waterCount }, (_, i) => i),
  };
}

/** Total water in the system plus water lost, m³: the conserved quantity. */
export function totalWaterM3(layout: StateLayout, state: Float64Array): number {
  let sum = 0;
  for (const index of layout.waterIndices) sum += state[index] as number;
  return sum;
}
