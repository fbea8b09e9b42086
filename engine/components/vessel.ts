import type { Vessel } from '../../shared/scenario';
import {
  switchDue,
  type ModelComponent,
  type ModelContext,
  type SwitchInput,
} from '../system/model-context';
import { formatSignificant as fmt } from '../results/format-significant';
import { makeStorage, type Storage } from './vessel-storage';

/** Level ↔ volume of one vessel (the storage of the scenario's shape, media and drain parts). */
export interface VesselGeometry extends Storage {
  /** Volume at the rim, m³. */
  readonly rimVolumeM3: number;
}

/** Level ↔ volume of `vessel`; levels beyond empty and full are linear in volume. */
export function makeVesselGeometry(vessel: Vessel): VesselGeometry {
  const storage = makeStorage(vessel);
  return { ...storage, rimVolumeM3: storage.maxVolumeM3 };
}

/**
 * A vessel's limits as modes: "brimful" (level at the rim with more coming in: the surplus spills
 * over the rim and is lost) and "empty" (nothing left: outflows are cut to the inflow), plus the
 * observed crossings of its fish-safe minimum and of its overflow opening. Keeps every level
 * within [0, rim] without stiff penalty terms.
 */
export interface VesselComponent extends ModelComponent {
  readonly vessel: Vessel;
  /** Position among the vessels (= state index of its volume). */
  readonly index: number;
  readonly geometry: VesselGeometry;
  /** State index of the sink counting water lost over its rim. */
  readonly rimSinkIndex: number;
  /** Channel carrying the rim spill (set by the model while brimful). */
  readonly rimChannel: number;
  brimful: boolean;
  empty: boolean;
  belowMin: boolean;
  aboveOverflow: boolean;
}

const BRIM_ENTER = 0;
const BRIM_EXIT = 1;
const EMPTY_ENTER = 2;
const EMPTY_EXIT = 3;
const MIN_LEVEL = 4;
const OVERFLOW = 5;

/** Creates the limits component of `vessel`, whose volume is state component `index`. */
export function makeVesselComponent(
  vessel: Vessel,
  index: number,
  rimSinkIndex: number,
  rimChannel: number,
): VesselComponent {
  const geometry = makeVesselGeometry(vessel);
  const component: VesselComponent = {
    vessel,
    index,
    geometry,
    rimSinkIndex,
    rimChannel,
    brimful: false,
    empty: false,
    belowMin: vessel.minLevel !== undefined && vessel.initialLevel < vessel.minLevel,
    aboveOverflow:
      vessel.overflow !== undefined &&
      vessel.floorElevation + vessel.initialLevel > vessel.overflow.elevation,
    eventCount: 6,
    eventOffset: 0,
    computeFlows: () => {},
    eventValues: (ctx, out) => writeVesselEvents(component, ctx, out),
    switchModes: (input) => switchVesselModes(component, input),
  };
  return component;
}

function writeVesselEvents(c: VesselComponent, ctx: ModelContext, out: Float64Array): void {
  const o = c.eventOffset;
  const volume = ctx.state[c.index] as number;
  const net = ctx.netInflowM3PerS[c.index] as number;
  const level = ctx.levelM[c.index] as number;
  out[o + BRIM_ENTER] = c.brimful ? 1 : c.geometry.rimVolumeM3 - volume;
  out[o + BRIM_EXIT] = c.brimful ? net : 1;
  out[o + EMPTY_ENTER] = c.empty ? 1 : volume;
  out[o + EMPTY_EXIT] = c.empty ? -net : 1;
  const min = c.vessel.minLevel;
  out[o + MIN_LEVEL] = min === undefined ? 1 : c.belowMin ? min - level : level - min;
  const overflow = c.vessel.overflow;
  const surface = ctx.surfaceM[c.index] as number;
  out[o + OVERFLOW] =
    overflow === undefined
      ? 1
      : c.aboveOverflow
        ? surface - overflow.elevation
        : overflow.elevation - surface;
}

