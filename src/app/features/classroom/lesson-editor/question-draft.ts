import type { BedRegime, QuestionInput } from '../../../../../shared/contracts/classroom';
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

/** The editor's drafts as the API's questions, numbered q1, q2…; tolerances in SI. */
export function toQuestions(drafts: readonly QuestionDraft[], system: UnitSystem): QuestionInput[] {
  return drafts.map((draft, index): QuestionInput => {
    const base = {
      id: `q${index + 1}`,
      prompt: draft.prompt.trim(),
      explanation: draft.explanation.trim(),
    };
    switch (draft.kind) {
      case 'bed-regime':
        return { ...base, kind: 'bed-regime', bedId: draft.target, choices: REGIME_CHOICES };
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
          toleranceM: draft.tolerance * (system === 'us' ? 0.0254 : 0.01),
        };
    }
  });
}

/** The starting tolerance of a kind in the editor's units: 20 %, or 2 cm / 1 in. */
export function defaultTolerance(kind: QuestionKind, system: UnitSystem): number {
  if (kind === 'bed-period') return 20;
  if (kind === 'vessel-low-level') return system === 'us' ? 1 : 2;
  return 0;
}
