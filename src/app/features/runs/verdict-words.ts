import type { BedSummary, Verdict } from '../../../../shared/contracts/runs';
import type { VerdictStatus } from '../../../../shared/contracts/systems';
import { type UnitSystem, formatQuantity } from '../../../../shared/scenario';

/** How a verdict status reads and looks. */
export interface StatusWords {
  readonly label: string;
  readonly icon: string;
  readonly tone: 'ok' | 'warning' | 'fails' | 'none';
}

/** The words and icon for a worst-verdict status; null means nothing has run yet. */
export function statusWords(status: VerdictStatus | null): StatusWords {
  switch (status) {
    case 'ok':
      return { label: 'All checks pass', icon: 'check_circle', tone: 'ok' };
    case 'warning':
      return { label: 'Needs attention', icon: 'warning', tone: 'warning' };
    case 'fails':
      return { label: 'Fails a check', icon: 'error', tone: 'fails' };
    default:
      return { label: 'Not run yet', icon: 'schedule', tone: 'none' };
  }
}

/** A duration in words for people: "45 s", "4.2 min", "1.5 h". */
export function durationWords(seconds: number): string {
  if (seconds < 120) return `${Number(seconds.toPrecision(3))} s`;
  if (seconds < 2 * 3600) return `${Number((seconds / 60).toPrecision(3))} min`;
  return `${Number((seconds / 3600).toPrecision(3))} h`;
}

/** One sentence on how a bed behaved, with its numbers. */
export function bedSentence(bed: BedSummary): string {
  switch (bed.state) {
    case 'cycling': {
      const period = bed.periodMean_s === null ? '' : ` every ${durationWords(bed.periodMean_s)}`;
      return `${bed.id} floods and drains${period} (${bed.cycles} ${bed.cycles === 1 ? 'cycle' : 'cycles'}).`;
    }
    case 'spill-stall':
      return `${bed.id} never starts its siphon: water trickles over the standpipe without priming it.`;
    case 'siphon-lock':
      return `${bed.id}'s siphon never breaks: the inflow keeps it draining without stop.`;
    case 'flooded':
      return `${bed.id} stays flooded at the standpipe top.`;
    case 'idle':
      return `${bed.id} never fills to the standpipe in this time.`;
  }
}

/** Check names as the engine reports them, in plain words; unknown ones are spelled out. */
const CHECK_WORDS: Readonly<Record<string, string>> = {
  'bed-cycles': 'Every bed floods and drains',
  'siphon-primes': 'Every siphon starts',
  'siphon-breaks': 'Every siphon stops again',
  'tank-min-level': 'The fish tank stays above its safe level',
  'min-level': 'Tanks stay above their safe levels',
  'pump-dry': 'The pump never runs dry',
  'no-overflow': 'Nothing overflows',
  overflow: 'Nothing overflows',
  'rim-overflow': 'No vessel spills over its rim',
  'water-lost': 'No water is lost',
  'mass-balance': 'The simulation conserves water',
  'back-siphon': 'No water siphons back when the pump stops',
};

/** A check's name in plain words ("tank-min-level:tank" → "The fish tank stays above its safe level (tank)"). */
export function checkWords(check: string): string {
  const [name = check, where] = check.split(':');
  const words = CHECK_WORDS[name] ?? capitalise(name.replaceAll(/[-_]/g, ' '));
  return where ? `${words} (${where})` : words;
}

/** A verdict's value or limit for reading: numbers to four significant digits, text as is. */
export function verdictFigure(value: number | string | null): string {
  if (value === null) return '–';
  if (typeof value === 'string') return value;
  return String(Number(value.toPrecision(4)));
}

/** A one-line reading of a verdict: "The pump never runs dry: 0 (limit 0)". */
export function verdictSentence(verdict: Verdict): string {
  const limit = verdict.limit === null ? '' : `, limit ${verdictFigure(verdict.limit)}`;
  return `${checkWords(verdict.check)}: ${verdictFigure(verdict.value)}${limit}.`;
}

/** A level in the reader's units, or a dash. */
export function levelWords(levelM: number | null, system: UnitSystem): string {
  return levelM === null ? '–' : formatQuantity(levelM, 'length', system);
}

function capitalise(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}
