import type { FloatSwitchControl } from '../../shared/scenario';
import { formatSignificant as fmt } from '../results/format-significant';
import type { ModelComponent, SwitchInput } from '../system/model-context';
import type { VesselComponent } from './vessel';

/** What a float switch acts on: a count of switches currently holding its pump off. */
export interface FloatSwitchTarget {
  readonly id: string;
  floatStops: number;
}

/**
 * A float switch with two levels in a vessel: it holds a pump off once the level falls below
 * `stopBelow` and releases it once the level rises above `restartAbove`. The gap between the two
 * levels is the hysteresis that keeps the pump from chattering.
 */
export interface FloatSwitchComponent extends ModelComponent {
  readonly control: FloatSwitchControl;
  holding: boolean;
}

/** Creates the float switch `control` watching `vessel` and acting on `pump`. */
export function makeFloatSwitch(
  control: FloatSwitchControl,
  vessel: VesselComponent,
  pump: FloatSwitchTarget,
): FloatSwitchComponent {
  const c: FloatSwitchComponent = {
    control,
    holding: vessel.vessel.initialLevel < control.stopBelow,
    eventCount: 1,
    eventOffset: 0,
    computeFlows: () => {},
    eventValues: (ctx, out) => {
      const level = ctx.levelM[vessel.index] as number;
      out[c.eventOffset] = c.holding ? control.restartAbove - level : level - control.stopBelow;
    },
    switchModes: (input: SwitchInput) => {
      const level = input.ctx.levelM[vessel.index] as number;
      const g = c.holding ? control.restartAbove - level : level - control.stopBelow;
      if (!(g < 0 || (g <= 0 && input.fired[c.eventOffset] === 1))) return false;
      c.holding = !c.holding;
      pump.floatStops += c.holding ? 1 : -1;
      const what = c.holding
        ? `fell below ${fmt(control.stopBelow)} m`
        : `rose above ${fmt(control.restartAbove)} m`;
      input.log({
        t_s: input.ctx.timeS,
        kind: 'float-switch',
        where: pump.id,
        detail: `The float switch in ${vessel.vessel.id}: the level ${what}.`,
        values: { levelM: level },
      });
      return true;
    },
  };
  if (c.holding) pump.floatStops += 1;
  return c;
}