function switchVesselModes(c: VesselComponent, input: SwitchInput): boolean {
  const { ctx, fired, state, log } = input;
  const o = c.eventOffset;
  const t = ctx.timeS;
  let changed = spillAboveRim(c, input, fired[o + BRIM_ENTER] === 1);
  const volume = state[c.index] as number;
  const net = ctx.netInflowM3PerS[c.index] as number;
  const level = ctx.levelM[c.index] as number;
  if (!c.brimful && switchDue(fired, o + BRIM_ENTER, c.geometry.rimVolumeM3 - volume) && net > 0) {
    c.brimful = true;
    changed = true;
    log({
      t_s: t,
      kind: 'rim-overflow',
      where: c.vessel.id,
      detail: `${c.vessel.id} is full to its rim (${fmt(c.vessel.height)} m) and spills over it; the water is lost.`,
      values: { inflowM3PerS: net },
    });
  } else if (c.brimful && switchDue(fired, o + BRIM_EXIT, net)) {
    c.brimful = false;
    changed = true;
  }
  if (!c.empty && switchDue(fired, o + EMPTY_ENTER, volume) && net < 0) {
    c.empty = true;
    changed = true;
  } else if (c.empty && switchDue(fired, o + EMPTY_EXIT, -net)) {
    c.empty = false;
    changed = true;
  }
  return switchObservations(c, input, level) || changed;
}

/**
 * After an instant transfer a vessel may hold more than its rim volume: the surplus spills at once.
 * When the rim event itself fired, the surplus is only the event's location overshoot: not reported.
 */
function spillAboveRim(c: VesselComponent, input: SwitchInput, rimEventFired: boolean): boolean {
  const volume = input.state[c.index] as number;
  const surplus = volume - c.geometry.rimVolumeM3;
  if (!(surplus > 0)) return false;
  input.state[c.index] = c.geometry.rimVolumeM3;
  input.state[c.rimSinkIndex] = (input.state[c.rimSinkIndex] as number) + surplus;
  if (!c.brimful && !rimEventFired && surplus > 1e-9 * c.geometry.rimVolumeM3) {
    input.log({
      t_s: input.ctx.timeS,
      kind: 'rim-overflow',
      where: c.vessel.id,
      detail: `${fmt(surplus * 1000)} L arriving at once spilled over the rim of ${c.vessel.id}.`,
      values: { lostM3: surplus },
    });
  }
  return true;
}

function switchObservations(c: VesselComponent, input: SwitchInput, level: number): boolean {
  const { ctx, log, fired } = input;
  const o = c.eventOffset;
  const t = ctx.timeS;
  let changed = false;
  const min = c.vessel.minLevel;
  if (
    min !== undefined &&
    (c.belowMin
      ? switchDue(fired, o + MIN_LEVEL, min - level)
      : switchDue(fired, o + MIN_LEVEL, level - min))
  ) {
    c.belowMin = !c.belowMin;
    changed = true;
    if (c.belowMin)
      log({
        t_s: t,
        kind: 'below-min-level',
        where: c.vessel.id,
        detail: `${c.vessel.id} fell below its minimum level of ${fmt(min)} m.`,
        values: { minLevelM: min },
      });
  }
  const overflow = c.vessel.overflow;
  const surface = ctx.surfaceM[c.index] as number;
  if (
    overflow !== undefined &&
    (c.aboveOverflow
      ? switchDue(fired, o + OVERFLOW, surface - overflow.elevation)
      : switchDue(fired, o + OVERFLOW, overflow.elevation - surface))
  ) {
    c.aboveOverflow = !c.aboveOverflow;
    changed = true;
    const kind = c.aboveOverflow ? 'overflow-start' : 'overflow-end';
    const verb = c.aboveOverflow ? 'started' : 'stopped';
    log({
      t_s: t,
      kind,
      where: c.vessel.id,
      detail: `The overflow of ${c.vessel.id} (elevation ${fmt(overflow.elevation)} m, to ${overflow.to}) ${verb}.`,
      values: { elevationM: overflow.elevation },
    });
  }
  return changed;
}
