/** The worst status among a run's verdicts: what the systems table shows as "last run verdict". */
import type { VerdictStatus } from '../../shared/contracts/systems';

const RANK: Record<VerdictStatus, number> = { ok: 0, warning: 1, fails: 2 };

/** `fails` beats `warning` beats `ok`; null for no verdicts. */
export function worstVerdict(
  verdicts: ReadonlyArray<{ status: VerdictStatus }>,
): VerdictStatus | null {
  let worst: VerdictStatus | null = null;
  for (const { status } of verdicts)
    if (worst === null || RANK[status] > RANK[worst]) worst = status;
  return worst;
}
