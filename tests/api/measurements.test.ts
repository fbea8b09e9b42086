/**
 * The measurements API in-process: CSV uploads (multipart and pasted), the preview with guessed
 * options and reasons for rejected rows, stopwatch logs, reading back the series, the rejected
 * rows and the original bytes, deleting, and every kind of bad file refused with a code that says
 * what to fix while nothing stored is lost.
 */
import type { Express } from 'express';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { ApiErrorSchema } from '../../shared/contracts/api-error';
import {
  CsvPreviewSchema,
  MEASUREMENT_MAX_FILE_BYTES,
  MeasuredSeriesSchema,
  MeasurementListSchema,
  MeasurementSchema,
  RejectedListSchema,
  type CsvImportOptionsInput,
} from '../../shared/contracts/measurements';
import { SystemSchema, type System } from '../../shared/contracts/systems';
import { EXAMPLE_SCENARIO_FILE } from '../../shared/scenario/index';
import { createApp } from '../../server/app';
import { signedInClient, type TestClient } from '../../server/testing/test-client';
import { createTestContext, type TestContext } from '../../server/testing/test-context';

const OPTIONS: CsvImportOptionsInput = {
  time: { column: 'time', timeZone: 'Europe/Lisbon' },
  level: { kind: 'distance', column: 'distance_mm', unit: 'mm', mountingHeight: '400 mm' },
  bed: 'bed-a',
};
const GOOD_CSV = [
  'Sensor: bench unit 2',
  'Interval: 5 s',
  'time,distance_mm',
  '2024-05-31 10:00:00,375',
  '2024-05-31 10:00:05,370',
  '2024-05-31 10:00:10,not-read',
  '2024-05-31 10:00:15,360',
].join('\n');

