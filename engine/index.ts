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
export {
  primingFlowM3PerS,
  rimSpillFlowM3PerS,
  siphonFullBoreFlowM3PerS,
  spillNumber,
  STANDARD_GRAVITY_M_PER_S2,
  torricelliOutflowM3PerS,
  weirFlowM3PerS,
} from './hydraulics/index';
export {
  bedRegime,
  cyclingInflowWindow,
  cyclingInflowWindows,
  pumpDutyPoint,
  pumpDutyPoints,
  pumpedInflowsM3PerS,
  regimeAtInflow,
  type BedRegime,
  type InflowRegime,
  type InflowWindow,
  type InflowWindowOptions,
  type PumpDutyPoint,
  type RegimeEvidence,
} from './analysis/index';
