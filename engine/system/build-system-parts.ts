import type { BedVessel, BellSiphonDrain, Scenario, StandpipeDrain } from '../../shared/scenario';
import { makeBellSiphon, type BellSiphonComponent } from '../components/bell-siphon';
import { makeFloatSwitch, type FloatSwitchComponent } from '../components/float-switch';
import { makeLeak, type LeakComponent } from '../components/leak';
import { makePumpLine, type PumpLineComponent } from '../components/pump-line';
import { makeStandpipeDrain, type StandpipeComponent } from '../components/standpipe-drain';
import { makeVesselComponent, type VesselComponent } from '../components/vessel';
import { makeVesselOverflow } from '../components/vessel-overflow';
import { waterDensityKgPerM3, waterKinematicViscosityM2PerS } from '../hydraulics/water-properties';
import type { FlowChannel, ModelComponent } from './model-context';
import { makeStateLayout, type StateLayout } from './state-layout';
import { makeTimedSchedule, type TimedSchedule } from './timed-schedule';
import type { ChannelEnds } from './vessel-flow-balance';

/** Every component of a system model, wired to the state layout and the flow channels. */
export interface SystemParts {
  readonly scenario: Scenario;
  readonly layout: StateLayout;
  readonly channels: readonly FlowChannel[];
  readonly ends: ChannelEnds;
  readonly vessels: readonly VesselComponent[];
  readonly bells: readonly BellSiphonComponent[];
  readonly standpipes: readonly StandpipeComponent[];
  readonly pumps: readonly PumpLineComponent[];
  readonly leaks: readonly LeakComponent[];
  readonly floatSwitches: readonly FloatSwitchComponent[];
  /** In settling order: float switches, drains, overflows and leaks, pumps, vessels. */
  readonly components: readonly ModelComponent[];
  readonly schedule: TimedSchedule;
  readonly power: { on: boolean };
  /** State indices written as rates (pumped volume, energy). */
  readonly meterIndices: readonly number[];
}

/**
 * Assembles the components of `scenario`; with `exactHydraulics` every operating point and full-bore
 * flow is solved exactly at each evaluation instead of through its table. Throws when a referenced
 * id is missing (the schema prevents it).
 */
export function buildSystemParts(scenario: Scenario, exactHydraulics = false): SystemParts {
  const layout = makeStateLayout(scenario);
  const channels: FlowChannel[] = [];
  const addChannel: AddChannel = (id, where, from, to) =>
    channels.push({ id, where, from, to }) - 1;
  const vessels = buildVessels(scenario, layout, addChannel);
  const byId = new Map(vessels.map((v) => [v.vessel.id, v]));
  const vesselById = (id: string): VesselComponent => {
    const found = byId.get(id);
    if (!found) throw new Error(`Unknown vessel "${id}"`);
    return found;
  };
  const hydraulic: Hydraulic = {
    lossCoefficients: scenario.lossCoefficients,
    friction: scenario.run.friction,
    kinematicViscosityM2PerS: waterKinematicViscosityM2PerS(scenario.water.temperature),
    exactHydraulics,
  };
  const drains = buildDrains(scenario, layout, vesselById, addChannel, hydraulic);
  const overflows = buildOverflows(scenario, layout, vesselById, addChannel);
  const leaks = buildLeaks(scenario, layout, vesselById, addChannel);
  const power = { on: true };
  const pumps = buildPumps(scenario, layout, vesselById, addChannel, {
    ...hydraulic,
    densityKgPerM3: waterDensityKgPerM3(scenario.water.temperature),
    power,
  });
  const pumpById = new Map(pumps.map((p) => [p.id, p]));
  const floatSwitches = buildFloatSwitches(scenario, vesselById, pumpById);
  const components: ModelComponent[] = [
    ...floatSwitches,
    ...drains.bells,
    ...drains.standpipes,
    ...overflows,
    ...leaks,
    ...pumps,
    ...vessels,
  ];
  numberEvents(components);
  return {
    scenario,
    layout,
    channels,
    ends: {
      from: Int32Array.from(channels, (c) => c.from),
      to: Int32Array.from(channels, (c) => c.to),
    },
    vessels,
    bells: drains.bells,
    standpipes: drains.standpipes,
    pumps,
    leaks,
    floatSwitches,
    components,
    schedule: makeTimedSchedule(scenario, pumpById, power, leaks),
    power,
    meterIndices: [...layout.pumpedIndex.values(), ...layout.energyIndex.values()],
  };
}

/** Gives each component's event functions their place in the model's numbering. */
function numberEvents(components: readonly ModelComponent[]): void {
  let offset = 0;
  for (const component of components) {
    component.eventOffset = offset;
    offset += component.eventCount;
  }
}

function buildVessels(
  scenario: Scenario,
  layout: StateLayout,
  addChannel: AddChannel,
): VesselComponent[] {
  return scenario.vessels.map((vessel, i) => {
    const sink = layout.sinks.find((s) => s.vesselId === vessel.id && s.kind === 'rim');
    if (!sink) throw new Error(`No rim sink for ${vessel.id}`);
    return makeVesselComponent(
      vessel,
      i,
      sink.index,
      addChannel(`flow:${vessel.id}.rim`, `${vessel.id} over its rim`, i, sink.index),
    );
  });
}

