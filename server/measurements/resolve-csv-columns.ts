/** Finds the columns named in the import options in a CSV's header. */
import type { CsvImportOptions } from '../../shared/contracts/measurements';

/** Indices of the columns the import reads. */
export interface ResolvedColumns {
  time: number;
  level: number;
  barometric?: number;
  bed?: number;
}

/** The indices, or `UNKNOWN_COLUMN` / `BAROMETER_REQUIRED` with a message listing what the file has. */
export type ColumnResolution =
  { ok: true; columns: ResolvedColumns } | { ok: false; code: string; message: string };

function normalise(name: string): string {
  return name.trim().toLowerCase();
}

/** Column names match without case and surrounding spaces; for headerless files they are "1", "2", ... */
export function resolveCsvColumns(
  header: readonly string[],
  options: CsvImportOptions,
): ColumnResolution {
  const names = header.map(normalise);
  const missing: string[] = [];
  const find = (name: string | undefined): number | undefined => {
    if (name === undefined) return undefined;
    const index = names.indexOf(normalise(name));
    if (index < 0) missing.push(name);
    return index < 0 ? undefined : index;
  };
  const time = find(options.time.column);
  const level = find(options.level.column);
  const barometric =
    options.level.kind === 'pressure' ? find(options.level.barometricColumn) : undefined;
  const bed = find(options.bedColumn);
  if (missing.length > 0 || time === undefined || level === undefined) {
    const list = header.map((h) => `"${h}"`).join(', ');
    return {
      ok: false,
      code: 'UNKNOWN_COLUMN',
      message: `The file has no column ${missing.map((m) => `"${m}"`).join(', ')}; its columns are ${list}. Check the header line and the delimiter.`,
    };
  }
  if (
    options.level.kind === 'pressure' &&
    options.level.reference === 'absolute' &&
    barometric === undefined &&
    options.level.barometricPressure === undefined
  ) {
    return {
      ok: false,
      code: 'BAROMETER_REQUIRED',
      message:
        'An absolute pressure sensor also reads the air above the water: choose a barometric column or enter a constant air pressure.',
    };
  }
  return {
    ok: true,
    columns: {
      time,
      level,
      ...(barometric !== undefined ? { barometric } : {}),
      ...(bed !== undefined ? { bed } : {}),
    },
  };
}
