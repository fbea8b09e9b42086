/**
 * Starting values for parts added in the editor, in SI (our own typical small-system sizes:
 * 1-inch Schedule 40 PVC bores, a 3-inch bell). Each is a complete, valid piece of a scenario
 * document once its `to`/`in` names an existing vessel.
 */

/** A fitting-free pipe of `lengthM` and bore `innerDiameterM`. */
export function newPipe(lengthM: number, innerDiameterM: number) {
  return {
    length: lengthM,
    innerDiameter: innerDiameterM,
    material: 'pvc',
    fittings: { elbow90: 0, elbow45: 0, teeRun: 0, teeBranch: 0, ballValve: 0 },
  };
}

/** A 1.0 × 0.6 m tank or sump, 0.6 m deep, filled to 0.5 m. */
export function newTank(id: string, kind: 'tank' | 'sump') {
  return {
    id,
    kind,
    shape: { type: 'box', length: 1.0, width: 0.6 },
    floorElevation: 0,
    height: 0.6,
    initialLevel: 0.5,
    minLevel: null,
  };
}

/** A bell-siphon drain into `to`, with a 0.25 m standpipe of 1-inch bore. */
export function newBellSiphonDrain(to: string, outletElevationM: number) {
  return {
    type: 'bell-siphon',
    to,
    standpipe: { innerDiameter: 0.0266, outerDiameter: 0.0334, height: 0.25 },
    bell: {
      innerDiameter: 0.0779,
      capGap: 0.025,
      intakeHeight: 0.025,
      slotCount: null,
      slotWidth: null,
    },
    pipe: newPipe(0.7, 0.0266),
    outletElevation: outletElevationM,
  };
}

/** A plain overflow standpipe drain into `to`. */
export function newStandpipeDrain(to: string, outletElevationM: number) {
  return {
    type: 'standpipe',
    to,
    standpipe: { innerDiameter: 0.0266, outerDiameter: 0.0334, height: 0.25 },
    pipe: newPipe(0.7, 0.0266),
    outletElevation: outletElevationM,
  };
}

/** A 1.0 × 0.6 × 0.3 m gravel bed with its floor at 0.8 m, draining to `to`. */
export function newBed(id: string, to: string) {
  return {
    id,
    kind: 'bed',
    shape: { type: 'box', length: 1.0, width: 0.6 },
    floorElevation: 0.8,
    height: 0.3,
    initialLevel: 0,
    minLevel: null,
    media: { type: 'gravel', porosity: null, depth: 0.28 },
    drain: newBellSiphonDrain(to, 0.65),
  };
}

/** An outlet into `to` at `elevationM`, valve open. */
export function newOutlet(to: string, elevationM: number) {
  return { to, elevation: elevationM, valveOpening: 1, pipe: newPipe(1.5, 0.0158) };
}

/** A small pump in `source` (2.2 m shut-off head, 2000 L/h free flow) feeding `to`. */
export function newPump(id: string, source: string, to: string) {
  return {
    id,
    in: source,
    intakeHeight: 0.05,
    curve: [
      { flow: 0, head: 2.2 },
      { flow: 1200 / 3.6e6, head: 1.4 },
      { flow: 2000 / 3.6e6, head: 0 },
    ],
    power: null,
    checkValve: false,
    initialState: 'on',
    main: newPipe(0.5, 0.0209),
    outlets: [newOutlet(to, 1.2)],
  };
}

/** A 4 mm leak in `from`, 5 cm above the datum, from the third hour. */
export function newLeak(from: string) {
  return { from, elevation: 0.05, diameter: 0.004, start: 3 * 3600 };
}

/** A power cut (all pumps off) at two hours. */
export function newPowerCut() {
  return { at: 2 * 3600, power: 'off' };
}

/** Rounds a length to the millimetre, so starting values read cleanly in the fields. */
function toMillimetre(lengthM: number): number {
  return Math.round(lengthM * 1000) / 1000;
}

/** Height of a new float switch's stop level above the pump intake, m. Common practice, no source. */
const SWITCH_ABOVE_INTAKE_M = 0.05;
/** Gap between a new float switch's stop and restart levels, m. Common practice, no source. */
const SWITCH_DIFFERENTIAL_M = 0.05;

/**
 * A low-water cut-off for `pump` floating in `vessel` (`heightM` deep) from which the pump draws
 * at `intakeM` above the floor: it stops the pump 5 cm above the intake, before the pump runs
 * dry, and lets it run again 5 cm higher. Where that does not fit below the rim, it stops below
 * half the vessel's height and restarts above two thirds of it.
 */
export function newFloatSwitch(pump: string, vessel: string, heightM: number, intakeM?: number) {
  const fits =
    intakeM !== undefined && intakeM + SWITCH_ABOVE_INTAKE_M + SWITCH_DIFFERENTIAL_M < heightM;
  const stopM = fits ? intakeM + SWITCH_ABOVE_INTAKE_M : heightM / 2;
  const restartM = fits ? stopM + SWITCH_DIFFERENTIAL_M : (heightM * 2) / 3;
  return {
    kind: 'float-switch',
    pump,
    vessel,
    stopBelow: toMillimetre(stopM),
    restartAbove: toMillimetre(restartM),
  };
}

/** A drain of `bed` half blocked (roots, fines, a snail in the standpipe). */
export function newBlockedDrain(bed: string) {
  return { kind: 'drain-blocked', bed, fraction: 0.5 };
}

/** A worn `pump` giving 80 % of its datasheet flow. */
export function newWornPump(pump: string) {
  return { kind: 'pump-worn', pump, flowScale: 0.8 };
}

/** A level-to-area table with the same plan area `areaM2` at the floor and at the rim. */
export function newAreaTable(areaM2: number, heightM: number) {
  return {
    type: 'table',
    points: [
      { level: 0, area: areaM2 },
      { level: heightM, area: areaM2 },
    ],
  };
}

/** The first id of the form `<stem>-<n>` not in `taken`. */
export function freshId(stem: string, taken: readonly string[]): string {
  for (let n = 1; ; n++) {
    const id = `${stem}-${n}`;
    if (!taken.includes(id)) return id;
  }
}
