import { describe, expect, it } from 'vitest';
import {
  CsvImportOptionsSchema,
  type CsvImportOptionsInput,
} from '../../shared/contracts/measurements';
import { parseLevelCsv, type LevelCsvContext } from './parse-level-csv';
import { readCsvTable } from './read-csv-table';

const context: LevelCsvContext = {
  vessels: [
    { id: 'bed-a', heightM: 0.32 },
    { id: 'bed-b', heightM: 0.3 },
    { id: 'tank', heightM: 0.7 },
  ],
  densityKgPerM3: () => 1000,
};

function parseText(text: string, input: CsvImportOptionsInput, ctx: LevelCsvContext = context) {
  const options = CsvImportOptionsSchema.parse(input);
  const table = readCsvTable(text, options);
  if (!table.ok) throw new Error(table.message);
  return parseLevelCsv(table.columns, table.records, options, ctx);
}

const levelOptions: CsvImportOptionsInput = {
  time: { column: 'time' },
  level: { kind: 'level', column: 'level_mm', unit: 'mm' },
  bed: 'bed-a',
};

describe('parseLevelCsv', () => {
  it('reads ISO times and millimetre levels into seconds from the start and metres', () => {
    const text =
      'time,level_mm\n2024-05-31T10:00:00Z,12\n2024-05-31T10:00:05Z,13.5\n2024-05-31T10:00:10Z,15\n';
    const parsed = parseText(text, levelOptions);
    expect(parsed).toMatchObject({
      ok: true,
      timeFormat: 'iso',
      acceptedCount: 3,
      rejectedCount: 0,
    });
    if (!parsed.ok) return;
    expect(parsed.series).toEqual({
      startTime: '2024-05-31T10:00:00.000Z',
      beds: [{ bed: 'bed-a', t_s: [0, 5, 10], level_m: [0.012, 0.0135, 0.015] }],
    });
    expect(parsed.rows[1]).toEqual({
      line: 3,
      time: '2024-05-31T10:00:05.000Z',
      t_s: 5,
      bed: 'bed-a',
      level_m: 0.0135,
    });
  });

  it('converts an ultrasonic distance with the mounting height and local day-first times in a zone', () => {
    const text = 'Datum;Abstand\n31.05.2024 12:00:00;400,0\n31.05.2024 12:00:02;380,0\n';
    const parsed = parseText(text, {
      decimal: ',',
      time: { column: 'Datum', format: 'dmy', timeZone: 'Europe/Lisbon' },
      level: { kind: 'distance', column: 'abstand', unit: 'mm', mountingHeight: '0.45 m' },
      bed: 'bed-a',
    });
    expect(parsed.ok && parsed.series).toEqual({
      startTime: '2024-05-31T11:00:00.000Z',
      beds: [{ bed: 'bed-a', t_s: [0, 2], level_m: [0.05, 0.07] }],
    });
  });

  it('subtracts a barometric column from an absolute pressure and divides by ρ·g', () => {
    const text = 'elapsed,p_kpa,baro_hpa\n0,102.3,1013.25\n10,103.3,1013.25\n';
    const parsed = parseText(text, {
      time: { column: 'elapsed' },
      level: {
        kind: 'pressure',
        column: 'p_kpa',
        unit: 'kPa',
        reference: 'absolute',
        barometricColumn: 'baro_hpa',
        barometricUnit: 'hPa',
      },
      bed: 'tank',
    });
    expect(parsed.ok).toBe(true);
    if (!parsed.ok) return;
    const [series] = parsed.series.beds;
    expect(parsed.series.startTime).toBeNull();
    // (102300 − 101325) Pa / (1000 kg/m³ · 9.80665 m/s²) = 0.099422 m
    expect(series?.level_m[0]).toBeCloseTo(975 / 9806.65, 6);
    expect(series?.level_m[1]).toBeCloseTo(1975 / 9806.65, 6);
  });

  it('splits rows by a bed column and rejects unknown vessels and unreadable cells with reasons', () => {
    const text = [
      'time,level_mm,bed',
      '0,10,bed-a',
      '0,20,bed-b',
      '5,abc,bed-a',
      '5,21,bed-z',
      '10,12,bed-a',
      '10,22,bed-b',
      'later,30,bed-a',
      '12,-80,bed-a',
    ].join('\n');
    const parsed = parseText(text, { ...levelOptions, bed: undefined, bedColumn: 'bed' });
    expect(parsed.ok).toBe(true);
    if (!parsed.ok) return;
    expect(parsed.series.beds.map((b) => [b.bed, b.t_s])).toEqual([
      ['bed-a', [0, 10]],
      ['bed-b', [0, 10]],
    ]);
    expect(parsed.rejected.map((r) => [r.line, r.reason])).toEqual([
      [4, 'level "abc" is not a number'],
      [5, '"bed-z" is not a vessel of this system'],
      [8, 'time "later" is not a number of seconds or h:mm:ss'],
      [9, expect.stringContaining('below the floor of bed-a')],
    ]);
    expect(parsed.rejectedCount).toBe(4);
  });

  it('rejects a repeated time as a row, but refuses a file whose time keeps going backwards', () => {
    const once = parseText('time,level_mm\n0,10\n5,11\n5,11\n10,12\n', levelOptions);
    expect(once.ok && once.rejected).toEqual([
      { line: 4, reason: 'time is the same as that of line 3 (bed-a)', raw: '5,11' },
    ]);
    const reversed = [
      'time,level_mm',
      ...Array.from({ length: 20 }, (_, i) => `${100 - i * 5},10`),
    ].join('\n');
    const refused = parseText(reversed, levelOptions);
    expect(refused).toMatchObject({
      ok: false,
      code: 'NON_MONOTONIC_TIME',
      message: expect.stringContaining('Sort the file by time'),
    });
  });

  it('refuses files whose times cannot be read, with the first reason', () => {
    const refused = parseText('time,level_mm\n31/02/2024 10:00,1\n30/02/2024 10:00,2\n', {
      ...levelOptions,
      time: { column: 'time', format: 'dmy' },
    });
    expect(refused).toMatchObject({
      ok: false,
      code: 'UNREADABLE_TIMES',
      message: expect.stringContaining('Line 2: time "31/02/2024 10:00" is not a calendar date'),
    });
  });

  it('names the missing column and lists the columns the file has', () => {
    const refused = parseText('t,level_mm\n0,1\n', levelOptions);
    expect(refused).toMatchObject({
      ok: false,
      code: 'UNKNOWN_COLUMN',
      message: expect.stringContaining('no column "time"; its columns are "t", "level_mm"'),
    });
  });

  it('asks for the bed when neither a bed nor a bed column is given and the system has several', () => {
    expect(parseText('time,level_mm\n0,1\n', { ...levelOptions, bed: undefined })).toMatchObject({
      ok: false,
      code: 'BED_REQUIRED',
    });
    expect(parseText('time,level_mm\n0,1\n', { ...levelOptions, bed: 'bed-q' })).toMatchObject({
      ok: false,
      code: 'UNKNOWN_BED',
    });
    const single = parseText(
      'time,level_mm\n0,1\n',
      { ...levelOptions, bed: undefined },
      { ...context, defaultVessel: 'bed-b' },
    );
    expect(single.ok && single.series.beds[0]?.bed).toBe('bed-b');
  });

  it('refuses an ambiguous date format and an unknown zone with what to choose', () => {
    expect(parseText('time,level_mm\n01/02/2024 10:00,1\n', levelOptions)).toMatchObject({
      ok: false,
      code: 'TIME_FORMAT_UNKNOWN',
    });
    const zone = parseText('time,level_mm\n2024-01-01 10:00,1\n', {
      ...levelOptions,
      time: { column: 'time', timeZone: 'Atlantis/Capital' },
    });
    expect(zone).toMatchObject({ ok: false, code: 'INVALID_TIME_ZONE' });
  });
});

describe('parseLevelCsv on a long log', () => {
  it('reads the largest allowed file without running out of stack', () => {
    const lines = ['time,level_mm'];
    for (let i = 0; i < 200_000; i++) lines.push(`${i},${100 + (i % 200)}`);
    const parsed = parseText(lines.join('\n'), levelOptions);
    expect(parsed.ok && parsed.acceptedCount).toBe(200_000);
    expect(parsed.ok && parsed.series.beds[0]?.t_s.at(-1)).toBe(199_999);
  });
});
