/**
 * How each sweep parameter reads from and writes into a normalised scenario. Every write returns
 * a new scenario (the input is never changed); the part named by the axis must exist.
 */
import type { SweepParameter } from '../../shared/contracts/sweeps';
import type { BedVessel, Pump, Scenario, Shape, Vessel } from '../../shared/scenario/index';

/** The part an axis acts on: a pump, bed or vessel id, and an outlet index for valves. */
export interface SweepTarget {
  target: string;
  outlet?: number;
}

/** Reads the current value, writes a value, and names the axis. */
interface ParameterHandler {
  /** The value in `scenario`, SI; throws a plain Error naming the problem when the target is wrong. */
  read(scenario: Scenario, target: SweepTarget): number;
  write(scenario: Scenario, target: SweepTarget, value: number): Scenario;
  label(target: SweepTarget): string;
  /** Whether a value is physically possible before any cross-field rule. */
  accepts(value: number): boolean;
}

function findBed(scenario: Scenario, id: string): BedVessel {
  const bed = scenario.vessels.find((v) => v.id === id);
  if (!bed || bed.kind !== 'bed') throw new Error(`"${id}" is not a bed of this system.`);
  return bed;
}

function findPump(scenario: Scenario, id: string): Pump {
  const pump = scenario.pumps.find((p) => p.id === id);
  if (!pump) throw new Error(`"${id}" is not a pump of this system.`);
  return pump;
}

function findStore(scenario: Scenario, id: string): Vessel {
  const vessel = scenario.vessels.find((v) => v.id === id);
  if (!vessel || vessel.kind === 'bed')
    throw new Error(`"${id}" is not a tank or sump of this system.`);
  return vessel;
}

function replaceVessel(scenario: Scenario, id: string, change: (v: Vessel) => Vessel): Scenario {
  return { ...scenario, vessels: scenario.vessels.map((v) => (v.id === id ? change(v) : v)) };
}

function replacePump(scenario: Scenario, id: string, change: (p: Pump) => Pump): Scenario {
  return { ...scenario, pumps: scenario.pumps.map((p) => (p.id === id ? change(p) : p)) };
}

function replaceDrain(
  scenario: Scenario,
  bedId: string,
  change: (bed: BedVessel) => BedVessel['drain'],
): Scenario {
  findBed(scenario, bedId);
  return replaceVessel(scenario, bedId, (v) => (v.kind === 'bed' ? { ...v, drain: change(v) } : v));
}

function outletIndex(pump: Pump, target: SweepTarget): number {
  const index = target.outlet ?? 0;
  if (!pump.outlets[index]) throw new Error(`Pump "${pump.id}" has no outlet ${index}.`);
  return index;
}

/**
 * Volume to the rim of a tank or sump, m³: plan area times height for a box or cylinder, the
 * integral of the linearly interpolated areas for a level table (constant above its last point).
 */
export function vesselVolumeM3(vessel: Vessel): number {
  const { shape, height } = vessel;
  if (shape.type === 'box') return shape.length * shape.width * height;
  if (shape.type === 'cylinder') return (Math.PI / 4) * shape.diameter ** 2 * height;
  let volume = 0;
  const points = shape.points;
  for (let k = 1; k < points.length; k += 1) {
    const a = points[k - 1] as { level: number; area: number };
    const b = points[k] as { level: number; area: number };
    const top = Math.min(b.level, height);
    if (top <= a.level) break;
    const areaAtTop = a.area + ((b.area - a.area) * (top - a.level)) / (b.level - a.level);
    volume += 0.5 * (a.area + areaAtTop) * (top - a.level);
  }
  const last = points[points.length - 1];
  if (last && height > last.level) volume += last.area * (height - last.level);
  return volume;
}

/** The shape with its plan area scaled by `factor` (lengths by √factor), height unchanged. */
function scalePlan(shape: Shape, factor: number): Shape {
  const k = Math.sqrt(factor);
  if (shape.type === 'box')
    return { type: 'box', length: shape.length * k, width: shape.width * k };
  if (shape.type === 'cylinder') return { type: 'cylinder', diameter: shape.diameter * k };
  return {
    type: 'table',
    points: shape.points.map((p) => ({ level: p.level, area: p.area * factor })),
  };
}

