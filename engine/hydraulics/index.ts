/**
 * The engine's static physics, for re-export from engine/index.ts: water properties, orifice,
 * weir and pipe-friction formulas, pump curves, pipe flow and its inverse, the pump operating
 * point, vessel storage and the full-bore siphon flow.
 */
export { brentRoot, RootBracketError } from './brent-root';
export {
  colebrookFrictionFactor,
  LAMINAR_LIMIT_REYNOLDS,
  TURBULENT_LIMIT_REYNOLDS,
} from './colebrook-friction';
export { darcyWeisbachHeadLossM } from './darcy-weisbach-loss';
export { flowForMonotoneHeadM3PerS } from './flow-for-monotone-head';
export { hazenWilliamsHeadLossM } from './hazen-williams-loss';
export { ballValveK, minorLossCoefficient } from './minor-loss';
export { ORIFICE_DISCHARGE_COEFFICIENTS } from './orifice-discharge-coefficients';
export { flowForHeadM3PerS, pipeHeadLossM } from './pipe-flow';
export { makePipeRun, type FrictionModel, type PipeRun } from './pipe-run';
export { makePumpCurve, type PumpCurve, type PumpCurveSource } from './pump-curve';
export { spillNumber } from './spill-number';
export { STANDARD_GRAVITY_M_PER_S2 } from './standard-gravity';
export { swameeJainFrictionFactor } from './swamee-jain-friction';
export { REGULARISATION_HEAD_M, torricelliOutflowM3PerS } from './torricelli-outflow';
export {
  waterDensityKgPerM3,
  waterDynamicViscosityPaS,
  waterKinematicViscosityM2PerS,
} from './water-properties';
export { rimControlSwitchHeadM, rimSpillFlowM3PerS, weirFlowM3PerS } from './weir-flow';
export { makeStorage, type Storage } from '../components/vessel-storage';
export { primingFlowM3PerS, siphonFullBoreFlowM3PerS } from '../components/siphon-flow';
export {
  makePumpLineHydraulics,
  solvePumpOperatingPoint,
  type PumpLineHydraulics,
  type PumpOperatingPoint,
} from '../system/operating-point';
