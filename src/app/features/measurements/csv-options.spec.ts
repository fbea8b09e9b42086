import { CsvImportOptionsSchema } from '../../../../shared/contracts/measurements';
import { blankCsvOptionsForm, csvOptionsFormFrom, csvOptionsFromForm } from './csv-options';

describe('CSV import options form', () => {
  it('describes a distance sensor the schema accepts, with its mounting height in metres', () => {
    const form = {
      ...blankCsvOptionsForm(),
      timeColumn: 'time',
      levelKind: 'distance' as const,
      levelColumn: 'd',
      mountingHeightM: 0.4,
      bed: 'bed-a',
    };
    const options = csvOptionsFromForm(form);
    expect(options).toEqual({
      delimiter: 'auto',
      decimal: '.',
      hasHeader: true,
      time: { column: 'time', format: 'auto', timeZone: 'UTC' },
      level: { kind: 'distance', column: 'd', unit: 'mm', mountingHeight: 0.4 },
      bed: 'bed-a',
    });
    expect(CsvImportOptionsSchema.safeParse(options).success).toBe(true);
  });

  it('sends a barometric column only for an absolute sensor, and a bed column instead of a bed', () => {
    const form = {
      ...blankCsvOptionsForm(),
      timeColumn: 't',
      levelKind: 'pressure' as const,
      levelColumn: 'p',
      reference: 'absolute' as const,
      barometricColumn: 'air',
      bedMode: 'column' as const,
      bedColumn: 'where',
      bed: 'ignored',
    };
    const options = csvOptionsFromForm(form);
    expect(options.level).toEqual({
      kind: 'pressure',
      column: 'p',
      unit: 'kPa',
      reference: 'absolute',
      barometricColumn: 'air',
      barometricUnit: 'hPa',
    });
    expect(options).toMatchObject({ bedColumn: 'where' });
    expect('bed' in options).toBe(false);
  });

  it('fills the form from the options the server guessed, and gives the same options back', () => {
    const guessed = CsvImportOptionsSchema.parse({
      time: { column: 'timestamp', format: 'iso', timeZone: 'Europe/Lisbon' },
      level: { kind: 'level', column: 'level_mm', unit: 'mm', zeroOffset: '5 mm' },
      bed: 'bed-b',
    });
    const form = csvOptionsFormFrom(guessed as Record<string, unknown>);
    expect(form).toMatchObject({
      timeColumn: 'timestamp',
      timeFormat: 'iso',
      timeZone: 'Europe/Lisbon',
      levelColumn: 'level_mm',
      zeroOffsetM: 0.005,
      bed: 'bed-b',
      bedMode: 'fixed',
    });
    expect(CsvImportOptionsSchema.parse(csvOptionsFromForm(form))).toEqual(guessed);
  });
});
