import type { BedRegime, Question, QuestionInput } from '../../../../../shared/contracts/classroom';
import type { UnitSystem } from '../../../../../shared/scenario';

/** The kinds of question an instructor can ask, with the words the editor shows. */
export const QUESTION_KINDS = [
  {
    kind: 'bed-regime',
    label: 'Will this bed’s siphon start and stop?',
    target: 'bed',
    prompt: 'Will the siphon of this bed start, and will it stop again?',
  },
  {
    kind: 'bed-period',
    label: 'Predict the cycle period',
    target: 'bed',
    prompt: 'How long is one flood-and-drain cycle of this bed?',
  },
  {
    kind: 'vessel-low-level',
    label: 'How low will the tank or sump go?',
    target: 'store',
    prompt: 'How low will the water in this tank go?',
  },
] as const;

/** A question kind. */
export type QuestionKind = (typeof QUESTION_KINDS)[number]['kind'];

/** A question as the editor holds it: plain strings and numbers from the form. */
export interface QuestionDraft {
  /** The id of a question the lesson already has; '' for a new one. */
  id: string;
  kind: QuestionKind;
  prompt: string;
  explanation: string;
  /** A bed id, or a tank or sump id. */
  target: string;
  /** Periods: percent either side. Levels: cm (metric) or in (US) either side. */
  tolerance: number;
}

/** The regimes offered by a new regime question. */
const REGIME_CHOICES: BedRegime[] = ['cycling', 'spill-stall', 'siphon-lock'];

/** Metres per unit of a level tolerance in the editor: cm (metric) or in (US). */
const levelUnitM = (system: UnitSystem): number => (system === 'us' ? 0.0254 : 0.01);

/**
 * The editor's drafts as the API's questions; tolerances in SI. A draft keeps its question's id
 * (answers and reports refer to it) and a regime question the choices it offered; a new one gets
 * the first free id of q1, q2… and all three regimes.
 */
export function toQuestions(
  drafts: readonly QuestionDraft[],
  system: UnitSystem,
  previous: readonly Question[] = [],
): QuestionInput[] {
  const ids = freshIds(drafts);
  return drafts.map((draft, index): QuestionInput => {
    const base = {
      id: ids[index] ?? draft.id,
      prompt: draft.prompt.trim(),
      explanation: draft.explanation.trim(),
    };
    switch (draft.kind) {
      case 'bed-regime': {
        const before = previous.find((q) => q.id === draft.id && q.kind === 'bed-regime');
        const choices = before?.kind === 'bed-regime' ? before.choices : REGIME_CHOICES;
        return { ...base, kind: 'bed-regime', bedId: draft.target, choices };
      }
      case 'bed-period':
        return {
          ...base,
          kind: 'bed-period',
          bedId: draft.target,
          tolerance: draft.tolerance / 100,
        };
      case 'vessel-low-level':
        return {
          ...base,
          kind: 'vessel-low-level',
          vesselId: draft.target,
          toleranceM: draft.tolerance * levelUnitM(system),
        };
    }
  });
}

/** Each draft's id: its own, or for a new draft the first `q<n>` no other draft uses. */
function freshIds(drafts: readonly QuestionDraft[]): string[] {
  const taken = new Set(drafts.map((draft) => draft.id).filter((id) => id !== ''));
  let next = 1;
  return drafts.map((draft) => {
    if (draft.id !== '') return draft.id;
    while (taken.has(`q${next}`)) next += 1;
    taken.add(`q${next}`);
    return `q${next}`;
  });
}

/**
 * A lesson's questions as editor drafts in the editor's units: a period tolerance in percent, a
 * level tolerance in cm or in (to 3 decimals, as a person types it).
 */
export function toDrafts(questions: readonly Question[], system: UnitSystem): QuestionDraft[] {
  return questions.map((question): QuestionDraft => {
    const base = { id: question.id, prompt: question.prompt, explanation: question.explanation };
    switch (question.kind) {
      case 'bed-regime':
        return { ...base, kind: question.kind, target: question.bedId, tolerance: 0 };
      case 'bed-period':
        return {
          ...base,
          kind: question.kind,
          target: question.bedId,
          tolerance: roundTo3(question.tolerance * 100),
        };
      case 'vessel-low-level':
        return {
          ...base,
          kind: question.kind,
          target: question.vesselId,
          tolerance: roundTo3(question.toleranceM / levelUnitM(system)),
        };
    }
  });
}

const roundTo3 = (value: number): number => Math.round(value * 1000) / 1000;

/** The starting tolerance of a kind in the editor's units: 20 %, or 2 cm / 1 in. */
export function defaultTolerance(kind: QuestionKind, system: UnitSystem): number {
  if (kind === 'bed-period') return 20;
  if (kind === 'vessel-low-level') return system === 'us' ? 1 : 2;
  return 0;
}
