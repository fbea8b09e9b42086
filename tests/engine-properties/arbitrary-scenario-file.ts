import fc from 'fast-check';
import type { ScenarioFile } from '../../shared/scenario';

/** Schedule-40 PVC bores with their outer diameters, m (ASME B36.10: ½, ¾, 1 inch). */
const STANDPIPES = [
  { inner: 0.0158, outer: 0.0213 },
  { inner: 0.0209, outer: 0.0267 },
  { inner: 0.0266, outer: 0.0334 },
] as const;

const round = (value: number, step = 1e-4): number => Math.round(value / step) * step;

/** A bed placed above the tank, draining back into it, fed by one pump outlet. */
const arbitraryBed = (index: number, tankHeightM: number, bellOnly: boolean) =>
  fc
    .record({
      lengthM: fc.double({ min: 0.4, max: 1.2, noNaN: true }),
      widthM: fc.double({ min: 0.3, max: 0.8, noNaN: true }),
      heightM: fc.double({ min: 0.2, max: 0.35, noNaN: true }),
      liftM: fc.double({ min: 0.1, max: 0.4, noNaN: true }),
      media: fc.constantFrom('gravel', 'expanded-clay', 'lava-rock'),
      bell: bellOnly ? fc.constant(true) : fc.boolean(),
      pipe: fc.constantFrom(...STANDPIPES),
      crestFraction: fc.double({ min: 0.6, max: 0.85, noNaN: true }),
      bellRatio: fc.double({ min: 2, max: 3, noNaN: true }),
      intakeM: fc.double({ min: 0.015, max: 0.04, noNaN: true }),
      drainLengthM: fc.double({ min: 0.5, max: 2, noNaN: true }),
      elbows: fc.integer({ min: 0, max: 3 }),
      outletDropM: fc.double({ min: 0.05, max: 0.3, noNaN: true }),
      weepMm: fc.double({ min: 3, max: 8, noNaN: true }),
      initialFraction: fc.double({ min: 0, max: 0.5, noNaN: true }),
    })
    .map((b) => {
      const floorM = round(tankHeightM + b.liftM);
      const heightM = round(b.heightM);
      const crestM = round(heightM * b.crestFraction);
      const common = {
        to: 'tank',
        pipe: {
          length: round(b.drainLengthM),
          innerDiameter: b.pipe.inner,
          fittings: { elbow90: b.elbows },
        },
        outletElevation: round(floorM - b.outletDropM),
        standpipe: { innerDiameter: b.pipe.inner, outerDiameter: b.pipe.outer, height: crestM },
      };
      const drain = b.bell
        ? {
            type: 'bell-siphon' as const,
            ...common,
            bell: {
              innerDiameter: round(b.pipe.outer * b.bellRatio),
              capGap: 0.02,
              intakeHeight: round(Math.min(b.intakeM, crestM / 2)),
            },
          }
        : {
            type: 'standpipe' as const,
            ...common,
            weepHole: { diameter: round(b.weepMm / 1000, 1e-5) },
          };
      return {
        id: `bed-${index}`,
        kind: 'bed' as const,
        shape: { type: 'box' as const, length: round(b.lengthM), width: round(b.widthM) },
        floorElevation: floorM,
        height: heightM,
        initialLevel: round(crestM * b.initialFraction),
        media: { type: b.media, depth: round(heightM - 0.01) },
        drain,
      };
    });

function drawings(steady: boolean) {
  return {
    tank: fc.record({
      lengthM: fc.double({ min: 0.6, max: 1.5, noNaN: true }),
      widthM: fc.double({ min: 0.4, max: 1.0, noNaN: true }),
      heightM: fc.double({ min: 0.4, max: 0.8, noNaN: true }),
      levelFraction: fc.double({ min: steady ? 0.8 : 0.5, max: 0.9, noNaN: true }),
    }),
    bedCount: fc.integer({ min: 1, max: 3 }),
    pump: fc.record({
      maxHeadM: fc.double({ min: 1.5, max: 3.5, noNaN: true }),
      maxFlowLPerH: fc.double({ min: 600, max: 3000, noNaN: true }),
      intakeM: fc.double({ min: 0.02, max: steady ? 0.04 : 0.12, noNaN: true }),
      checkValve: fc.boolean(),
      outletRiseM: fc.double({ min: 0.05, max: 0.3, noNaN: true }),
      outletLengthM: fc.double({ min: 0.5, max: 3, noNaN: true }),
    }),
    overflow: fc.boolean(),
    leak: steady
      ? fc.constant(undefined)
      : fc.option(
          fc.record({
            diameterMm: fc.double({ min: 2, max: 10, noNaN: true }),
            startS: fc.integer({ min: 0, max: 900 }),
          }),
          { nil: undefined },
        ),
    powerCut: steady
      ? fc.constant(undefined)
      : fc.option(
          fc.record({
            atS: fc.integer({ min: 60, max: 600 }),
            forS: fc.integer({ min: 60, max: 400 }),
          }),
          { nil: undefined },
        ),
    floatSwitch: steady ? fc.constant(false) : fc.boolean(),
  };
}

