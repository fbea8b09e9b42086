import type { Overflow } from '../../shared/scenario';
import { torricelliOutflowM3PerS } from '../hydraulics/torricelli-outflow';
import type { ModelComponent, ModelContext } from '../system/model-context';
import type { VesselComponent } from './vessel';

/**
 * Flow through a vessel's overflow opening of diameter D whose invert is at elevation z_o, m³/s:
 *   Q = min( C_w·D·H^1.5 , C_d·(π·D²/4)·√(2·g·H) ),  H = z_surface − z_o,
 * a weir over the opening's lower edge (crest length taken as D) while the head is small, an
 * orifice once it is drowned; the smaller controls (the weir-to-orifice transition of drop inlets:
 * USDA-SCS Engineering Field Manual ch. 6; EPA SWMM 5 orifice/weir notes). Discharge is free;
 * the model measures H from the receiving surface instead when that is above the opening.
 */
export function overflowFlowM3PerS(overflow: Overflow, headM: number): number {
  if (!(headM > 0)) return 0;
  // weirFlowM3PerS's law C_w·L·H^1.5, written with √ because it runs in every right-hand side.
  const weir = overflow.weirCoefficient * overflow.diameter * headM * Math.sqrt(headM);
  const areaM2 = (Math.PI / 4) * overflow.diameter ** 2;
  return Math.min(weir, torricelliOutflowM3PerS(overflow.dischargeCoefficient, areaM2, headM));
}

/**
 * The overflow of `vessel` on `channel`, to `destination` (a vessel) or, when undefined, to its
 * loss sink. The head is the surface above the opening, or above the receiving surface when the
 * opening is drowned by it (no flow uphill). Its start and end are observed by the vessel.
 */
export function makeVesselOverflow(
  vessel: VesselComponent,
  overflow: Overflow,
  channel: number,
  destination: VesselComponent | undefined,
): ModelComponent {
  return {
    eventCount: 0,
    eventOffset: 0,
    computeFlows: (ctx: ModelContext) => {
      const tailM = destination ? (ctx.surfaceM[destination.index] as number) : -Infinity;
      const headM = (ctx.surfaceM[vessel.index] as number) - Math.max(overflow.elevation, tailM);
      ctx.flowM3PerS[channel] = overflowFlowM3PerS(overflow, headM);
    },
    eventValues: () => {},
    switchModes: () => false,
  };
}
