/** Stores how a run ended: result parts, compact series, worst verdict; then the system's last verdict. */
import type { Logger } from 'pino';
import type { Database } from '../db/database';
import type { RunJobOptions, RunJobOutcome } from './run-worker-messages';
import { finishRun, type RunRow } from './runs-repository';
import { refreshLastVerdict } from './refresh-last-verdict';
import { worstVerdict } from './worst-verdict';

/**
 * Writes the outcome onto the run row. Never rejects: a storage failure is logged (the run then
 * stays queued/running until the next start marks it failed).
 */
export async function storeRunOutcome(
  db: Database,
  logger: Logger,
  row: Pick<RunRow, 'id' | 'systemId'>,
  outcome: RunJobOutcome,
  options?: RunJobOptions,
): Promise<void> {
  try {
    const result = outcome.result;
    const stats = result
      ? {
          ...result.stats,
          massBalanceError: result.massBalanceError,
          sampleCount: outcome.sampleCount,
          ...(options ? { maxSamples: options.maxSamples } : {}),
        }
      : null;
    const stored = await finishRun(db, row.id, {
      status: outcome.status,
      error: outcome.error,
      summary: result?.summary ?? null,
      verdicts: result?.verdicts ?? null,
      events: result?.events ?? null,
      stats,
      verdict: result ? worstVerdict(result.verdicts) : null,
      series: outcome.series
        ? Buffer.from(outcome.series.buffer, outcome.series.byteOffset, outcome.series.byteLength)
        : null,
    });
    if (stored && outcome.status === 'completed') await refreshLastVerdict(db, row.systemId);
  } catch (error) {
    logger.error({ err: error, runId: row.id }, 'storing a run outcome failed');
  }
}