type Drawn = {
  [K in keyof ReturnType<typeof drawings>]: ReturnType<typeof drawings>[K] extends fc.Arbitrary<
    infer T
  >
    ? T
    : never;
};
type DrawnBed = ReturnType<typeof arbitraryBed> extends fc.Arbitrary<infer T> ? T : never;

function assembleFile(s: Drawn, beds: DrawnBed[]): ScenarioFile {
  const tankHeightM = round(s.tank.heightM);
  const intakeM = round(s.pump.intakeM);
  const file: ScenarioFile = {
    format: 'scenario/1',
    name: 'random system',
    vessels: [
      {
        id: 'tank',
        kind: 'tank',
        shape: { type: 'box', length: round(s.tank.lengthM), width: round(s.tank.widthM) },
        floorElevation: 0,
        height: tankHeightM,
        initialLevel: round(tankHeightM * s.tank.levelFraction),
        ...(s.overflow && {
          overflow: { elevation: round(tankHeightM * 0.92), diameter: 0.04, to: 'out' },
        }),
      },
      ...beds,
    ],
    pumps: [
      {
        id: 'pump',
        in: 'tank',
        intakeHeight: intakeM,
        maxHead: round(s.pump.maxHeadM),
        maxFlow: s.pump.maxFlowLPerH / 3.6e6,
        checkValve: s.pump.checkValve,
        main: { length: 0.6, innerDiameter: 0.0209 },
        outlets: beds.map((bed) => ({
          to: bed.id,
          elevation: round(bed.floorElevation + bed.height + s.pump.outletRiseM),
          pipe: {
            length: round(s.pump.outletLengthM),
            innerDiameter: 0.0158,
            fittings: { elbow90: 2 },
          },
        })),
      },
    ],
    leaks: s.leak
      ? [
          {
            from: 'tank',
            elevation: round(intakeM + 0.02),
            diameter: round(s.leak.diameterMm / 1000, 1e-5),
            start: s.leak.startS,
          },
        ]
      : [],
    schedule: s.powerCut
      ? [
          { at: s.powerCut.atS, power: 'off' },
          { at: s.powerCut.atS + s.powerCut.forS, power: 'on' },
        ]
      : [],
    controls: s.floatSwitch
      ? [
          {
            kind: 'float-switch',
            pump: 'pump',
            vessel: 'tank',
            stopBelow: round(intakeM + 0.03),
            restartAbove: round(intakeM + 0.08),
          },
        ]
      : [],
    run: { duration: 1200, outputInterval: 10 },
  };
  return file;
}

/**
 * Random valid systems: a fish tank with one to three beds above it (bell siphons or standpipes
 * with weep holes), one pump with an outlet per bed, and optionally an overflow, a leak, a power
 * cut and a float switch. Every dimension is drawn inside ranges that satisfy the schema's
 * geometry rules, so each file parses; the runs are 20 simulated minutes. With `steady`, only
 * bell-siphon beds on a pump that always runs from a well-filled tank: no leak, power cut or
 * float switch, so no trajectory grazes a threshold where a tiny change flips what happens.
 */
export function arbitraryScenarioFile(steady = false): fc.Arbitrary<ScenarioFile> {
  return fc
    .record(drawings(steady))
    .chain((s) =>
      fc
        .tuple(
          ...Array.from({ length: s.bedCount }, (_, i) =>
            arbitraryBed(i, round(s.tank.heightM), steady),
          ),
        )
        .map((beds) => assembleFile(s, beds)),
    );
}
