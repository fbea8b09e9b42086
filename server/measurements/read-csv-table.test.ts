import { describe, expect, it } from 'vitest';
import { readCsvTable, type CsvTableOptions } from './read-csv-table';

const defaults: CsvTableOptions = { delimiter: 'auto', decimal: '.', hasHeader: true };

describe('readCsvTable', () => {
  it('skips preamble lines above the header and keeps file line numbers', () => {
    const text =
      'Logger A7\nSerial: 0042\nstarted 2024-05-31\ntime,level_mm\n2024-05-31T10:00:00Z,12\n2024-05-31T10:00:05Z,13\n';
    const table = readCsvTable(text, defaults);
    expect(table).toMatchObject({
      ok: true,
      columns: ['time', 'level_mm'],
      headerLine: 4,
      delimiter: ',',
    });
    if (!table.ok) return;
    expect(table.records).toEqual([
      { line: 5, fields: ['2024-05-31T10:00:00Z', '12'] },
      { line: 6, fields: ['2024-05-31T10:00:05Z', '13'] },
    ]);
  });

  it('detects semicolons with a decimal comma, and tabs', () => {
    const semi = readCsvTable('Zeit;Pegel\n31.05.2024 10:00;12,5\n31.05.2024 10:01;12,7\n', {
      ...defaults,
      decimal: ',',
    });
    expect(semi).toMatchObject({ ok: true, delimiter: ';', columns: ['Zeit', 'Pegel'] });
    const tabs = readCsvTable('t\tlevel\tbed\n0\t0.1\ta\n5\t0.2\ta\n', defaults);
    expect(tabs).toMatchObject({ ok: true, delimiter: '\t', columns: ['t', 'level', 'bed'] });
  });

  it('skips comment lines and blank lines, and reads quoted fields', () => {
    const table = readCsvTable(
      '# exported\ntime,note,level\n\n0,"filling, slow",0.1\n# pump restarted\n5,"",0.2\n',
      defaults,
    );
    expect(table.ok && table.records.map((r) => r.fields)).toEqual([
      ['0', 'filling, slow', '0.1'],
      ['5', '', '0.2'],
    ]);
  });

  it('honours an explicit header line and names columns by number in a headerless file', () => {
    const explicit = readCsvTable('a,b\nc,d\ntime,level\n0,1\n', { ...defaults, headerLine: 3 });
    expect(explicit).toMatchObject({ ok: true, columns: ['time', 'level'], headerLine: 3 });
    const headerless = readCsvTable('Logger A7\n0,0.10\n5,0.11\n', {
      ...defaults,
      hasHeader: false,
    });
    expect(headerless).toMatchObject({ ok: true, columns: ['1', '2'], headerLine: null });
    expect(headerless.ok && headerless.records).toHaveLength(2);
  });

  it('reports a broken quote with the line', () => {
    const table = readCsvTable('time,level\n0,"0.1\n5,0.2\n', defaults);
    expect(table).toMatchObject({ ok: false, code: 'CSV_MALFORMED' });
  });

  it('refuses a file with nothing in it', () => {
    expect(readCsvTable('\n\n# only a comment\n', defaults)).toMatchObject({
      ok: false,
      code: 'EMPTY_FILE',
    });
  });
});

describe('readCsvTable line numbers', () => {
  it('keeps file line numbers when a quoted field spans lines', () => {
    const table = readCsvTable('time,note,level\n0,"two\nlines",0.1\n5,ok,0.2\n', {
      ...defaults,
      headerLine: 1,
    });
    expect(table.ok && table.records.map((r) => [r.line, r.fields[2]])).toEqual([
      [3, '0.1'],
      [4, '0.2'],
    ]);
  });
});
