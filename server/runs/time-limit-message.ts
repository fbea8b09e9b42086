/** The message of a run stopped at the wall-time limit (the same from the worker and the pool). */

/** Renders a limit: whole ms below 1 s, 0.1 s below 10 s, whole seconds above. */
function formatLimit(limitMs: number): string {
  if (limitMs < 1000) return `${Math.round(limitMs)} ms`;
  if (limitMs < 10_000) return `${Math.round(limitMs / 100) / 10} s`;
  return `${Math.round(limitMs / 1000)} s`;
}

/** "Stopped at the 120 s time limit for one run; shorten the duration or simplify the system…". */
export function timeLimitMessage(limitMs: number): string {
  return `Stopped at the ${formatLimit(limitMs)} time limit for one run; shorten the duration or simplify the system and run again.`;
}
