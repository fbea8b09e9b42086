import type { FrictionModel } from '../hydraulics/pipe-run';
import { solvePumpOperatingPoint, type PumpLineHydraulics } from '../system/operating-point';
import { makeLazyHermiteTable, type LazyHermiteTable } from './lazy-hermite-table';

/** Cells of the table over the source surface elevation. */
const CELLS = 64;

/** A pump line's response to its source level while every outlet discharges freely. */
export interface PumpResponse {
  pumpFlowM3PerS: number;
  headM: number;
  readonly outletFlowsM3PerS: Float64Array;
}

/**
 * The operating point of a running pump line as a function of its source surface elevation z_S
 * (m above datum), for outlets discharging freely at their fixed elevations: exact solves
 * (`solvePumpOperatingPoint`) at the nodes of a lazily built cubic Hermite table over
 * [zLow, zHigh]; outside it, or when `exact` is set, or when an outlet is drowned (targets given),
 * the exact solve runs, warm-started from the last flow.
 */
export interface PumpResponseFunction {
  /** Fills `into` for source surface `sourceSurfaceM` and outlet targets (m above datum). */
  evaluate(
    sourceSurfaceM: number,
    targetsM: readonly number[],
    freeDischarge: boolean,
    into: PumpResponse,
  ): void;
}

/** Builds the response of `line` (outlet elevations `elevationsM`) over [zLowM, zHighM]. */
export function makePumpResponseFunction(
  line: PumpLineHydraulics,
  elevationsM: readonly number[],
  friction: FrictionModel,
  kinematicViscosityM2PerS: number,
  zLowM: number,
  zHighM: number,
  exact: boolean,
): PumpResponseFunction {
  const outlets = elevationsM.length;
  let warm: number | undefined;
  const solve = (zS: number, targets: readonly number[], into: PumpResponse): void => {
    const point = solvePumpOperatingPoint(
      line,
      zS,
      targets,
      friction,
      kinematicViscosityM2PerS,
      warm,
    );
    warm = point.pumpFlowM3PerS > 0 ? point.pumpFlowM3PerS : undefined;
    into.pumpFlowM3PerS = point.pumpFlowM3PerS;
    into.headM = point.headM;
    for (let i = 0; i < outlets; i += 1)
      into.outletFlowsM3PerS[i] = point.outletFlowsM3PerS[i] ?? 0;
  };
  const table: LazyHermiteTable | undefined = exact
    ? undefined
    : makeLazyHermiteTable(
        2 + outlets,
        (zS, out) => {
          const point = solvePumpOperatingPoint(
            line,
            zS,
            elevationsM,
            friction,
            kinematicViscosityM2PerS,
          );
          out[0] = point.pumpFlowM3PerS;
          out[1] = point.headM;
          for (let i = 0; i < outlets; i += 1) out[2 + i] = point.outletFlowsM3PerS[i] ?? 0;
        },
        zLowM,
        zHighM,
        CELLS,
      );
  const row = new Float64Array(2 + outlets);
  return {
    evaluate: (sourceSurfaceM, targetsM, freeDischarge, into) => {
      if (!freeDischarge || table === undefined || !table.evaluate(sourceSurfaceM, row)) {
        solve(sourceSurfaceM, targetsM, into);
        return;
      }
      into.pumpFlowM3PerS = Math.max(0, row[0] as number);
      into.headM = row[1] as number;
      for (let i = 0; i < outlets; i += 1)
        into.outletFlowsM3PerS[i] = Math.max(0, row[2 + i] as number);
    },
  };
}
