/** Which coefficients a calibration fits, from the measured beds and the user's choice. */
import type { Scenario } from '../../../shared/scenario/index';
import { PARAMETER_BOUNDS, type ParameterSpec } from './calibration-problem';

/** The user's choice of coefficients. */
export interface FitChoice {
  primingCoefficient: boolean;
  dischargeLossMultiplier: boolean;
  flowScale: boolean;
}

/**
 * Per measured bed: k_p (bell-siphon drains only) and the drain-loss multiplier; per pump with an
 * outlet into a measured bed: the flow scale. Each starts from the scenario's current value
 * (which already carries the applied calibration).
 */
export function calibrationParameters(
  scenario: Scenario,
  beds: readonly string[],
  choice: FitChoice,
): ParameterSpec[] {
  const specs: ParameterSpec[] = [];
  for (const id of beds) {
    const bed = scenario.vessels.find((v) => v.id === id);
    if (bed?.kind !== 'bed') continue;
    if (choice.primingCoefficient && bed.drain.type === 'bell-siphon') {
      specs.push({
        key: 'primingCoefficient',
        target: id,
        initial: bed.drain.primingCoefficient,
        ...PARAMETER_BOUNDS.primingCoefficient,
      });
    }
    if (choice.dischargeLossMultiplier) {
      specs.push({
        key: 'dischargeLossMultiplier',
        target: id,
        initial: bed.drain.dischargeLossMultiplier,
        ...PARAMETER_BOUNDS.dischargeLossMultiplier,
      });
    }
  }
  if (choice.flowScale) {
    for (const pump of scenario.pumps) {
      if (pump.outlets.some((o) => beds.includes(o.to))) {
        specs.push({
          key: 'flowScale',
          target: pump.id,
          initial: pump.flowScale,
          ...PARAMETER_BOUNDS.flowScale,
        });
      }
    }
  }
  return specs;
}