const positive = (value: number): boolean => value > 0 && Number.isFinite(value);

const drainHandlers = {
  'standpipe-height': {
    read: (s, t) => findBed(s, t.target).drain.standpipe.height,
    write: (s, t, value) =>
      replaceDrain(s, t.target, (bed) => ({
        ...bed.drain,
        standpipe: { ...bed.drain.standpipe, height: value },
      })),
    label: (t) => `Standpipe height of ${t.target}`,
    accepts: positive,
  },
  'intake-height': {
    read: (s, t) => {
      const drain = findBed(s, t.target).drain;
      if (drain.type !== 'bell-siphon')
        throw new Error(`Bed "${t.target}" has no bell, so no intake height.`);
      return drain.bell.snorkelHeight ?? drain.bell.intakeHeight;
    },
    write: (s, t, value) =>
      replaceDrain(s, t.target, (bed) => {
        const drain = bed.drain;
        if (drain.type !== 'bell-siphon') return drain;
        const key = drain.bell.snorkelHeight === undefined ? 'intakeHeight' : 'snorkelHeight';
        return { ...drain, bell: { ...drain.bell, [key]: value } };
      }),
    label: (t) => `Bell intake height (break level) of ${t.target}`,
    accepts: positive,
  },
  'standpipe-diameter': {
    read: (s, t) => findBed(s, t.target).drain.standpipe.innerDiameter,
    write: (s, t, value) =>
      replaceDrain(s, t.target, (bed) => {
        const sp = bed.drain.standpipe;
        return {
          ...bed.drain,
          standpipe: {
            ...sp,
            innerDiameter: value,
            outerDiameter: value + (sp.outerDiameter - sp.innerDiameter),
          },
        };
      }),
    label: (t) => `Standpipe bore of ${t.target}`,
    accepts: positive,
  },
  'drain-diameter': {
    read: (s, t) => findBed(s, t.target).drain.pipe.innerDiameter,
    write: (s, t, value) =>
      replaceDrain(s, t.target, (bed) => ({
        ...bed.drain,
        pipe: { ...bed.drain.pipe, innerDiameter: value },
      })),
    label: (t) => `Drain pipe bore of ${t.target}`,
    accepts: positive,
  },
} satisfies Partial<Record<SweepParameter, ParameterHandler>>;

/** Every parameter's handler. */
export const SWEEP_PARAMETER_HANDLERS: Readonly<Record<SweepParameter, ParameterHandler>> = {
  ...drainHandlers,
  'pump-flow-scale': {
    read: (s, t) => findPump(s, t.target).flowScale,
    write: (s, t, value) => replacePump(s, t.target, (p) => ({ ...p, flowScale: value })),
    label: (t) => `Flow scale of pump ${t.target}`,
    accepts: (value) => positive(value) && value <= 10,
  },
  'valve-opening': {
    read: (s, t) => {
      const pump = findPump(s, t.target);
      return pump.outlets[outletIndex(pump, t)]?.valveOpening ?? 1;
    },
    write: (s, t, value) =>
      replacePump(s, t.target, (p) => ({
        ...p,
        outlets: p.outlets.map((o, i) =>
          i === outletIndex(p, t) ? { ...o, valveOpening: value } : o,
        ),
      })),
    label: (t) => `Valve opening of pump ${t.target}, outlet ${(t.outlet ?? 0) + 1}`,
    accepts: (value) => value > 0 && value <= 1,
  },
  'vessel-volume': {
    read: (s, t) => vesselVolumeM3(findStore(s, t.target)),
    write: (s, t, value) => {
      const vessel = findStore(s, t.target);
      const factor = value / vesselVolumeM3(vessel);
      return replaceVessel(s, t.target, (v) => ({ ...v, shape: scalePlan(v.shape, factor) }));
    },
    label: (t) => `Volume of ${t.target}`,
    accepts: positive,
  },
};
