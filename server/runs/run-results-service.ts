/** A run's stored results: series (JSON and CSV), the downloadable result file, and comparisons. */
import {
  RunEventSchema,
  type RunComparison,
  type RunResultFile,
  type RunSeries,
  type RunSeriesQuery,
} from '../../shared/contracts/runs';
import type { SessionUser } from '../auth/session-user';
import { findSystemAccess } from '../auth/system-access';
import { notFound } from '../http/http-error';
import { compareRuns } from './compare-runs';
import { findRunEvents, findRunSeries } from './runs-repository';
import { requireRun, type RunsDeps } from './runs-service';
import { selectSeries } from './select-series';
import { decodeSeries, seriesToJson, type DecodedSeries } from './series-codec';
import { seriesToCsv } from './series-csv';
import { toRun } from './to-run';

type User = Pick<SessionUser, 'id'>;

async function loadSeries(deps: RunsDeps, runId: string): Promise<DecodedSeries | null> {
  const stored = await findRunSeries(deps.db, runId);
  if (!stored) throw notFound('That run');
  return stored.series ? decodeSeries(stored.series) : null;
}

const EMPTY: DecodedSeries = { t_s: new Float64Array(0), channels: [] };

/** `GET /api/runs/:id/series`: the chart data (empty when the run has no series yet). */
export async function getRunSeries(
  deps: RunsDeps,
  user: User,
  runId: string,
  query: RunSeriesQuery,
): Promise<RunSeries> {
  const row = await requireRun(deps.db, user, runId, 'read');
  const series = (await loadSeries(deps, row.id)) ?? EMPTY;
  return seriesToJson(selectSeries(series, query));
}

/** `GET /api/runs/:id/series.csv`: header `t_s,<channel ids>`, one row per sample. */
export async function getRunSeriesCsv(
  deps: RunsDeps,
  user: User,
  runId: string,
): Promise<{ fileName: string; csv: string }> {
  const row = await requireRun(deps.db, user, runId, 'read');
  const series = (await loadSeries(deps, row.id)) ?? EMPTY;
  return { fileName: `run-${row.id.slice(0, 8)}-series.csv`, csv: seriesToCsv(series) };
}

/** `GET /api/runs/:id/result.json`: run, normalised scenario snapshot and the full result. */
export async function getRunResultFile(
  deps: RunsDeps,
  user: User,
  runId: string,
): Promise<{ fileName: string; file: RunResultFile }> {
  const row = await requireRun(deps.db, user, runId, 'read');
  const run = toRun(row, deps.pool);
  const series = await loadSeries(deps, row.id);
  const stored = await findRunEvents(deps.db, row.id);
  const events =
    stored && stored.events !== null ? RunEventSchema.array().parse(stored.events) : null;
  const { id, systemId, systemVersion, status, durationS, verdict, error, createdAt, finishedAt } =
    run;
  const file: RunResultFile = {
    format: 'tidewright-run/1',
    run: { id, systemId, systemVersion, status, durationS, verdict, error, createdAt, finishedAt },
    scenario: row.scenario as Record<string, unknown>,
    summary: run.summary,
    events,
    verdicts: run.verdicts,
    massBalanceError: run.massBalanceError,
    stats: run.stats,
    series: series ? seriesToJson(series) : null,
  };
  return { fileName: `run-${row.id.slice(0, 8)}-result.json`, file };
}

/** `GET /api/runs/compare?a=&b=`: differences between two runs the user can read. */
export async function compareTwoRuns(
  deps: RunsDeps,
  user: User,
  aId: string,
  bId: string,
): Promise<RunComparison> {
  const [a, b] = await Promise.all([
    requireRun(deps.db, user, aId, 'read'),
    requireRun(deps.db, user, bId, 'read'),
  ]);
  const side = async (row: typeof a) => {
    const run = toRun(row, deps.pool);
    const access = await findSystemAccess(deps.db, user.id, row.systemId);
    return {
      run,
      side: {
        id: run.id,
        systemId: run.systemId,
        systemName: access?.system.name ?? '',
        status: run.status,
        durationS: run.durationS,
        verdict: run.verdict,
        createdAt: run.createdAt,
      },
    };
  };
  const [left, right] = await Promise.all([side(a), side(b)]);
  return { a: left.side, b: right.side, ...compareRuns(left.run, right.run) };
}
