/**
 * Route table entries: runs. The fixture stores two ended runs of the systems group's system
 * (a small stored result, not an engine run: these tests are about who may call what).
 */
import { encodeSeries } from '../../../server/runs/series-codec';
import { finishRun, insertRun } from '../../../server/runs/runs-repository';
import type { RouteFixture, RouteGroup } from '../route-table';

async function storedRun(f: RouteFixture, systemId: string): Promise<string> {
  const run = await insertRun(f.ctx.db, {
    systemId,
    createdBy: f.owner.id,
    durationS: 60,
    systemVersion: 1,
    scenario: {},
  });
  await finishRun(f.ctx.db, run.id, {
    status: 'completed',
    error: null,
    summary: {
      beds: [],
      vessels: [{ id: 'tank', minLevel_m: 0.5, minLevelAt_s: 60, maxLevel_m: 0.55, lost_m3: 0 }],
      pumps: [],
    },
    verdicts: [
      { check: 'tank-min-level', status: 'ok', value: 0.5, limit: 0.4, source: 'fixture' },
    ],
    events: [],
    stats: { steps: 1, rejected: 0, rhsEvaluations: 6, events: 0, wall_ms: 1, sampleCount: 2 },
    verdict: 'ok',
    series: encodeSeries({
      t_s: [0, 60],
      channels: [
        { id: 'level:tank', kind: 'level', where: 'tank', unit: 'm', values: [0.55, 0.5] },
      ],
    }),
  });
  return run.id;
}

const read = { need: 'read', shareable: true } as const;
const write = { need: 'write', shareable: true } as const;

/** Runs follow their system's owner and shares: viewers read, editors also start, cancel and delete. */
export const runsRoutes: RouteGroup = {
  name: 'runs',
  fixture: async (f) => {
    const systemId = f.params['systemId'];
    if (!systemId) throw new Error('The runs fixture needs the systems fixture first.');
    f.params['runId'] = await storedRun(f, systemId);
    f.params['otherRunId'] = await storedRun(f, systemId);
  },
  routes: [
    {
      method: 'post',
      path: '/api/systems/:systemId/runs',
      access: 'signed-in',
      ownership: write,
      body: () => ({ duration: '2 min' }),
      okStatus: 201,
    },
    {
      method: 'get',
      path: '/api/systems/:systemId/runs',
      access: 'signed-in',
      ownership: read,
      okStatus: 200,
    },
    {
      method: 'get',
      path: '/api/runs/compare',
      access: 'signed-in',
      ownership: read,
      query: (f) => ({ a: f.params['runId'] ?? '', b: f.params['otherRunId'] ?? '' }),
      okStatus: 200,
    },
    {
      method: 'get',
      path: '/api/runs/:runId',
      access: 'signed-in',
      ownership: read,
      okStatus: 200,
    },
    {
      method: 'post',
      path: '/api/runs/:runId/cancel',
      access: 'signed-in',
      ownership: write,
      okStatus: 200,
    },
    {
      method: 'delete',
      path: '/api/runs/:runId',
      access: 'signed-in',
      ownership: write,
      okStatus: 204,
    },
    {
      method: 'get',
      path: '/api/runs/:runId/series',
      access: 'signed-in',
      ownership: read,
      okStatus: 200,
    },
    {
      method: 'get',
      path: '/api/runs/:runId/series.csv',
      access: 'signed-in',
      ownership: read,
      okStatus: 200,
    },
    {
      method: 'get',
      path: '/api/runs/:runId/result.json',
      access: 'signed-in',
      ownership: read,
      okStatus: 200,
    },
  ],
};
