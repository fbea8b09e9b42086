import { STANDARD_GRAVITY_M_PER_S2 as G } from './standard-gravity';

/**
 * Dimensionless spill number of a flow falling into a vertical pipe: Q / √(g·D⁵), with Q in m³/s
 * and D the bore in m. The siphon primes when it reaches the priming coefficient k_p; vertical
 * drain-stack practice puts plug formation near 0.55–0.9 for 1/4–1/3 full (Wyly & Eaton, NBS BMS
 * 132, 1952). It is the number an instructor explains: the same value means the same behaviour in
 * any pipe size.
 */
export function spillNumber(flowM3PerS: number, boreDiameterM: number): number {
  return flowM3PerS / Math.sqrt(G * boreDiameterM ** 5);
}
