/** Words and numbers of the measurements pages, in the reader's units. */
import type {
  CalibrationFit,
  CalibrationParameterKey,
  ComparisonRow,
  SystemCalibration,
} from '../../../../shared/contracts/measurements';
import { formatQuantity, type UnitSystem } from '../../../../shared/scenario';

/** Names of the calibrated coefficients, as a builder would say them. */
export const COEFFICIENT_NAMES: Readonly<Record<CalibrationParameterKey, string>> = {
  primingCoefficient: 'Priming coefficient k_p',
  dischargeLossMultiplier: 'Drain-loss multiplier',
  flowScale: 'Pump flow scale',
};

/** Names of the compared cycle figures. */
export const FIGURE_NAMES: Readonly<Record<ComparisonRow['metric'], string>> = {
  period: 'Period',
  flood: 'Flood time (fill)',
  drain: 'Drain time',
  high: 'High mark',
  low: 'Low mark',
};

/** A figure in the reader's units: times in s/min, levels in mm or in; "–" when missing. */
export function figureText(value: number | null, unit: 's' | 'm', system: UnitSystem): string {
  if (value === null || !Number.isFinite(value)) return '–';
  return formatQuantity(value, unit === 's' ? 'time' : 'diameter', system);
}

/** A signed difference with its relative size, e.g. "+12.0 s (+4.1 %)". */
export function differenceText(row: ComparisonRow, system: UnitSystem): string {
  if (row.difference === null) return '–';
  const sign = row.difference > 0 ? '+' : row.difference < 0 ? '−' : '±';
  const magnitude = figureText(Math.abs(row.difference), row.unit, system);
  const relative =
    row.relative === null ? '' : ` (${sign}${Math.abs(row.relative * 100).toFixed(1)} %)`;
  return `${sign}${magnitude}${relative}`;
}

/** A coefficient with its standard error, e.g. "0.552 ± 0.008". */
export function coefficientText(value: number, standardError: number | null): string {
  const digits =
    standardError && standardError > 0
      ? Math.max(0, Math.min(6, -Math.floor(Math.log10(standardError))))
      : 3;
  const main = value.toFixed(digits);
  return standardError === null ? main : `${main} ± ${standardError.toFixed(digits)}`;
}

/** What the fit status means, in one sentence with χ² before and after. */
export function fitSentence(fit: CalibrationFit): string {
  const chi = (v: number | null): string =>
    v === null ? '–' : v < 0.01 ? v.toExponential(1) : v.toPrecision(3);
  const effort = `${fit.iterations} iterations, ${fit.evaluations} simulations, ${(fit.wallMs / 1000).toFixed(1)} s`;
  return `${fit.message} χ² ${chi(fit.chiSquareBefore)} → ${chi(fit.chiSquareAfter)} (${effort}).`;
}

/** One line per calibrated bed or pump, e.g. "bed-a: k_p 0.552, drain-loss multiplier 1.61". */
export function calibrationLines(calibration: SystemCalibration): string[] {
  const beds = calibration.beds.map((b) => {
    const parts = [
      b.primingCoefficient === undefined ? null : `k_p ${b.primingCoefficient.toFixed(3)}`,
      b.dischargeLossMultiplier === undefined
        ? null
        : `drain-loss multiplier ${b.dischargeLossMultiplier.toFixed(3)}`,
    ].filter((p): p is string => p !== null);
    return `${b.bed}: ${parts.join(', ')}`;
  });
  return [
    ...beds,
    ...calibration.pumps.map((p) => `${p.pump}: flow scale ${p.flowScale.toFixed(3)}`),
  ];
}
