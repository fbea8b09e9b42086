import type { LossCoefficients, Pump } from '../../shared/scenario/index';
import { brentRoot } from '../hydraulics/brent-root';
import { ballValveK } from '../hydraulics/minor-loss';
import { flowForHeadM3PerS, pipeHeadLossM } from '../hydraulics/pipe-flow';
import { makePumpCurve, type PumpCurve } from '../hydraulics/pump-curve';
import { makePipeRun, type FrictionModel, type PipeRun } from '../hydraulics/pipe-run';

/** A pump line ready for the operating-point solve. */
export interface PumpLineHydraulics {
  curve: PumpCurve;
  /** Main pipe, source to manifold; its ΣK includes the intake entrance. */
  main: PipeRun;
  /** Outlet pipes, manifold to each outlet; ΣK includes each valve's opening. */
  outlets: PipeRun[];
  /** K of each outlet's exit velocity head (1: the jet's energy is lost). */
  exitK: number;
}

/** The solved state of a running pump line. */
export interface PumpOperatingPoint {
  pumpFlowM3PerS: number;
  /** Pump head at that flow, m. */
  headM: number;
  outletFlowsM3PerS: number[];
  /** Energy head at the manifold, m above the datum. */
  manifoldHeadM: number;
}

/**
 * Prepares a scenario pump line: its curve (flow scale times `extraFlowScale`, e.g. a worn-pump
 * fault), the main pipe with the intake entrance K, outlets with their valves' K.
 */
export function makePumpLineHydraulics(
  pump: Pump,
  coefficients: LossCoefficients,
  extraFlowScale = 1,
): PumpLineHydraulics {
  return {
    curve: makePumpCurve(pump, pump.flowScale * extraFlowScale),
    main: makePipeRun(pump.main, coefficients, coefficients.entrance),
    outlets: pump.outlets.map((outlet) => {
      const valveK = outlet.valveOpening >= 1 ? 0 : ballValveK(outlet.valveOpening, 0);
      return makePipeRun(outlet.pipe, coefficients, valveK);
    }),
    exitK: coefficients.exit,
  };
}

/** Manifold energy head E_m(Q) = z_S + H(Q) − h_main(Q), m. */
function manifoldHeadM(
  line: PumpLineHydraulics,
  sourceM: number,
  flow: number,
  model: FrictionModel,
  nu: number,
): number {
  return sourceM + line.curve.headM(flow) - pipeHeadLossM(line.main, flow, model, nu);
}

function outletFlows(
  line: PumpLineHydraulics,
  headM: number,
  targets: readonly number[],
  model: FrictionModel,
  nu: number,
): number[] {
  return line.outlets.map((outlet, i) => {
    const available = headM - (targets[i] ?? Number.POSITIVE_INFINITY);
    return available > 0 ? flowForHeadM3PerS(outlet, available, model, nu, line.exitK) : 0;
  });
}

/** Finds [lo, hi] around the warm start where the residual changes sign, or undefined. */
function warmBracket(
  residual: (q: number) => number,
  warm: number,
  limit: number,
): [number, number] | undefined {
  for (let width = 1e-3; width <= 1; width *= 8) {
    const lo = warm * (1 - width);
    const hi = Math.min(warm * (1 + width), limit);
    if (residual(lo) >= 0 && residual(hi) <= 0) return [lo, hi];
  }
  return undefined;
}

/**
 * The flow of a running pump line: with E_m(Q_p) = z_S + H(Q_p) − h_main(Q_p) the energy head at
 * the manifold (h_main: friction and fittings of the main pipe, intake entrance included), each
 * outlet i carries Q_i = 0 when E_m ≤ z_i, else the flow for which E_m − z_i = h_i(Q_i) + K_exit·v_i²/2g;
 * continuity Σ Q_i(E_m(Q_p)) = Q_p. The residual Σ Q_i − Q_p is strictly decreasing in Q_p, so its
 * one root on [0, Q_max] (extended while gravity alone drives more than Q_max) is found by Brent's
 * method to better than 1e-10 relative, from a narrow bracket round `warmStartM3PerS` when given.
 * `sourceSurfaceElevationM` z_S and `outletTargetsM` z_i (outlet end, or the destination's surface
 * when the outlet is submerged) in m above the datum; ν in m²/s.
 * Source: energy equation for branching pipes (the three-reservoir problem) with a pump, as in
 * Streeter & Wylie, Fluid Mechanics (and EPANET's node balance); pump curve as `makePumpCurve`.
 */
export function solvePumpOperatingPoint(
  line: PumpLineHydraulics,
  sourceSurfaceElevationM: number,
  outletTargetsM: readonly number[],
  model: FrictionModel,
  kinematicViscosityM2PerS: number,
  warmStartM3PerS?: number,
): PumpOperatingPoint {
  const nu = kinematicViscosityM2PerS;
  const residual = (flow: number): number => {
    const head = manifoldHeadM(line, sourceSurfaceElevationM, flow, model, nu);
    let sum = 0;
    for (const q of outletFlows(line, head, outletTargetsM, model, nu)) sum += q;
    return sum - flow;
  };
  let flow = 0;
  if (residual(0) > 0) {
    let hi = line.curve.maxFlowM3PerS;
    for (let k = 0; k < 60 && residual(hi) > 0; k += 1) hi *= 2;
    const warm =
      warmStartM3PerS !== undefined && warmStartM3PerS > 0
        ? warmBracket(residual, warmStartM3PerS, hi)
        : undefined;
    const [lo, up] = warm ?? [0, hi];
    flow = brentRoot(residual, lo, up, 1e-15 * hi);
  }
  const head = manifoldHeadM(line, sourceSurfaceElevationM, flow, model, nu);
  return {
    pumpFlowM3PerS: flow,
    headM: line.curve.headM(flow),
    outletFlowsM3PerS: outletFlows(line, head, outletTargetsM, model, nu),
    manifoldHeadM: head,
  };
}
