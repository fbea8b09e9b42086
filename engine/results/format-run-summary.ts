import { formatSignificant as fmt } from './format-significant';
import type { RunEvent, SimulationOutcome } from './run-result';

/** Event kinds a reader of the summary needs to see (routine cycle events are left out). */
const ATTENTION = new Set([
  'spill-stall',
  'siphon-lock',
  'rim-overflow',
  'overflow-start',
  'overflow-end',
  'below-min-level',
  'pump-dry',
  'pump-restart',
  'pump-off',
  'pump-on',
  'leak-start',
  'back-siphon-start',
  'back-siphon-end',
  'float-switch',
]);
const MAX_EVENT_LINES = 20;

/** Formats seconds as h:mm:ss. */
export function formatClock(seconds: number): string {
  const s = Math.round(seconds);
  const h = Math.floor(s / 3600);
  const m = Math.floor((s % 3600) / 60);
  return `${h}:${String(m).padStart(2, '0')}:${String(s % 60).padStart(2, '0')}`;
}

const minutes = (seconds: number | null): string =>
  seconds === null ? '—' : `${fmt(seconds / 60, 3)} min`;
const metres = (m: number | null): string => (m === null ? '—' : `${fmt(m, 3)} m`);

/** A short plain-text summary of a run: beds, vessels, pumps, verdicts, events worth attention. */
export function formatRunSummary(name: string, outcome: SimulationOutcome): string {
  const { result } = outcome;
  const lines: string[] = [];
  const hours = fmt(result.stats.simulated_s / 3600, 3);
  lines.push(
    `${name}: ${hours} h simulated in ${Math.round(result.stats.wall_ms)} ms (${outcome.status}${outcome.reason ? `: ${outcome.reason}` : ''})`,
  );
  lines.push('', 'Beds');
  for (const bed of result.summary.beds) {
    const range =
      bed.periodMin_s === null || bed.periodMax_s === null
        ? ''
        : ` (${fmt(bed.periodMin_s / 60, 3)}–${fmt(bed.periodMax_s / 60, 3)})`;
    lines.push(
      `  ${bed.id}: ${bed.state}, ${bed.cycles} cycles, period ${minutes(bed.periodMean_s)}${range}, flood ${minutes(bed.floodMean_s)}, drain ${minutes(bed.drainMean_s)}, high ${metres(bed.highLevel_m)}, low ${metres(bed.lowLevel_m)}`,
    );
  }
  lines.push('', 'Vessels');
  for (const v of result.summary.vessels) {
    lines.push(
      `  ${v.id}: lowest ${metres(v.minLevel_m)} at ${formatClock(v.minLevelAt_s)}, highest ${metres(v.maxLevel_m)} at ${formatClock(v.maxLevelAt_s)}, lost ${fmt(v.lost_m3 * 1000, 3)} L`,
    );
  }
  lines.push('', 'Pumps');
  for (const p of result.summary.pumps) {
    lines.push(
      `  ${p.id}: mean ${fmt(p.meanFlow_m3s * 60000, 3)} L/min, dry ${fmt(p.dry_s, 3)} s, energy ${fmt(p.energy_J / 3.6e6, 3)} kWh (${p.energyBasis})`,
    );
  }
  lines.push('', 'Verdicts');
  for (const v of result.verdicts) {
    lines.push(
      `  ${v.status.toUpperCase().padEnd(7)} ${v.check}: ${v.value ?? '—'} (limit ${v.limit ?? '—'}; ${v.source})`,
    );
  }
  lines.push(...eventLines(result.events));
  lines.push(
    '',
    `Mass-balance error ${result.massBalanceError.toExponential(2)}; ${result.stats.steps} steps, ${result.stats.rejected} rejected, ${result.stats.rhsEvaluations} evaluations, ${result.stats.events} events.`,
  );
  return lines.join('\n');
}

function eventLines(events: readonly RunEvent[]): string[] {
  const worth = events.filter(
    (e) => ATTENTION.has(e.kind) && !(e.kind === 'pump-on' && e.t_s === 0),
  );
  if (worth.length === 0) return ['', 'Events worth attention: none'];
  const lines = ['', 'Events worth attention'];
  for (const e of worth.slice(0, MAX_EVENT_LINES))
    lines.push(`  ${formatClock(e.t_s)} ${e.kind} ${e.where}: ${e.detail}`);
  if (worth.length > MAX_EVENT_LINES)
    lines.push(`  … and ${worth.length - MAX_EVENT_LINES} more (see --json)`);
  return lines;
}
