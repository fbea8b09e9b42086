import { darcyWeisbachHeadLossM } from './darcy-weisbach-loss';
import { flowForMonotoneHeadM3PerS } from './flow-for-monotone-head';
import { hazenWilliamsHeadLossM } from './hazen-williams-loss';
import type { FrictionModel, PipeRun } from './pipe-run';
import { STANDARD_GRAVITY_M_PER_S2 as G } from './standard-gravity';

/** Flow area of a pipe's bore, m². */
function boreAreaM2(pipe: PipeRun): number {
  return (Math.PI / 4) * pipe.diameterM * pipe.diameterM;
}

/** Friction head loss of a pipe by the run's model, m, odd in Q. */
function frictionHeadLossM(
  pipe: PipeRun,
  flowM3PerS: number,
  model: FrictionModel,
  nu: number,
): number {
  if (model === 'hazen-williams')
    return hazenWilliamsHeadLossM(pipe.lengthM, flowM3PerS, pipe.hazenWilliamsC, pipe.diameterM);
  return darcyWeisbachHeadLossM(pipe.lengthM, pipe.diameterM, flowM3PerS, pipe.roughnessM, nu);
}

/**
 * Head loss along a pipe, m of water: friction (Darcy–Weisbach with Colebrook, or Hazen–Williams)
 * plus minor losses ΣK·v²/(2g), v = 4Q/(πD²). Odd in Q (negative for backflow).
 * `flowM3PerS` m³/s, `kinematicViscosityM2PerS` m²/s (Darcy–Weisbach only). Sources: see
 * `darcyWeisbachHeadLossM`, `hazenWilliamsHeadLossM`, `minorLossCoefficient`.
 */
export function pipeHeadLossM(
  pipe: PipeRun,
  flowM3PerS: number,
  model: FrictionModel,
  kinematicViscosityM2PerS: number,
): number {
  const velocity = flowM3PerS / boreAreaM2(pipe);
  const minor = (pipe.minorLossK * velocity * Math.abs(velocity)) / (2 * G);
  return frictionHeadLossM(pipe, flowM3PerS, model, kinematicViscosityM2PerS) + minor;
}

/**
 * An upper bound on the flow a head H can drive through a pipe, m³/s: each loss term alone would
 * use all of H at a lower flow than the total loss does, so the smallest of their flows bounds it.
 */
function flowBoundM3PerS(
  pipe: PipeRun,
  headM: number,
  model: FrictionModel,
  nu: number,
  kTotal: number,
): number {
  const area = boreAreaM2(pipe);
  let bound = kTotal > 0 ? area * Math.sqrt((2 * G * headM) / kTotal) : Number.POSITIVE_INFINITY;
  if (pipe.lengthM > 0 && model === 'hazen-williams') {
    const loss1 = hazenWilliamsHeadLossM(pipe.lengthM, 1, pipe.hazenWilliamsC, pipe.diameterM);
    bound = Math.min(bound, (headM / loss1) ** (1 / 1.852));
  } else if (pipe.lengthM > 0) {
    // Colebrook's f exceeds 64/Re above Re 2000, so the laminar loss is a lower bound on friction.
    const laminarVelocity =
      (headM * G * pipe.diameterM * pipe.diameterM) / (32 * nu * pipe.lengthM);
    bound = Math.min(bound, laminarVelocity * area);
  }
  return bound * (1 + 1e-9);
}

/**
 * Flow through a pipe (m³/s) that uses exactly `availableHeadM` (m) on its friction, its minor
 * losses and `extraK`·v²/(2g) (e.g. the exit velocity head, K = 1): the inverse of
 * `pipeHeadLossM` + extraK·v²/2g, which is increasing in Q, solved by Brent's method to better than
 * 1e-10 relative. Odd in the head (negative head gives backflow); 0 when `extraK` is infinite (a
 * closed valve). Sources as `pipeHeadLossM`.
 */
export function flowForHeadM3PerS(
  pipe: PipeRun,
  availableHeadM: number,
  model: FrictionModel,
  kinematicViscosityM2PerS: number,
  extraK = 0,
): number {
  if (availableHeadM < 0)
    return -flowForHeadM3PerS(pipe, -availableHeadM, model, kinematicViscosityM2PerS, extraK);
  if (
    availableHeadM === 0 ||
    extraK === Number.POSITIVE_INFINITY ||
    pipe.minorLossK === Number.POSITIVE_INFINITY
  )
    return 0;
  const area = boreAreaM2(pipe);
  const headAtFlow = (flow: number): number => {
    const velocity = flow / area;
    return (
      pipeHeadLossM(pipe, flow, model, kinematicViscosityM2PerS) +
      (extraK * velocity * velocity) / (2 * G)
    );
  };
  const bound = flowBoundM3PerS(
    pipe,
    availableHeadM,
    model,
    kinematicViscosityM2PerS,
    pipe.minorLossK + extraK,
  );
  return flowForMonotoneHeadM3PerS(headAtFlow, availableHeadM, bound);
}
