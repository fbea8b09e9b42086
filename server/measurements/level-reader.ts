/** Turns the level cells of one CSV row into metres above the vessel floor, per the level source. */
import type { CsvImportOptions } from '../../shared/contracts/measurements';
import { hydrostaticLevelM } from './hydrostatic-level';
import { lengthToMetres } from './length-to-metres';
import { levelFromDistanceM } from './level-from-distance';
import { pressureToPascals } from './pressure-to-pascals';

/** A row's level in m, or why it cannot be read. */
export type LevelReading = { ok: true; levelM: number } | { ok: false; reason: string };

/** Reads the level of one row from its fields. */
export type LevelReader = (fields: readonly string[]) => LevelReading;

/** Column indices the reader needs, resolved from the header. */
export interface LevelColumns {
  level: number;
  barometric?: number;
}

const NUMBER = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:e[+-]?\d+)?$/i;

/** A numeric cell (decimal `.` or `,`), or null when it is not a plain number. */
export function readNumberCell(raw: string | undefined, decimal: '.' | ','): number | null {
  if (raw === undefined) return null;
  const text = decimal === ',' ? raw.trim().replace(',', '.') : raw.trim();
  return NUMBER.test(text) ? Number(text) : null;
}

function cell(
  fields: readonly string[],
  index: number,
  decimal: '.' | ',',
  what: string,
): { value: number } | { reason: string } {
  const raw = fields[index];
  if (raw === undefined || raw.trim() === '') return { reason: `${what} is empty` };
  const value = readNumberCell(raw, decimal);
  return value === null ? { reason: `${what} "${raw.trim()}" is not a number` } : { value };
}

/**
 * Builds the reader for a level source: a level column (plus the sensor's zero offset), a
 * distance read from above (level = mounting height − distance), or a pressure at the bottom
 * (level = p_gauge/(ρ·g) + sensor height, with p_gauge = p − p_air for an absolute sensor).
 * `densityKgPerM3` is the water density at the given temperature.
 */
export function makeLevelReader(
  source: CsvImportOptions['level'],
  columns: LevelColumns,
  decimal: '.' | ',',
  densityKgPerM3: (temperatureC: number) => number,
): LevelReader {
  if (source.kind === 'level') {
    const zero = source.zeroOffset ?? 0;
    return (fields) => {
      const c = cell(fields, columns.level, decimal, 'level');
      return 'reason' in c
        ? { ok: false, reason: c.reason }
        : { ok: true, levelM: lengthToMetres(c.value, source.unit) + zero };
    };
  }
  if (source.kind === 'distance') {
    return (fields) => {
      const c = cell(fields, columns.level, decimal, 'distance');
      if ('reason' in c) return { ok: false, reason: c.reason };
      return {
        ok: true,
        levelM: levelFromDistanceM(source.mountingHeight, lengthToMetres(c.value, source.unit)),
      };
    };
  }
  const density = densityKgPerM3(source.waterTemperatureC ?? 20);
  const sensorHeight = source.sensorHeight ?? 0;
  const barometricUnit = source.barometricUnit ?? source.unit;
  return (fields) => {
    const c = cell(fields, columns.level, decimal, 'pressure');
    if ('reason' in c) return { ok: false, reason: c.reason };
    let gaugePa = pressureToPascals(c.value, source.unit);
    if (source.reference === 'absolute') {
      if (columns.barometric !== undefined) {
        const b = cell(fields, columns.barometric, decimal, 'air pressure');
        if ('reason' in b) return { ok: false, reason: b.reason };
        gaugePa -= pressureToPascals(b.value, barometricUnit);
      } else {
        gaugePa -= pressureToPascals(source.barometricPressure ?? Number.NaN, source.unit);
      }
    }
    return { ok: true, levelM: hydrostaticLevelM(gaugePa, density, sensorHeight) };
  };
}
