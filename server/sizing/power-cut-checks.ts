/** A power cut mid-flood and the restart after it. */
import type { SizingCheck } from '../../shared/contracts/sizing';
import type { Scenario } from '../../shared/scenario/index';
import type { RunResultParts } from '../runs/run-worker-messages';
import { sizingCheck, type CheckWords } from './check-words';

/** Water lost below this counts as none, m³ (round-off of the volume balance). */
const NONE_M3 = 1e-6;

/**
 * When to cut the power: the first priming of the cold start (the beds are at their fullest, the
 * pipes full), else the first spill over a standpipe, else half an hour in.
 */
export function powerCutMoment(coldStart: RunResultParts): { atS: number; when: string } {
  const first = (kind: string) => coldStart.events.find((e) => e.kind === kind);
  const primed = first('primed');
  if (primed) return { atS: primed.t_s, when: `as the siphon of ${primed.where} primed` };
  const spill = first('spill-start');
  if (spill) return { atS: spill.t_s, when: `as ${spill.where} reached its standpipe top` };
  return { atS: 1800, when: 'half an hour into a cold start' };
}

const describeSpills = (run: RunResultParts, fromS: number, words: CheckWords): string[] =>
  run.events
    .filter((e) => e.t_s >= fromS && (e.kind === 'rim-overflow' || e.kind === 'overflow-start'))
    .map((e) => `${e.where} at ${words.time(e.t_s)}`);

/** Water lost anywhere in the power-cut run, with the spills that began after the cut. */
function lostWaterCheck(
  run: RunResultParts,
  cut: { atS: number; when: string },
  forS: number,
  words: CheckWords,
): SizingCheck {
  const cutS = cut.atS;
  const lost = run.summary.vessels.reduce((sum, v) => sum + (v.lost_m3 ?? 0), 0);
  const spills = describeSpills(run, cutS, words);
  const spilled = lost > NONE_M3;
  return sizingCheck({
    check: 'power-cut-water-lost',
    subject: 'system',
    title: 'A power cut mid-flood',
    status: spilled ? 'fails' : spills.length > 0 ? 'warning' : 'ok',
    value: lost,
    limit: 0,
    unit: 'm3',
    source: 'physics (mass balance)',
    detail:
      `The power went off at ${words.time(cutS)}, ${cut.when}, for ${words.time(forS)}. ` +
      (spilled ? `${words.volume(lost)} of water left the system` : 'No water left the system') +
      (spills.length > 0 ? `; overflows: ${spills.join(', ')}.` : '; nothing overflowed.'),
  });
}

/** After the power returns: no pump runs dry, no fish tank drops below its minimum, every bell-siphon bed primes again. */
function restartCheck(scenario: Scenario, run: RunResultParts, onS: number): SizingCheck {
  const after = run.events.filter((e) => e.t_s >= onS);
  const dry = after.filter((e) => e.kind === 'pump-dry').map((e) => e.where);
  const low = after.filter((e) => e.kind === 'below-min-level').map((e) => e.where);
  const bells = scenario.vessels
    .filter((v) => v.kind === 'bed' && v.drain.type === 'bell-siphon')
    .map((v) => v.id);
  const cycling = bells.filter((id) => after.some((e) => e.kind === 'primed' && e.where === id));
  const problems = [
    ...dry.map((p) => `pump ${p} ran dry`),
    ...low.map((v) => `${v} fell below its minimum`),
  ];
  const idle = bells.filter((id) => !cycling.includes(id));
  return sizingCheck({
    check: 'restart',
    subject: 'system',
    title: 'Restart after the power cut',
    status: problems.length > 0 ? 'fails' : idle.length > 0 ? 'warning' : 'ok',
    value: cycling.length,
    limit: bells.length,
    unit: 'count',
    source: 'physics (mass balance)',
    detail:
      `In the hour after the power returned ${problems.length > 0 ? `${[...new Set(problems)].join(', ')}` : 'no pump ran dry and no tank fell below its minimum'}; ` +
      `${cycling.length} of ${bells.length} bell-siphon beds primed again${idle.length > 0 ? ` (not ${idle.join(', ')})` : ''}.`,
  });
}

/**
 * The checks of the power-cut run: cut at `cut.atS` for `forS`, on again after; numbers in the
 * sentences in `words`' units.
 */
export function powerCutChecks(
  scenario: Scenario,
  run: RunResultParts,
  cut: { atS: number; when: string },
  forS: number,
  words: CheckWords,
): SizingCheck[] {
  return [lostWaterCheck(run, cut, forS, words), restartCheck(scenario, run, cut.atS + forS)];
}
