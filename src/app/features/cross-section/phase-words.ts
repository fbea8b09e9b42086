import type { BedPhase } from './bed-phase';

/** How a phase is named and shown: a word, a sentence for newcomers and an icon (not colour alone). */
export interface PhaseWords {
  readonly label: string;
  readonly sentence: string;
  readonly icon: string;
}

/** Our words for each phase of a flood-and-drain bed. */
export const PHASE_WORDS: Readonly<Record<BedPhase, PhaseWords>> = {
  filling: {
    label: 'filling',
    sentence: 'Water climbs through the media; nothing leaves the bed yet.',
    icon: 'arrow_upward',
  },
  spilling: {
    label: 'spilling',
    sentence: 'Water pours over the standpipe top and falls down the drain as a thin film.',
    icon: 'water_drop',
  },
  priming: {
    label: 'priming',
    sentence: 'The falling water seals the drain and drags the air out of the bell.',
    icon: 'hourglass_top',
  },
  siphoning: {
    label: 'siphoning',
    sentence: 'The drain runs full bore and pulls the bed down fast.',
    icon: 'arrow_downward',
  },
  break: {
    label: 'siphon break',
    sentence: 'The level reached the slots: air rushes into the bell and the siphon lets go.',
    icon: 'air',
  },
};
