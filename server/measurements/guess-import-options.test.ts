import { describe, expect, it } from 'vitest';
import { guessImportOptions } from './guess-import-options';

describe('guessImportOptions', () => {
  it('picks a named time column, a millimetre level column and the only bed', () => {
    const guess = guessImportOptions({
      columns: ['timestamp', 'level_mm'],
      rows: [['2024-05-31T10:00:00Z', '120']],
      decimal: '.',
      onlyBed: 'bed-a',
    });
    expect(guess).toEqual({
      decimal: '.',
      time: { column: 'timestamp', format: 'auto', timeZone: 'UTC' },
      level: { kind: 'level', column: 'level_mm', unit: 'mm' },
      bed: 'bed-a',
    });
  });

  it('recognises an ultrasonic distance, a bed column and metres from the values', () => {
    const guess = guessImportOptions({
      columns: ['t', 'bed', 'distance'],
      rows: [['0', 'bed-a', '0.21']],
      decimal: '.',
    });
    expect(guess.level).toEqual({
      kind: 'distance',
      column: 'distance',
      unit: 'm',
      mountingHeight: '0.5 m',
    });
    expect(guess.bedColumn).toBe('bed');
  });

  it('pairs an absolute pressure column with a barometric one, unit from the header', () => {
    const guess = guessImportOptions({
      columns: ['Zeit', 'Druck (hPa)', 'Baro (hPa)'],
      rows: [['31.05.2024 10:00', '1033,2', '1013,1']],
      decimal: ',',
    });
    expect(guess.time.column).toBe('Zeit');
    expect(guess.level).toEqual({
      kind: 'pressure',
      column: 'Druck (hPa)',
      unit: 'hPa',
      reference: 'absolute',
      barometricColumn: 'Baro (hPa)',
    });
  });

  it('falls back to the first numeric column after the time', () => {
    const guess = guessImportOptions({
      columns: ['when', 'a', 'b'],
      rows: [['x', 'n/a', '4.5']],
      decimal: '.',
    });
    expect(guess.level).toMatchObject({ kind: 'level', column: 'b', unit: 'mm' });
  });
});
