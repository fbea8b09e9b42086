/** The message of a run stopped at the wall-time limit (the same from the worker and the pool). */

/** "Stopped at the 120 s time limit for one run; …" — seconds shown to 0.1 s below 10 s. */
export function timeLimitMessage(limitMs: number): string {
  const seconds = limitMs >= 10_000 ? Math.round(limitMs / 1000) : Math.round(limitMs / 100) / 10;
  return `Stopped at the ${seconds} s time limit for one run; shorten the duration or simplify the system and run again.`;
}
