/**
 * The what-if systems behind the sizing checks, made from the design itself (the system without
 * its own schedule, leaks and faults): every bed starting empty, a power cut, a leak.
 */
import { SCENARIO_DEFAULTS, type Scenario } from '../../shared/scenario/index';

/** The plain design: no timed events, leaks or faults, every pump on at the start. */
export function plainDesign(scenario: Scenario, durationS: number): Scenario {
  return {
    ...scenario,
    schedule: [],
    leaks: [],
    faults: [],
    pumps: scenario.pumps.map((pump) => ({ ...pump, initialState: 'on' })),
    run: { ...scenario.run, duration: durationS },
  };
}

/** Cold start: the plain design with every bed empty, so that all of them fill at once. */
export function coldStart(scenario: Scenario, durationS: number): Scenario {
  const plain = plainDesign(scenario, durationS);
  return {
    ...plain,
    vessels: plain.vessels.map((v) => (v.kind === 'bed' ? { ...v, initialLevel: 0 } : v)),
  };
}

/** A cold start with the power cut at `atS` for `forS`, then back on; the run ends an hour after. */
export function powerCut(scenario: Scenario, atS: number, forS: number): Scenario {
  const start = coldStart(scenario, atS + forS + 3600);
  return {
    ...start,
    schedule: [
      { at: atS, power: 'off' },
      { at: atS + forS, power: 'on' },
    ],
  };
}

/** The plain design with a sharp-edged leak from `vesselId` at `elevationM` (above the datum), `diameterM` wide, from `startS`. */
export function withLeak(
  scenario: Scenario,
  vesselId: string,
  elevationM: number,
  diameterM: number,
  startS: number,
  durationS: number,
): Scenario {
  const plain = plainDesign(scenario, durationS);
  const leak = {
    from: vesselId,
    elevation: elevationM,
    diameter: diameterM,
    start: startS,
    dischargeCoefficient: SCENARIO_DEFAULTS.orificeDischargeCoefficient,
  };
  return { ...plain, leaks: [leak] };
}
