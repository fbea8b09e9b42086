/**
 * Route table entries: measurements and calibrations. The fixture stores a logged tank level
 * (CSV), a stopwatch log of bed-a and one fit, all on the systems group's system.
 */
import { insertCalibration } from '../../../server/measurements/calibrations-repository';
import { insertMeasurement } from '../../../server/measurements/measurements-repository';
import type { RouteFixture, RouteGroup } from '../route-table';

const read = { need: 'read', shareable: true } as const;
const write = { need: 'write', shareable: true } as const;

const CSV_TEXT =
  'time,level_mm\n2024-05-31T10:00:00Z,550\n2024-05-31T10:00:05Z,549\n2024-05-31T10:00:10Z,548\n';
const CSV_OPTIONS = {
  time: { column: 'time' },
  level: { kind: 'level', column: 'level_mm', unit: 'mm' },
  bed: 'tank',
};

async function storeFixtures(f: RouteFixture, systemId: string): Promise<void> {
  const t_s = [0, 5, 10];
  const level_m = [0.55, 0.549, 0.548];
  f.params['measurementId'] = await insertMeasurement(f.ctx.db, {
    systemId,
    createdBy: f.owner.id,
    kind: 'csv',
    name: 'Tank log',
    originalFilename: 'tank.csv',
    original: Buffer.from(CSV_TEXT),
    options: { import: CSV_OPTIONS },
    series: {
      startTime: '2024-05-31T10:00:00.000Z',
      beds: [{ bed: 'tank', t_s, level_m }],
      overview: [{ bed: 'tank', samples: 3, durationS: 10, minLevel_m: 0.548, maxLevel_m: 0.55 }],
    },
    rejected: { total: 0, rows: [] },
    stopwatch: null,
  });
  f.params['stopwatchId'] = await insertMeasurement(f.ctx.db, {
    systemId,
    createdBy: f.owner.id,
    kind: 'stopwatch',
    name: 'Timed cycles',
    originalFilename: null,
    original: null,
    options: null,
    series: {
      startTime: null,
      beds: [],
      overview: [
        { bed: 'bed-a', samples: 1, durationS: 497, minLevel_m: 0.025, maxLevel_m: 0.278 },
      ],
    },
    rejected: { total: 0, rows: [] },
    stopwatch: [{ bed: 'bed-a', fillTime: 251, drainTime: 246, highMark: 0.278, lowMark: 0.025 }],
  });
  f.params['calibrationId'] = await insertCalibration(f.ctx.db, {
    systemId,
    createdBy: f.owner.id,
    measurementIds: [f.params['stopwatchId']],
    parameters: [
      {
        key: 'primingCoefficient',
        target: 'bed-a',
        initial: 0.7,
        fitted: 0.68,
        standardError: 0.01,
        lower: 0.05,
        upper: 5,
      },
    ],
    fit: {
      status: 'converged',
      message: 'fixture',
      iterations: 1,
      evaluations: 3,
      chiSquareBefore: 4,
      chiSquareAfter: 0.5,
      rmsNormalisedResidual: 0.4,
      degreesOfFreedom: 2,
      wallMs: 1,
      residuals: [],
    },
  });
}

/** Measurements and calibrations follow their system's owner and shares: viewers read, editors also write. */
export const measurementsRoutes: RouteGroup = {
  name: 'measurements',
  fixture: async (f) => {
    const systemId = f.params['systemId'];
    if (!systemId) throw new Error('The measurements fixture needs the systems fixture first.');
    await storeFixtures(f, systemId);
  },
  routes: [
    {
      method: 'post',
      path: '/api/systems/:systemId/measurements/preview',
      access: 'signed-in',
      ownership: write,
      body: () => ({ fileName: 'tank.csv', text: CSV_TEXT, options: CSV_OPTIONS }),
      okStatus: 200,
    },
    {
      method: 'post',
      path: '/api/systems/:systemId/measurements',
      access: 'signed-in',
      ownership: write,
      body: () => ({ fileName: 'tank.csv', text: CSV_TEXT, options: CSV_OPTIONS }),
      okStatus: 201,
    },
    {
      method: 'post',
      path: '/api/systems/:systemId/measurements/stopwatch',
      access: 'signed-in',
      ownership: write,
      body: () => ({
        name: 'Timed by hand',
        entries: [{ bed: 'bed-a', fillTime: '4 min', drainTime: '4 min' }],
      }),
      okStatus: 201,
    },
    {
      method: 'get',
      path: '/api/systems/:systemId/measurements',
      access: 'signed-in',
      ownership: read,
      okStatus: 200,
    },
    {
      method: 'get',
      path: '/api/measurements/:measurementId',
      access: 'signed-in',
      ownership: read,
      okStatus: 200,
    },
    {
      method: 'get',
      path: '/api/measurements/:measurementId/series',
      access: 'signed-in',
      ownership: read,
      okStatus: 200,
    },
    {
      method: 'get',
      path: '/api/measurements/:measurementId/rejected',
      access: 'signed-in',
      ownership: read,
      okStatus: 200,
    },
    {
      method: 'get',
      path: '/api/measurements/:measurementId/original',
      access: 'signed-in',
      ownership: read,
      okStatus: 200,
    },
    {
      method: 'get',
      path: '/api/measurements/:measurementId/compare',
      access: 'signed-in',
      ownership: read,
      query: (f) => ({ run: f.params['runId'] ?? '', bed: 'tank' }),
      okStatus: 200,
    },
    {
      method: 'delete',
      path: '/api/measurements/:measurementId',
      access: 'signed-in',
      ownership: write,
      okStatus: 204,
    },
    {
      method: 'post',
      path: '/api/systems/:systemId/calibrations',
      access: 'signed-in',
      ownership: write,
      body: (f) => ({
        measurementIds: [f.params['stopwatchId']],
        fit: { primingCoefficient: true, dischargeLossMultiplier: false },
      }),
      okStatus: 201,
    },
    {
      method: 'get',
      path: '/api/systems/:systemId/calibrations',
      access: 'signed-in',
      ownership: read,
      okStatus: 200,
    },
    {
      method: 'get',
      path: '/api/systems/:systemId/calibration',
      access: 'signed-in',
      ownership: read,
      okStatus: 200,
    },
    {
      method: 'delete',
      path: '/api/systems/:systemId/calibration',
      access: 'signed-in',
      ownership: write,
      okStatus: 204,
    },
    {
      method: 'post',
      path: '/api/calibrations/:calibrationId/apply',
      access: 'signed-in',
      ownership: write,
      okStatus: 200,
    },
  ],
};
