import type { BedRegime, Question, SimulatedValue } from '../../../../shared/contracts/classroom';
import type { UnitSystem } from '../../../../shared/scenario';

/** How a numeric answer is typed and shown: a unit label and its factor to SI. */
export interface AnswerUnit {
  /** Shown beside the field and after numbers. */
  readonly label: string;
  /** SI value per displayed unit: seconds per minute, metres per centimetre or inch. */
  readonly siPerUnit: number;
  /** Decimal places shown. */
  readonly decimals: number;
}

const MINUTES: AnswerUnit = { label: 'min', siPerUnit: 60, decimals: 1 };
const CENTIMETRES: AnswerUnit = { label: 'cm', siPerUnit: 0.01, decimals: 1 };
/** 1 in = 0.0254 m exactly (international inch, 1959). */
const INCHES: AnswerUnit = { label: 'in', siPerUnit: 0.0254, decimals: 1 };

/** The unit a numeric question is answered in: periods in minutes, levels in cm or inches. */
export function answerUnit(question: Question, system: UnitSystem): AnswerUnit | null {
  if (question.kind === 'bed-period') return MINUTES;
  if (question.kind === 'vessel-low-level') return system === 'us' ? INCHES : CENTIMETRES;
  return null;
}

/** A typed number in the question's unit, converted to SI. */
export function toSi(displayed: number, unit: AnswerUnit): number {
  return displayed * unit.siPerUnit;
}

/** An SI value in the question's unit, rounded as shown. */
export function fromSi(value: number, unit: AnswerUnit): number {
  const factor = 10 ** unit.decimals;
  return Math.round((value / unit.siPerUnit) * factor) / factor;
}

/** Short words for each regime, as the choices read. */
export const REGIME_WORDS: Readonly<Record<BedRegime, string>> = {
  cycling: 'Cycles: floods, siphons, drains, again',
  'spill-stall': 'Stalls: trickles over the standpipe, never starts',
  'siphon-lock': 'Locks on: starts and never stops draining',
  flooded: 'Stays flooded',
  idle: 'Never fills to the standpipe',
};

/** A predicted or simulated answer in words: "7.9 min", "47.9 cm", a regime, or "no value". */
export function answerWords(question: Question, value: SimulatedValue, system: UnitSystem): string {
  if (value === null) return question.kind === 'bed-period' ? 'no full cycle' : 'no value';
  if (typeof value === 'string') return REGIME_WORDS[value];
  const unit = answerUnit(question, system);
  return unit ? `${fromSi(value, unit).toFixed(unit.decimals)} ${unit.label}` : String(value);
}

/** The band that counts as right, in words: "± 20 %" or "± 2.0 cm". */
export function toleranceWords(question: Question, system: UnitSystem): string {
  if (question.kind === 'bed-period') return `± ${Math.round(question.tolerance * 100)} %`;
  if (question.kind === 'vessel-low-level') {
    const unit = answerUnit(question, system) ?? CENTIMETRES;
    return `± ${fromSi(question.toleranceM, unit).toFixed(unit.decimals)} ${unit.label}`;
  }
  return 'the same regime';
}
