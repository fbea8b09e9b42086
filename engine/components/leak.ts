import type { Leak } from '../../shared/scenario';
import { torricelliOutflowM3PerS } from '../hydraulics/torricelli-outflow';
import type { ModelComponent, ModelContext } from '../system/model-context';
import type { VesselComponent } from './vessel';

/**
 * A leak: an orifice of diameter d at elevation z in a vessel, open from its start time; the water
 * leaving through it is lost. Q = C_d·(π·d²/4)·√(2·g·(z_surface − z)) while the surface is above
 * the hole, 0 below (Torricelli). A hole below the floor drains the vessel empty; the vessel's
 * empty mode then stops it.
 */
export interface LeakComponent extends ModelComponent {
  readonly leak: Leak;
  readonly label: string;
  open: boolean;
}

/** Creates leak `label` from `vessel` on `channel` (vessel → its loss sink). */
export function makeLeak(leak: Leak, label: string, vessel: VesselComponent, channel: number): LeakComponent {
  const areaM2 = (Math.PI / 4) * leak.diameter ** 2;
  const c: LeakComponent = {
    leak,
    label,
    open: false,
    eventCount: 0,
    eventOffset: 0,
    computeFlows: (ctx: ModelContext) => {
      const headM = (ctx.surfaceM[vessel.index] as number) - leak.elevation;
      ctx.flowM3PerS[channel] = c.open ? torricelliOutflowM3PerS(leak.dischargeCoefficient, areaM2, headM) : 0;
    },
    eventValues: () => {},
    switchModes: () => false,
  };
  return c;
}
