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

/** A verdict as the page shows it: the check in words, and value and limit in the reader's units. */
export interface VerdictReading {
  readonly title: string;
  readonly value: string;
  readonly limit: string;
  /** True when value (or limit) is a number, shown in the figures' typeface. */
  readonly valueIsFigure: boolean;
  readonly limitIsFigure: boolean;
}

/** Bed regimes as the engine names them, in words. */
const STATE_WORDS: Readonly<Record<string, string>> = {
  cycling: 'cycles',
  'spill-stall': 'stalls spilling (never primes)',
  'siphon-lock': 'siphon locks on (never breaks)',
  flooded: 'stays flooded',
  idle: 'never fills',
  'cycling or flooded': 'cycles or stays flooded',
};

/**
 * Reads a verdict for people. The engine writes each check as a phrase ending in its unit, e.g.
 * "tank: stays above its fish-safe minimum level (m)"; the unit tells how to show the numbers:
 * lengths and volumes in the reader's units, times as durations, others as plain figures.
 */
export function readVerdict(verdict: Verdict, system: UnitSystem): VerdictReading {
  const match = /^(.*?)\s*\(([^()]*)\)$/.exec(verdict.check);
  const phrase = match?.[1] ?? verdict.check;
  const unitHint = match?.[2] ?? '';
  // A limit written with its unit ("5–60 min") gives the unit of a bare numeric value.
  const limitUnit =
    typeof verdict.limit === 'string' ? /\s(min|h|s)$/.exec(verdict.limit)?.[1] : undefined;
  const show = (figure: number | string | null) => {
    const words = figureWords(figure, unitHint, system);
    return typeof figure === 'number' && limitUnit && !knownUnit(unitHint)
      ? `${words} ${limitUnit}`
      : words;
  };
  const title = match && !knownUnit(unitHint) ? verdict.check : phrase;
  return {
    title: capitalise(title),
    value: show(verdict.value),
    limit: show(verdict.limit),
    valueIsFigure: typeof verdict.value === 'number',
    limitIsFigure: typeof verdict.limit === 'number' || /\d/.test(String(verdict.limit)),
  };
}

/** A one-line reading of a verdict: "Tank: stays above its fish-safe minimum level: 0.48 m (limit 0.4 m)." */
export function verdictSentence(verdict: Verdict, system: UnitSystem): string {
  const reading = readVerdict(verdict, system);
  const limit = verdict.limit === null ? '' : ` (limit ${reading.limit})`;
  return `${reading.title}: ${reading.value}${limit}.`;
}

function knownUnit(hint: string): boolean {
  return /(^|\s|,)(m|L|s dry|°C)$/.test(hint);
}

function figureWords(figure: number | string | null, unitHint: string, system: UnitSystem): string {
  if (figure === null) return '–';
  if (typeof figure === 'string') return STATE_WORDS[figure] ?? figure;
  if (/(^|\s|,)m$/.test(unitHint)) return formatQuantity(figure, 'length', system);
  if (/(^|\s)L$/.test(unitHint)) return formatQuantity(figure / 1000, 'volume', system);
  if (unitHint === 's dry') return figure === 0 ? 'never' : `${durationWords(figure)} dry`;
  if (unitHint.endsWith('°C')) return formatQuantity(figure, 'temperature', system);
  if (Math.abs(figure) > 0 && Math.abs(figure) < 1e-3) return figure.toExponential(1);
  return String(Number(figure.toPrecision(4)));
}

/** A level in the reader's units, or a dash. */
export function levelWords(levelM: number | null, system: UnitSystem): string {
  return levelM === null ? '–' : formatQuantity(levelM, 'length', system);
}

function capitalise(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}
