/*
 * The normalised scenario: the same field names and nesting as the scenario file, every
 * dimensional value a plain SI number (m, m², m³, s, m³/s, W; water temperature in degrees
 * Celsius), every default filled in. Elevations (`floorElevation`, `elevation`,
 * `outletElevation`) are above the common datum; heights and levels are above the vessel's floor.
 */

/** Minor-loss coefficients K (h = K·v²/2g) of one fitting, used by every pipe of the run. */
export interface LossCoefficients {
  elbow90: number;
  elbow45: number;
  teeRun: number;
  teeBranch: number;
  /** A fully open ball valve; a partly open one adds the loss of its opening. */
  ballValve: number;
  /** Pipe entrance from a vessel (sharp edge). */
  entrance: number;
  /** Pipe exit into a vessel or the open air (the velocity head is lost). */
  exit: number;
  /** The 180° turn from the bell's annulus over the standpipe rim. */
  bellReturn: number;
}

/** Counts of fittings on one pipe. */
export interface Fittings {
  elbow90: number;
  elbow45: number;
  teeRun: number;
  teeBranch: number;
  ballValve: number;
}

/** Pipe material; sets the default roughness and Hazen–Williams C. */
export type PipeMaterial = 'pvc' | 'pe' | 'steel' | 'copper';

/** A pipe run. */
export interface Pipe {
  /** m, along the axis. */
  length: number;
  /** m, bore. */
  innerDiameter: number;
  material: PipeMaterial;
  /** Absolute roughness, m. */
  roughness: number;
  /** Hazen–Williams C (dimensionless by convention). */
  hazenWilliamsC: number;
  fittings: Fittings;
}

/** Plan shape of a vessel (m; table areas m² at levels m above the floor, linear in between). */
export type Shape =
  | { type: 'box'; length: number; width: number }
  | { type: 'cylinder'; diameter: number }
  | { type: 'table'; points: { level: number; area: number }[] };

/** An opening in a vessel wall at `elevation` (m above datum) leading to a vessel or "out". */
export interface Overflow {
  elevation: number;
  diameter: number;
  to: string;
  dischargeCoefficient: number;
  /** C_w in Q = C_w·L·H^1.5, m^0.5/s. */
  weirCoefficient: number;
}

/** The standpipe inside a bed: diameters (m) and top height above the bed floor (m). */
export interface Standpipe {
  innerDiameter: number;
  outerDiameter: number;
  height: number;
  /** C_w of the rim weir, m^0.5/s. */
  weirCoefficient: number;
  /** C_d of the rim acting as an orifice at higher heads. */
  dischargeCoefficient: number;
}

/** The bell over the standpipe (m). Without slots the bell stands on spacers `intakeHeight` high. */
export interface Bell {
  innerDiameter: number;
  /** Equals `innerDiameter` when not given (wall volume neglected). */
  outerDiameter: number;
  /** Gap between the standpipe top and the bell cap. */
  capGap: number;
  /** Top of the intake slots (or spacer gap) above the bed floor: the break level. */
  intakeHeight: number;
  slotCount?: number;
  slotWidth?: number;
  /** Inlet height of a snorkel, above the bed floor; when given it sets the break level. */
  snorkelHeight?: number;
}

interface DrainCommon {
  /** Receiving vessel id (a tank or sump). */
  to: string;
  /** The drain pipe below the bed, from the bed floor to the outlet. */
  pipe: Pipe;
  /** m above datum. */
  outletElevation: number;
  /** Calibration multiplier on the drain's losses. */
  dischargeLossMultiplier: number;
  /** Media guard around the bell, m. */
  guard?: { diameter: number };
  standpipe: Standpipe;
}

/** A bell siphon drain. */
export interface BellSiphonDrain extends DrainCommon {
  type: 'bell-siphon';
  bell: Bell;
  /** k_p in Q_prime = k_p·√(g·D_s⁵); default is an analogy with drain stacks. */
  primingCoefficient: number;
}

/** A plain overflow standpipe, with an optional weep hole at the floor. */
export interface StandpipeDrain extends DrainCommon {
  type: 'standpipe';
  weepHole?: { diameter: number; dischargeCoefficient: number };
}

/** How a bed drains. */
export type Drain = BellSiphonDrain | StandpipeDrain;

/** Bed media; `depth` m above the bed floor. */
export interface Media {
  type: 'gravel' | 'expanded-clay' | 'lava-rock' | 'none';
  porosity: number;
  depth: number;
}

interface VesselCommon {
  id: string;
  shape: Shape;
  /** m above datum. */
  floorElevation: number;
  /** Rim height above the floor, m. */
  height: number;
  /** m above the floor. */
  initialLevel: number;
  /** Fish-safe minimum level above the floor, m. */
  minLevel?: number;
  overflow?: Overflow;
}

/** A fish tank or a sump. */
export interface TankVessel extends VesselCommon {
  kind: 'tank' | 'sump';
}

/** A grow bed. */
export interface BedVessel extends VesselCommon {
  kind: 'bed';
  media: Media;
  drain: Drain;
}

/** Any vessel. */
export type Vessel = TankVessel | BedVessel;

/** One pump-curve point: flow m³/s, head m. */
export interface PumpCurvePoint {
  flow: number;
  head: number;
}

/** One outlet of a pump line, ending at `elevation` (m above datum). */
export interface PumpOutlet {
  to: string;
  elevation: number;
  /** Fraction of the valve's flow area open, 0–1. */
  valveOpening: number;
  pipe: Pipe;
}

/** A pump line. `curve` is sorted by flow; a parabola pump also keeps `maxHead` and `maxFlow`. */
export interface Pump {
  id: string;
  in: string;
  /** m above the source vessel's floor. */
  intakeHeight: number;
  curveKind: 'points' | 'parabola';
  curve: PumpCurvePoint[];
  maxHead?: number;
  maxFlow?: number;
  /** Constant electrical power while running, W; unknown when absent. */
  power?: number;
  checkValve: boolean;
  /** Multiplies the curve's flows (wear, clogging). */
  flowScale: number;
  initialState: 'on' | 'off';
  main: Pipe;
  outlets: PumpOutlet[];
}

/** A leak from vessel `from` at `elevation` (m above datum), open from `start` (s). */
export interface Leak {
  from: string;
  elevation: number;
  diameter: number;
  start: number;
  dischargeCoefficient: number;
}

/** A timed pump switch, or all pumps' power off/on, at `at` seconds. */
export type ScheduleEntry =
  { at: number; pump: string; state: 'on' | 'off' } | { at: number; power: 'on' | 'off' };

/** A float switch (levels m above the vessel floor). */
export interface FloatSwitchControl {
  kind: 'float-switch';
  pump: string;
  vessel: string;
  stopBelow: number;
  restartAbove: number;
}

/** A fault for what-if runs. */
export type Fault =
  | { kind: 'drain-blocked'; bed: string; fraction: number }
  | { kind: 'pump-worn'; pump: string; flowScale: number };

/** Run settings: duration and output interval in s, relative tolerance, friction model. */
export interface RunSettings {
  duration: number;
  outputInterval: number;
  tolerance: number;
  friction: 'darcy-weisbach' | 'hazen-williams';
}

/** A whole normalised scenario. */
export interface Scenario {
  format: 'scenario/1';
  name: string;
  description?: string;
  /** `temperature` in degrees Celsius. */
  water: { temperature: number };
  vessels: Vessel[];
  pumps: Pump[];
  leaks: Leak[];
  schedule: ScheduleEntry[];
  controls: FloatSwitchControl[];
  faults: Fault[];
  lossCoefficients: LossCoefficients;
  run: RunSettings;
}
