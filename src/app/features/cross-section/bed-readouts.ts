import { type UnitSystem, formatQuantity } from '../../../../shared/scenario';
import type { BedPhaseReading } from './bed-phase';
import type { CrossSectionScene } from './cross-section-scene';
import { PHASE_WORDS } from './phase-words';
import type { PumpState } from './pump-state';
import type { SceneSampler } from './scene-sampler';

/** One bed at one time, in words: its phase, level and, while spilling, its spill number. */
export interface BedReadout {
  readonly id: string;
  readonly reading: BedPhaseReading;
  readonly label: string;
  readonly icon: string;
  readonly sentence: string;
  readonly level: string;
  /** "0.42 of 0.70 to prime" while spilling, else null. */
  readonly spill: string | null;
  /** Spill number over the priming coefficient (0–1) while spilling, else null. */
  readonly spillShare: number | null;
}

/** The whole system at one time, as text: beds, every vessel's level and each pump. */
export interface Readouts {
  readonly beds: readonly BedReadout[];
  readonly levels: readonly { readonly id: string; readonly text: string }[];
  readonly pumps: readonly { readonly id: string; readonly state: PumpState }[];
}

/** Reads the scene at `timeS` into plain text for the bed cards and the text alternative. */
export function bedReadouts(
  scene: CrossSectionScene,
  sampler: SceneSampler,
  timeS: number,
  system: UnitSystem,
): Readouts {
  const state = sampler.sample(timeS);
  const level = (i: number): string => {
    const value = state.levelsM[i] ?? Number.NaN;
    return Number.isFinite(value) ? formatQuantity(value, 'length', system) : '–';
  };
  const beds = scene.beds.map((bed, i): BedReadout => {
    const reading = state.phases[i] ?? { phase: 'filling', sinceS: Infinity };
    const words = PHASE_WORDS[reading.phase];
    const number = state.spillNumbers[i] ?? Number.NaN;
    const kp = bed.drain.type === 'bell-siphon' ? bed.drain.primingCoefficient : Number.NaN;
    const spilling = Number.isFinite(number) && Number.isFinite(kp);
    return {
      id: bed.id,
      reading: { ...reading },
      label: words.label,
      icon: words.icon,
      sentence: words.sentence,
      level: level(scene.vessels.findIndex((v) => v.id === bed.id)),
      spill: spilling ? `${number.toFixed(2)} of ${kp.toFixed(2)} to prime` : null,
      spillShare: spilling ? Math.min(1, Math.max(0, number / kp)) : null,
    };
  });
  return {
    beds,
    levels: scene.vessels.map((v, i) => ({ id: v.id, text: level(i) })),
    pumps: scene.pumps.map((p, i) => ({ id: p.id, state: state.pumps[i] ?? 'off' })),
  };
}
