/** The CSV import form's flat values, and the import options they stand for. */
import type {
  CsvImportOptionsInput,
  LengthUnit,
  PressureUnit,
  TimeFormat,
} from '../../../../shared/contracts/measurements';

/** Every field of the import form (lengths in m, as the quantity inputs hold them). */
export interface CsvOptionsForm {
  name: string;
  delimiter: 'auto' | ',' | ';' | '\t' | '|';
  decimal: '.' | ',';
  headerLine: number | null;
  hasHeader: boolean;
  timeColumn: string;
  timeFormat: TimeFormat;
  timeZone: string;
  levelKind: 'level' | 'distance' | 'pressure';
  levelColumn: string;
  lengthUnit: LengthUnit;
  zeroOffsetM: number | null;
  mountingHeightM: number | null;
  pressureUnit: PressureUnit;
  reference: 'gauge' | 'absolute';
  barometricColumn: string;
  barometricUnit: PressureUnit;
  barometricPressure: number | null;
  sensorHeightM: number | null;
  waterTemperatureC: number | null;
  bedMode: 'fixed' | 'column';
  bed: string;
  bedColumn: string;
}

/** A blank form: ISO-or-guessed times in UTC, a level column in mm, one bed. */
export function blankCsvOptionsForm(): CsvOptionsForm {
  return {
    name: '',
    delimiter: 'auto',
    decimal: '.',
    headerLine: null,
    hasHeader: true,
    timeColumn: '',
    timeFormat: 'auto',
    timeZone: 'UTC',
    levelKind: 'level',
    levelColumn: '',
    lengthUnit: 'mm',
    zeroOffsetM: null,
    mountingHeightM: null,
    pressureUnit: 'kPa',
    reference: 'gauge',
    barometricColumn: '',
    barometricUnit: 'hPa',
    barometricPressure: null,
    sensorHeightM: null,
    waterTemperatureC: null,
    bedMode: 'fixed',
    bed: '',
    bedColumn: '',
  };
}

function level(form: CsvOptionsForm): CsvImportOptionsInput['level'] {
  if (form.levelKind === 'distance') {
    return {
      kind: 'distance',
      column: form.levelColumn,
      unit: form.lengthUnit,
      mountingHeight: form.mountingHeightM ?? 0,
    };
  }
  if (form.levelKind === 'pressure') {
    return {
      kind: 'pressure',
      column: form.levelColumn,
      unit: form.pressureUnit,
      reference: form.reference,
      ...(form.reference === 'absolute' && form.barometricColumn
        ? { barometricColumn: form.barometricColumn, barometricUnit: form.barometricUnit }
        : {}),
      ...(form.reference === 'absolute' &&
      !form.barometricColumn &&
      form.barometricPressure !== null
        ? { barometricPressure: form.barometricPressure }
        : {}),
      ...(form.sensorHeightM !== null ? { sensorHeight: form.sensorHeightM } : {}),
      ...(form.waterTemperatureC !== null ? { waterTemperatureC: form.waterTemperatureC } : {}),
    };
  }
  return {
    kind: 'level',
    column: form.levelColumn,
    unit: form.lengthUnit,
    ...(form.zeroOffsetM !== null ? { zeroOffset: form.zeroOffsetM } : {}),
  };
}

/** The options the form describes, as the API takes them. */
export function csvOptionsFromForm(form: CsvOptionsForm): CsvImportOptionsInput {
  return {
    ...(form.name.trim() ? { name: form.name.trim() } : {}),
    delimiter: form.delimiter,
    decimal: form.decimal,
    ...(form.headerLine !== null ? { headerLine: form.headerLine } : {}),
    hasHeader: form.hasHeader,
    time: {
      column: form.timeColumn,
      format: form.timeFormat,
      timeZone: form.timeZone.trim() || 'UTC',
    },
    level: level(form),
    ...(form.bedMode === 'column' ? { bedColumn: form.bedColumn } : { bed: form.bed }),
  };
}

function text(value: unknown, fallback: string): string {
  return typeof value === 'string' ? value : fallback;
}

function num(value: unknown): number | null {
  return typeof value === 'number' && Number.isFinite(value) ? value : null;
}

/** The form for options the server used or guessed (numbers in SI, as it answers them). */
export function csvOptionsFormFrom(
  options: Record<string, unknown>,
  base: CsvOptionsForm = blankCsvOptionsForm(),
): CsvOptionsForm {
  const time = (options['time'] ?? {}) as Record<string, unknown>;
  const lv = (options['level'] ?? {}) as Record<string, unknown>;
  const kind = lv['kind'] === 'distance' || lv['kind'] === 'pressure' ? lv['kind'] : 'level';
  return {
    ...base,
    delimiter: text(options['delimiter'], base.delimiter) as CsvOptionsForm['delimiter'],
    decimal: options['decimal'] === ',' ? ',' : '.',
    headerLine: num(options['headerLine']),
    hasHeader: options['hasHeader'] !== false,
    timeColumn: text(time['column'], base.timeColumn),
    timeFormat: text(time['format'], base.timeFormat) as TimeFormat,
    timeZone: text(time['timeZone'], base.timeZone),
    levelKind: kind,
    levelColumn: text(lv['column'], base.levelColumn),
    lengthUnit:
      kind === 'pressure' ? base.lengthUnit : (text(lv['unit'], base.lengthUnit) as LengthUnit),
    pressureUnit:
      kind === 'pressure'
        ? (text(lv['unit'], base.pressureUnit) as PressureUnit)
        : base.pressureUnit,
    zeroOffsetM: num(lv['zeroOffset']),
    mountingHeightM: num(lv['mountingHeight']) ?? base.mountingHeightM,
    reference: lv['reference'] === 'absolute' ? 'absolute' : 'gauge',
    barometricColumn: text(lv['barometricColumn'], ''),
    barometricUnit: text(lv['barometricUnit'], base.barometricUnit) as PressureUnit,
    barometricPressure: num(lv['barometricPressure']),
    sensorHeightM: num(lv['sensorHeight']),
    waterTemperatureC: num(lv['waterTemperatureC']),
    bedMode: typeof options['bedColumn'] === 'string' ? 'column' : 'fixed',
    bed: text(options['bed'], base.bed),
    bedColumn: text(options['bedColumn'], ''),
  };
}