function buildLeaks(
  scenario: Scenario,
  layout: StateLayout,
  vesselById: VesselById,
  addChannel: AddChannel,
): LeakComponent[] {
  return scenario.leaks.map((leak, k) => {
    const sink = layout.sinks.find((s) => s.kind === 'leak' && s.label === `leak[${k}]`);
    const vessel = vesselById(leak.from);
    if (!sink) throw new Error(`No sink for leak ${k}`);
    return makeLeak(
      leak,
      `leak[${k}]`,
      vessel,
      addChannel(`flow:leak[${k}]`, `leak from ${leak.from}`, vessel.index, sink.index),
    );
  });
}

function buildFloatSwitches(
  scenario: Scenario,
  vesselById: VesselById,
  pumpById: ReadonlyMap<string, PumpLineComponent>,
): FloatSwitchComponent[] {
  return scenario.controls.map((control) => {
    const pump = pumpById.get(control.pump);
    if (!pump) throw new Error(`Unknown pump "${control.pump}"`);
    return makeFloatSwitch(control, vesselById(control.vessel), pump);
  });
}

type AddChannel = (id: string, where: string, from: number, to: number) => number;
type VesselById = (id: string) => VesselComponent;
type Hydraulic = {
  lossCoefficients: Scenario['lossCoefficients'];
  friction: Scenario['run']['friction'];
  kinematicViscosityM2PerS: number;
  exactHydraulics: boolean;
};

function blockedFraction(scenario: Scenario, bedId: string): number {
  let open = 1;
  for (const fault of scenario.faults)
    if (fault.kind === 'drain-blocked' && fault.bed === bedId) open *= 1 - fault.fraction;
  return 1 - open;
}

function buildDrains(
  scenario: Scenario,
  layout: StateLayout,
  vesselById: VesselById,
  addChannel: AddChannel,
  hydraulic: Hydraulic,
) {
  const bells: BellSiphonComponent[] = [];
  const standpipes: StandpipeComponent[] = [];
  for (const vessel of scenario.vessels) {
    if (vessel.kind !== 'bed') continue;
    const bed = vesselById(vessel.id);
    const destination = vesselById(vessel.drain.to);
    const common = {
      bed,
      destination,
      ...hydraulic,
      blockedFraction: blockedFraction(scenario, vessel.id),
    };
    const where = `${vessel.id} drain to ${vessel.drain.to}`;
    if (vessel.drain.type === 'bell-siphon') {
      const heldIndex = layout.drainHeldIndex.get(vessel.id) ?? -1;
      const channel = addChannel(`flow:${vessel.id}.drain`, where, bed.index, destination.index);
      bells.push(
        makeBellSiphon(vessel as BedVessel & { drain: BellSiphonDrain }, {
          ...common,
          heldIndex,
          channel,
        }),
      );
    } else {
      const spillChannel = addChannel(
        `flow:${vessel.id}.drain`,
        where,
        bed.index,
        destination.index,
      );
      const weepChannel = vessel.drain.weepHole
        ? addChannel(
            `flow:${vessel.id}.weep`,
            `${vessel.id} weep hole to ${vessel.drain.to}`,
            bed.index,
            destination.index,
          )
        : -1;
      standpipes.push(
        makeStandpipeDrain(vessel as BedVessel & { drain: StandpipeDrain }, {
          ...common,
          spillChannel,
          weepChannel,
        }),
      );
    }
  }
  return { bells, standpipes };
}

function buildOverflows(
  scenario: Scenario,
  layout: StateLayout,
  vesselById: VesselById,
  addChannel: AddChannel,
): ModelComponent[] {
  return scenario.vessels.flatMap((vessel) => {
    const overflow = vessel.overflow;
    if (overflow === undefined) return [];
    const source = vesselById(vessel.id);
    const sink = layout.sinks.find((s) => s.vesselId === vessel.id && s.kind === 'overflow');
    const destination = overflow.to === 'out' ? undefined : vesselById(overflow.to);
    const to = destination ? destination.index : (sink?.index ?? -1);
    const where = `${vessel.id} overflow to ${overflow.to}`;
    const channel = addChannel(`flow:${vessel.id}.overflow`, where, source.index, to);
    return [makeVesselOverflow(source, overflow, channel, destination)];
  });
}

function buildPumps(
  scenario: Scenario,
  layout: StateLayout,
  vesselById: VesselById,
  addChannel: AddChannel,
  settings: Hydraulic & { densityKgPerM3: number; power: { on: boolean } },
): PumpLineComponent[] {
  return scenario.pumps.map((pump) => {
    let faultFlowScale = 1;
    for (const fault of scenario.faults)
      if (fault.kind === 'pump-worn' && fault.pump === pump.id) faultFlowScale *= fault.flowScale;
    const source = vesselById(pump.in);
    const outlets = pump.outlets.map((outlet, i) => {
      const destination = vesselById(outlet.to);
      return {
        destination,
        channel: addChannel(
          `flow:${pump.id}.outlet[${i}]`,
          `${pump.id} outlet to ${outlet.to}`,
          source.index,
          destination.index,
        ),
      };
    });
    return makePumpLine(pump, {
      source,
      outlets,
      ...settings,
      faultFlowScale,
      lossCoefficients: scenario.lossCoefficients,
      heldIndex: layout.lineHeldIndex.get(pump.id) ?? -1,
      pumpedIndex: layout.pumpedIndex.get(pump.id) ?? -1,
      energyIndex: layout.energyIndex.get(pump.id) ?? -1,
    });
  });
}
