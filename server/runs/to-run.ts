/** The API forms of a stored run row (`Run`, `RunListItem`). */
import {
  RunEventSchema,
  RunStatsSchema,
  RunSummarySchema,
  VerdictSchema,
  type Run,
  type RunListItem,
  type RunStatus,
} from '../../shared/contracts/runs';
import type { VerdictStatus } from '../../shared/contracts/systems';
import type { RunPool } from './run-pool';
import type { RunListRow, RunRow } from './runs-repository';

const STATUSES: readonly RunStatus[] = [
  'queued',
  'running',
  'completed',
  'stopped',
  'failed',
  'cancelled',
];

const asStatus = (value: string): RunStatus => STATUSES.find((s) => s === value) ?? 'failed';
const asVerdict = (value: string | null): VerdictStatus | null =>
  value === 'ok' || value === 'warning' || value === 'fails' ? value : null;

/** 0 while queued, the worker's progress while running, 1 once ended. */
export function runProgress(row: Pick<RunRow, 'id' | 'status'>, pool: RunPool | undefined): number {
  if (row.status !== 'queued' && row.status !== 'running') return 1;
  return pool?.status(row.id)?.progress ?? 0;
}

/** Reads the numeric extras the server keeps in `stats` (sample count, mass balance). */
function statNumber(stats: unknown, key: string): number | null {
  const value =
    typeof stats === 'object' && stats !== null
      ? (stats as Record<string, unknown>)[key]
      : undefined;
  return typeof value === 'number' && Number.isFinite(value) ? value : null;
}

/** A stored run as `GET /api/runs/:id` shows it (result parts checked against the contract). */
export function toRun(row: RunRow & { eventCount?: number }, pool: RunPool | undefined): Run {
  const events = row.events === null ? null : RunEventSchema.array().parse(row.events);
  return {
    id: row.id,
    systemId: row.systemId,
    systemVersion: row.systemVersion,
    status: asStatus(row.status),
    progress: runProgress(row, pool),
    durationS: row.durationS,
    verdict: asVerdict(row.verdict),
    error: row.error,
    summary: row.summary === null ? null : RunSummarySchema.parse(row.summary),
    verdicts: row.verdicts === null ? null : VerdictSchema.array().parse(row.verdicts),
    events,
    eventCount: row.eventCount ?? events?.length ?? 0,
    stats: row.stats === null ? null : RunStatsSchema.parse(row.stats),
    massBalanceError: statNumber(row.stats, 'massBalanceError'),
    sampleCount: statNumber(row.stats, 'sampleCount') ?? 0,
    createdBy: row.createdBy,
    createdAt: row.createdAt.toISOString(),
    finishedAt: row.finishedAt?.toISOString() ?? null,
  };
}

/** A row of the runs table. */
export function toRunListItem(row: RunListRow, pool: RunPool | undefined): RunListItem {
  return {
    id: row.id,
    status: asStatus(row.status),
    progress: runProgress(row, pool),
    durationS: row.durationS,
    systemVersion: row.systemVersion,
    verdict: asVerdict(row.verdict),
    error: row.error,
    createdBy: row.createdBy,
    createdByName: row.createdByName,
    createdAt: row.createdAt.toISOString(),
    finishedAt: row.finishedAt?.toISOString() ?? null,
  };
}
