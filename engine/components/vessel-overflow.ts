import type { Overflow } from '../../shared/scenario';
import { STANDARD_GRAVITY_M_PER_S2 as G } from '../hydraulics/standard-gravity';
import { torricelliOutflowM3PerS } from '../hydraulics/torricelli-outflow';
import {
  switchDue,
  type ModelComponent,
  type ModelContext,
  type SwitchInput,
} from '../system/model-context';
import type { VesselComponent } from './vessel';

/**
 * Flow through a vessel's overflow opening of diameter D whose invert is at elevation z_o, m³/s:
 *   weir     Q = C_w·D·H^1.5                 while the head is small,
 *   orifice  Q = C_d·(π·D²/4)·√(2·g·H)       once the opening is drowned,
 * H = z_surface − z_o; the smaller controls (the weir-to-orifice transition of drop inlets:
 * USDA-SCS Engineering Field Manual ch. 6; EPA SWMM 5 orifice/weir notes). `orificeControls`
 * picks the branch: the model keeps it as a mode switched at {@link overflowControlHeadM}, where
 * both are equal, so each branch stays smooth for the integrator; `undefined` takes the minimum.
 * Discharge is free; the model measures H from the receiving surface instead when that is above
 * the opening. 0 for H ≤ 0.
 */
export function overflowFlowM3PerS(
  overflow: Overflow,
  headM: number,
  orificeControls?: boolean,
): number {
  if (!(headM > 0)) return 0;
  const areaM2 = (Math.PI / 4) * overflow.diameter ** 2;
  if (orificeControls === true)
    return torricelliOutflowM3PerS(overflow.dischargeCoefficient, areaM2, headM);
  // weirFlowM3PerS's law C_w·L·H^1.5, written with √ because it runs in every right-hand side.
  const weir = overflow.weirCoefficient * overflow.diameter * headM * Math.sqrt(headM);
  if (orificeControls === false) return weir;
  return Math.min(weir, torricelliOutflowM3PerS(overflow.dischargeCoefficient, areaM2, headM));
}

/**
 * Head over the opening's invert (m) where the weir and orifice flows of
 * {@link overflowFlowM3PerS} are equal: C_w·D·H^1.5 = C_d·(π·D²/4)·√(2gH) gives
 * H = π·C_d·√(2g)·D / (4·C_w). Same sources.
 */
export function overflowControlHeadM(overflow: Overflow): number {
  return (
    (Math.PI * overflow.dischargeCoefficient * Math.sqrt(2 * G) * overflow.diameter) /
    (4 * overflow.weirCoefficient)
  );
}

/** The overflow of a vessel with its two modes (see {@link makeVesselOverflow}). */
export interface OverflowComponent extends ModelComponent {
  /** True while the head is past the weir-to-orifice transition. */
  orificeControls: boolean;
  /** True while the receiving surface is above the opening, so the head is measured from it. */
  drowned: boolean;
}

const CONTROL = 0;
const DROWNED = 1;

/**
 * The overflow of `vessel` on `channel`, to `destination` (a vessel) or, when undefined, to its
 * loss sink. The head is the surface above the opening, or above the receiving surface when the
 * opening is drowned by it (no flow uphill). Both kinks of that flow, the weir-to-orifice change
 * and the receiving surface passing the opening, are mode switches at located events, so the
 * right-hand side is smooth between events. Its start and end are observed by the vessel.
 */
export function makeVesselOverflow(
  vessel: VesselComponent,
  overflow: Overflow,
  channel: number,
  destination: VesselComponent | undefined,
): OverflowComponent {
  const controlHeadM = overflowControlHeadM(overflow);
  const tailAboveOpeningM = (ctx: ModelContext): number =>
    destination ? (ctx.surfaceM[destination.index] as number) - overflow.elevation : -Infinity;
  const headM = (c: OverflowComponent, ctx: ModelContext): number =>
    (ctx.surfaceM[vessel.index] as number) -
    overflow.elevation -
    (c.drowned ? tailAboveOpeningM(ctx) : 0);
  const c: OverflowComponent = {
    orificeControls: false,
    drowned: false,
    eventCount: 2,
    eventOffset: 0,
    computeFlows: (ctx) => {
      ctx.flowM3PerS[channel] = overflowFlowM3PerS(overflow, headM(c, ctx), c.orificeControls);
    },
    eventValues: (ctx, out) => {
      const pastControl = headM(c, ctx) - controlHeadM;
      out[c.eventOffset + CONTROL] = c.orificeControls ? pastControl : -pastControl;
      const tail = tailAboveOpeningM(ctx);
      out[c.eventOffset + DROWNED] = destination === undefined ? 1 : c.drowned ? tail : -tail;
    },
    switchModes: (input: SwitchInput) => {
      const { ctx, fired } = input;
      const o = c.eventOffset;
      const tail = tailAboveOpeningM(ctx);
      if (destination !== undefined && switchDue(fired, o + DROWNED, c.drowned ? tail : -tail)) {
        c.drowned = !c.drowned;
        return true;
      }
      const pastControl = headM(c, ctx) - controlHeadM;
      if (switchDue(fired, o + CONTROL, c.orificeControls ? pastControl : -pastControl)) {
        c.orificeControls = !c.orificeControls;
        return true;
      }
      return false;
    },
  };
  return c;
}
