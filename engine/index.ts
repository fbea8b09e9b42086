/**
 * The Tidewright hydraulic engine: pure TypeScript, no I/O, no clock. Import only this module
 * from outside engine/.
 */
export { simulate, ScenarioModelError } from './simulate';
/**
 * The hybrid ODE model of a scenario (derivative, event functions, mode switches), for
 * verification and comparison tools such as the engine bench; applications call `simulate`.
 */
export { SystemModel } from './system/system-model';
export type {
  BedState,
  BedSummary,
  PumpSummary,
  RunEvent,
  RunStats,
  SeriesChannel,
  SimulateOptions,
  SimulationOutcome,
  SimulationResult,
  Verdict,
  VesselSummary,
} from './results/run-result';
/** The static physics: water properties, orifice, weir, friction, fittings, pump curves, storage. */
export * from './hydraulics/index';
export {
  bedRegime,
  bedStructuralLoad,
  cyclingInflowWindow,
  cyclingInflowWindows,
  pumpDutyPoint,
  pumpDutyPoints,
  pumpedInflowsM3PerS,
  pumpReserves,
  regimeAtInflow,
  MEDIA_DENSITIES,
  type BedRegime,
  type BedStructuralLoad,
  type InflowRegime,
  type InflowWindow,
  type InflowWindowOptions,
  type MediaDensity,
  type PumpDutyPoint,
  type PumpReserve,
  type RegimeEvidence,
} from './analysis/index';
