/** A scenario with some calibrated coefficients replaced. */
import type { CalibrationParameterKey } from '../../shared/contracts/measurements';
import type { Scenario } from '../../shared/scenario/index';

/** One coefficient: k_p or the drain-loss multiplier of bed `target`, or the flow scale of pump `target`. */
export interface CoefficientValue {
  key: CalibrationParameterKey;
  target: string;
  value: number;
}

/**
 * A copy of `scenario` (normalised) with each coefficient set: `primingCoefficient` on a
 * bell-siphon drain, `dischargeLossMultiplier` on any drain, `flowScale` on a pump. A value for a
 * bed or pump the scenario no longer has, or a k_p for a plain standpipe, is skipped.
 */
export function withCoefficients(
  scenario: Scenario,
  values: readonly CoefficientValue[],
): Scenario {
  const copy = structuredClone(scenario);
  for (const { key, target, value } of values) {
    if (key === 'flowScale') {
      const pump = copy.pumps.find((p) => p.id === target);
      if (pump) pump.flowScale = value;
      continue;
    }
    const bed = copy.vessels.find((v) => v.id === target);
    if (bed?.kind !== 'bed') continue;
    if (key === 'dischargeLossMultiplier') bed.drain.dischargeLossMultiplier = value;
    else if (bed.drain.type === 'bell-siphon') bed.drain.primingCoefficient = value;
  }
  return copy;
}
