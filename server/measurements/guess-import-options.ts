/** First guesses for the import options of a CSV, from its header and first rows (for the preview). */
import type {
  CsvImportOptionsInput,
  LengthUnit,
  PressureUnit,
} from '../../shared/contracts/measurements';
import { readNumberCell } from './level-reader';

/** What the guess looks at. */
export interface GuessInput {
  columns: readonly string[];
  rows: readonly (readonly string[])[];
  decimal: '.' | ',';
  /** The system's only bed, when it has exactly one. */
  onlyBed?: string;
}

const TIME_WORDS = /time|date|stamp|zeit|datum|hora|heure|elapsed|^t$|^t_s$|^s$/i;
const DISTANCE_WORDS = /dist|range|ultra|sonar|echo|abstand/i;
const PRESSURE_WORDS = /press|kpa|hpa|mbar|psi|druck/i;
const LEVEL_WORDS = /level|depth|height|stage|water|pegel|niveau|nivel|h_/i;
const BED_WORDS = /^(bed|vessel|tank|bed_id|vessel_id|where)$/i;
const BARO_WORDS = /baro|atm|air/i;

function findColumn(
  columns: readonly string[],
  pattern: RegExp,
  exclude: readonly number[] = [],
): number {
  return columns.findIndex((c, i) => !exclude.includes(i) && pattern.test(c));
}

function unitFromHeader<U extends string>(header: string, units: readonly U[]): U | undefined {
  const tokens = header.toLowerCase().split(/[^a-z0-9]+/);
  return units.find((u) => tokens.includes(u.toLowerCase()));
}

/** mm when the typical value is above 3 (no bed holds 3 m of water), else m. */
function lengthUnitFromValues(values: readonly (number | null)[]): LengthUnit {
  const numbers = values.filter((v): v is number => v !== null).sort((a, b) => a - b);
  const median = numbers[Math.floor(numbers.length / 2)] ?? 0;
  return Math.abs(median) > 3 ? 'mm' : 'm';
}

function levelSource(input: GuessInput, exclude: number[]): CsvImportOptionsInput['level'] {
  const { columns, rows, decimal } = input;
  const numericColumn = columns.findIndex(
    (_, i) => !exclude.includes(i) && rows.some((r) => readNumberCell(r[i], decimal) !== null),
  );
  const pressure = findColumn(columns, PRESSURE_WORDS, exclude);
  if (pressure >= 0) {
    const header = columns[pressure] ?? '';
    const unit =
      unitFromHeader<PressureUnit>(header, [
        'kPa',
        'hPa',
        'mbar',
        'bar',
        'psi',
        'Pa',
        'cmH2O',
        'inH2O',
      ]) ?? 'kPa';
    const baro = findColumn(columns, BARO_WORDS, [...exclude, pressure]);
    return baro >= 0
      ? {
          kind: 'pressure',
          column: header,
          unit,
          reference: 'absolute',
          barometricColumn: columns[baro] ?? '',
        }
      : { kind: 'pressure', column: header, unit, reference: 'gauge' };
  }
  const distance = findColumn(columns, DISTANCE_WORDS, exclude);
  const level =
    distance >= 0
      ? distance
      : Math.max(findColumn(columns, LEVEL_WORDS, exclude), numericColumn, 0);
  const header = columns[level] ?? '';
  const unit =
    unitFromHeader<LengthUnit>(header, ['mm', 'cm', 'm', 'in', 'ft']) ??
    lengthUnitFromValues(rows.map((r) => readNumberCell(r[level], decimal)));
  return distance >= 0
    ? { kind: 'distance', column: header, unit, mountingHeight: '0.5 m' }
    : { kind: 'level', column: header, unit };
}

/**
 * Guesses: the time column by its name (else the first), the level source by the words in the
 * headers (pressure, distance, level; else the first other numeric column), the unit from the
 * header ("level_mm", "Pegel (cm)") or the size of the values, and a bed column named bed/vessel.
 * A distance guess gets a placeholder mounting height the user must check.
 */
export function guessImportOptions(input: GuessInput): CsvImportOptionsInput {
  const { columns } = input;
  const time = Math.max(findColumn(columns, TIME_WORDS), 0);
  const bed = findColumn(columns, BED_WORDS, [time]);
  const exclude = bed >= 0 ? [time, bed] : [time];
  return {
    decimal: input.decimal,
    time: { column: columns[time] ?? '1', format: 'auto', timeZone: 'UTC' },
    level: levelSource(input, exclude),
    ...(bed >= 0 ? { bedColumn: columns[bed] ?? '' } : input.onlyBed ? { bed: input.onlyBed } : {}),
  };
}
