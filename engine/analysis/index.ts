/**
 * Analyses built on the engine: the cycling inflow window of a bell-siphon bed solved from its flow
 * balance, pump duty points at the starting levels, a bed's regime in a run, bed loads.
 */
export { bedRegime, type BedRegime, type RegimeEvidence } from './bed-regime';
export {
  cyclingInflowWindow,
  cyclingInflowWindows,
  regimeAtInflow,
  type InflowRegime,
  type InflowWindow,
  type InflowWindowOptions,
} from './cycling-inflow-window';
export {
  pumpDutyPoint,
  pumpDutyPoints,
  pumpedInflowsM3PerS,
  type PumpDutyPoint,
} from './pump-duty-points';
export {
  bedStructuralLoad,
  MEDIA_DENSITIES,
  type BedStructuralLoad,
  type MediaDensity,
} from './bed-structural-load';
export { pumpReserves, type PumpReserve } from './pump-reserves';
