import type { Leak } from '../../shared/scenario';
import { torricelliOutflowM3PerS } from '../hydraulics/torricelli-outflow';
import type { ModelComponent, ModelContext, SwitchInput } from '../system/model-context';
import { orificeDryEventValue } from './orifice-run-dry';
import type { VesselComponent } from './vessel';

/**
 * A leak: an orifice of diameter d at elevation z in a vessel, open from its start time; the water
 * leaving through it is lost. Q = C_d·(π·d²/4)·√(2·g·(z_surface − z)) while the surface is above
 * the hole, 0 below (Torricelli). Once the surface is within 10 µm of the hole the leak is run
 * dry (see ORIFICE_DRY_HEAD_M). A hole below the floor drains the vessel empty; the vessel's empty
 * mode then stops it.
 */
export interface LeakComponent extends ModelComponent {
  readonly leak: Leak;
  readonly label: string;
  open: boolean;
  /** The surface has fallen to the hole. */
  dry: boolean;
}

/** Creates leak `label` from `vessel` on `channel` (vessel → its loss sink). */
export function makeLeak(
  leak: Leak,
  label: string,
  vessel: VesselComponent,
  channel: number,
): LeakComponent {
  const areaM2 = (Math.PI / 4) * leak.diameter ** 2;
  const head = (ctx: ModelContext): number =>
    (ctx.surfaceM[vessel.index] as number) - leak.elevation;
  const c: LeakComponent = {
    leak,
    label,
    open: false,
    dry: false,
    eventCount: 1,
    eventOffset: 0,
    computeFlows: (ctx: ModelContext) => {
      ctx.flowM3PerS[channel] =
        c.open && !c.dry
          ? torricelliOutflowM3PerS(leak.dischargeCoefficient, areaM2, head(ctx))
          : 0;
    },
    eventValues: (ctx, out) => {
      out[c.eventOffset] = c.open ? orificeDryEventValue(c.dry, head(ctx)) : 1;
    },
    switchModes: (input: SwitchInput) => {
      if (!c.open) return false;
      const g = orificeDryEventValue(c.dry, head(input.ctx));
      if (!(g < 0 || (g <= 0 && input.fired[c.eventOffset] === 1))) return false;
      c.dry = !c.dry;
      return true;
    },
  };
  return c;
}