describe('measurements API', () => {
  let t: TestContext;
  let app: Express;
  let owner: TestClient;
  let system: System;

  beforeEach(async () => {
    t = await createTestContext();
    app = createApp(t.ctx);
    owner = (await signedInClient(app, t.ctx, { name: 'Mara Meter' })).client;
    const res = await owner
      .post('/api/systems')
      .send({ name: 'Bench', scenario: EXAMPLE_SCENARIO_FILE });
    system = SystemSchema.parse(res.body);
  });
  afterEach(async () => {
    await t.close();
  });

  const upload = (bytes: Buffer | string, filename: string, options: unknown = OPTIONS) =>
    owner
      .post(`/api/systems/${system.id}/measurements`)
      .field('options', JSON.stringify(options))
      .attach('file', Buffer.isBuffer(bytes) ? bytes : Buffer.from(bytes), filename);

  const listCount = async (): Promise<number> =>
    MeasurementListSchema.parse((await owner.get(`/api/systems/${system.id}/measurements`)).body)
      .items.length;

  it('stores an uploaded CSV with its parsed series, rejected rows and original bytes', async () => {
    const res = await upload(GOOD_CSV, 'bench-log.csv');
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const measurement = MeasurementSchema.parse(res.body);
    expect(measurement).toMatchObject({
      kind: 'csv',
      name: 'bench-log',
      originalFilename: 'bench-log.csv',
      sizeBytes: Buffer.byteLength(GOOD_CSV),
      rejectedCount: 1,
      startTime: '2024-05-31T09:00:00.000Z', // Lisbon is UTC+1 in May
      createdByName: 'Mara Meter',
    });
    expect(measurement.beds).toEqual([
      { bed: 'bed-a', samples: 3, durationS: 15, minLevel_m: 0.025, maxLevel_m: 0.04 },
    ]);
    const series = MeasuredSeriesSchema.parse(
      (await owner.get(`/api/measurements/${measurement.id}/series`)).body,
    );
    expect(series.beds).toEqual([{ bed: 'bed-a', t_s: [0, 5, 15], level_m: [0.025, 0.03, 0.04] }]);
    const rejected = RejectedListSchema.parse(
      (await owner.get(`/api/measurements/${measurement.id}/rejected`)).body,
    );
    expect(rejected).toEqual({
      total: 1,
      items: [
        {
          line: 6,
          reason: 'distance "not-read" is not a number',
          raw: '2024-05-31 10:00:10,not-read',
        },
      ],
    });
    const original = await owner.get(`/api/measurements/${measurement.id}/original`).buffer(true);
    expect(original.headers['content-disposition']).toContain('bench-log.csv');
    expect(Buffer.from(original.body as Buffer).toString('utf8')).toBe(GOOD_CSV);
    expect(await listCount()).toBe(1);
  });

  it('previews a file without storing it, guessing options when none are sent', async () => {
    const csv = 'timestamp,level_mm\n2024-05-31T10:00:00Z,120\n2024-05-31T10:00:05Z,121\nbad,122\n';
    const res = await owner
      .post(`/api/systems/${system.id}/measurements/preview`)
      .attach('file', Buffer.from(csv), 'log.csv');
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const preview = CsvPreviewSchema.parse(res.body);
    expect(preview).toMatchObject({
      columns: ['timestamp', 'level_mm'],
      headerLine: 1,
      delimiter: ',',
      timeFormat: 'iso',
      acceptedCount: 2,
      rejectedCount: 1,
      problem: null,
    });
    expect(preview.options).toMatchObject({
      time: { column: 'timestamp' },
      level: { kind: 'level', column: 'level_mm', unit: 'mm' },
      bed: 'bed-a',
    });
    expect(preview.rows.map((r) => r.level_m)).toEqual([0.12, 0.121]);
    expect(preview.rejected[0]).toMatchObject({
      line: 4,
      reason: expect.stringContaining('not ISO 8601'),
    });
    expect(await listCount()).toBe(0);
  });

  it('reports in the preview why chosen options cannot read the file, with its columns', async () => {
    const res = await owner
      .post(`/api/systems/${system.id}/measurements/preview`)
      .send({ text: 'when,depth\n0,1\n', options: { ...OPTIONS, time: { column: 'time' } } });
    const preview = CsvPreviewSchema.parse(res.body);
    expect(preview.columns).toEqual(['when', 'depth']);
    expect(preview.problem).toMatchObject({
      code: 'UNKNOWN_COLUMN',
      message: expect.stringContaining('its columns are "when", "depth"'),
    });
  });

  it('accepts pasted CSV text as JSON', async () => {
    const res = await owner
      .post(`/api/systems/${system.id}/measurements`)
      .send({ text: GOOD_CSV, options: { ...OPTIONS, name: 'Pasted log' } });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(MeasurementSchema.parse(res.body)).toMatchObject({
      name: 'Pasted log',
      originalFilename: 'pasted.csv',
    });
  });

  it('refuses bad files with a code and a fix, and loses nothing already stored', async () => {
    expect((await upload(GOOD_CSV, 'keep.csv')).status).toBe(201);
    const cases: [Buffer | string, string, unknown, number, string][] = [
      [
        Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0]),
        'photo.csv',
        OPTIONS,
        415,
        'NOT_A_CSV',
      ],
      [
        Buffer.from([0x50, 0x4b, 0x03, 0x04, 1, 2]),
        'levels.xlsx',
        OPTIONS,
        415,
        'UNSUPPORTED_FILE_TYPE',
      ],
      [
        Buffer.alloc(MEASUREMENT_MAX_FILE_BYTES + 1, 0x31),
        'huge.csv',
        OPTIONS,
        400,
        'FILE_TOO_LARGE',
      ],
      ['t,level\n0,1\n', 'columns.csv', OPTIONS, 400, 'UNKNOWN_COLUMN'],
      ['time,distance_mm\nnoon,300\nlater,301\n', 'guess.csv', OPTIONS, 400, 'TIME_FORMAT_UNKNOWN'],
      [
        'time,distance_mm\n31/05/2024 10:00,300\n31/05/2024 10:01,301\n',
        'times.csv',
        { ...OPTIONS, time: { column: 'time', format: 'iso' } },
        400,
        'UNREADABLE_TIMES',
      ],
      [
        'time,distance_mm\n' +
          Array.from(
            { length: 30 },
            (_, i) => `2024-05-31 10:${String(59 - i).padStart(2, '0')}:00,300`,
          ).join('\n'),
        'backwards.csv',
        OPTIONS,
        400,
        'NON_MONOTONIC_TIME',
      ],
      ['', 'empty.csv', OPTIONS, 400, 'EMPTY_FILE'],
      [
        GOOD_CSV,
        'zone.csv',
        { ...OPTIONS, time: { column: 'time', timeZone: 'Nowhere/Land' } },
        400,
        'INVALID_TIME_ZONE',
      ],
      [GOOD_CSV, 'bed.csv', { ...OPTIONS, bed: 'bed-z' }, 400, 'UNKNOWN_BED'],
    ];
    for (const [bytes, name, options, status, code] of cases) {
      const res = await upload(bytes, name, options);
      expect(res.status, `${name}: ${JSON.stringify(res.body)}`).toBe(status);
      const error = ApiErrorSchema.parse(res.body).error;
      expect(error.code, name).toBe(code);
      expect(error.message.length, name).toBeGreaterThan(20);
      if (code === 'FILE_TOO_LARGE') {
        const limit = `${MEASUREMENT_MAX_FILE_BYTES / (1024 * 1024)} MB`;
        expect(error.fields).toEqual([{ path: 'file', message: expect.stringContaining(limit) }]);
      }
    }
    const noFile = await owner
      .post(`/api/systems/${system.id}/measurements`)
      .field('options', JSON.stringify(OPTIONS));
    expect(ApiErrorSchema.parse(noFile.body).error.fields?.[0]?.path).toBe('file');
    const badOptions = await upload(GOOD_CSV, 'opts.csv', {
      ...OPTIONS,
      level: { kind: 'level', column: 'x', unit: 'furlong' },
    });
    expect(ApiErrorSchema.parse(badOptions.body).error.fields?.map((f) => f.path)).toEqual([
      'options.level.unit',
    ]);
    const items = MeasurementListSchema.parse(
      (await owner.get(`/api/systems/${system.id}/measurements`)).body,
    ).items;
    expect(items.map((m) => m.originalFilename)).toEqual(['keep.csv']);
    const series = MeasuredSeriesSchema.parse(
      (await owner.get(`/api/measurements/${items[0]?.id}/series`)).body,
    );
    expect(series.beds[0]?.t_s).toEqual([0, 5, 15]);
  });

  it('reads a large file in a worker thread with the same outcome, and refuses large binary data there too', async () => {
    const lines = ['time,distance_mm'];
    for (let i = 0; i < 20_000; i++)
      lines.push(
        `2024-05-31 ${String(10 + Math.floor(i / 3600)).padStart(2, '0')}:${String(Math.floor(i / 60) % 60).padStart(2, '0')}:${String(i % 60).padStart(2, '0')},${300 + (i % 50)}`,
      );
    const big = lines.join('\n');
    expect(Buffer.byteLength(big)).toBeGreaterThan(256 * 1024);
    const res = await upload(big, 'day.csv');
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const measurement = MeasurementSchema.parse(res.body);
    expect(measurement.beds).toEqual([
      { bed: 'bed-a', samples: 20_000, durationS: 19_999, minLevel_m: 0.051, maxLevel_m: 0.1 },
    ]);
    const refused = await upload(Buffer.alloc(300 * 1024, 0), 'zeros.csv');
    expect(refused.status).toBe(415);
    expect(ApiErrorSchema.parse(refused.body).error.code).toBe('NOT_A_CSV');
  });

  it('stores a stopwatch log in SI units and names an unknown bed by its entry', async () => {
    const res = await owner.post(`/api/systems/${system.id}/measurements/stopwatch`).send({
      name: 'Saturday timings',
      entries: [
        { bed: 'bed-a', fillTime: '4:10', drainTime: '4 min', highMark: '28 cm', lowMark: '25 mm' },
        { bed: 'bed-a', fillTime: 252, drainTime: '245 s' },
      ],
    });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const log = MeasurementSchema.parse(res.body);
    expect(log.stopwatch).toEqual([
      { bed: 'bed-a', fillTime: 250, drainTime: 240, highMark: 0.28, lowMark: 0.025 },
      { bed: 'bed-a', fillTime: 252, drainTime: 245 },
    ]);
    expect(log.beds).toEqual([
      { bed: 'bed-a', samples: 2, durationS: 987, minLevel_m: 0.025, maxLevel_m: 0.28 },
    ]);
    const bad = await owner
      .post(`/api/systems/${system.id}/measurements/stopwatch`)
      .send({ name: 'x', entries: [{ bed: 'tank', fillTime: 1, drainTime: 1 }] });
    expect(bad.status).toBe(400);
    expect(ApiErrorSchema.parse(bad.body).error.fields).toEqual([
      { path: 'entries[0].bed', message: expect.stringContaining('not a bed of this system') },
    ]);
    const original = await owner.get(`/api/measurements/${log.id}/original`);
    expect(ApiErrorSchema.parse(original.body).error.code).toBe('NO_ORIGINAL_FILE');
  });

  it('deletes one measurement and keeps the others', async () => {
    const first = MeasurementSchema.parse((await upload(GOOD_CSV, 'a.csv')).body);
    const second = MeasurementSchema.parse((await upload(GOOD_CSV, 'b.csv')).body);
    expect((await owner.delete(`/api/measurements/${first.id}`)).status).toBe(204);
    expect((await owner.get(`/api/measurements/${first.id}`)).status).toBe(404);
    const items = MeasurementListSchema.parse(
      (await owner.get(`/api/systems/${system.id}/measurements`)).body,
    ).items;
    expect(items.map((m) => m.id)).toEqual([second.id]);
  });
});
