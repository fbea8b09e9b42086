/** Puts a system's applied calibration onto its scenario before a run. */
import {
  SystemCalibrationSchema,
  type SystemCalibration,
} from '../../shared/contracts/measurements';
import type { Scenario } from '../../shared/scenario/index';
import { withCoefficients, type CoefficientValue } from './with-coefficients';

/** The coefficients an applied calibration sets. */
export function calibrationValues(calibration: SystemCalibration): CoefficientValue[] {
  const values: CoefficientValue[] = [];
  for (const bed of calibration.beds) {
    if (bed.primingCoefficient !== undefined)
      values.push({ key: 'primingCoefficient', target: bed.bed, value: bed.primingCoefficient });
    if (bed.dischargeLossMultiplier !== undefined)
      values.push({
        key: 'dischargeLossMultiplier',
        target: bed.bed,
        value: bed.dischargeLossMultiplier,
      });
  }
  for (const pump of calibration.pumps)
    values.push({ key: 'flowScale', target: pump.pump, value: pump.flowScale });
  return values;
}

/**
 * The normalised scenario a run of the system should simulate: `scenario` with the calibrated
 * k_p, drain-loss multipliers and pump flow scales of `calibration` (the stored
 * `systems.calibration`, any value). When `calibration` is null or not a calibration, the
 * scenario comes back unchanged (the same object).
 */
export function applyCalibration(scenario: Scenario, calibration: unknown): Scenario {
  if (calibration === null || calibration === undefined) return scenario;
  const parsed = SystemCalibrationSchema.safeParse(calibration);
  if (!parsed.success) return scenario;
  return withCoefficients(scenario, calibrationValues(parsed.data));
}
