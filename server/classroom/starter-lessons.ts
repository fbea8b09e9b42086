/**
 * The three starter lessons of the demo: each an example system from `scenarios/` (sometimes with
 * a run setting or a power cut added) and questions written for it. The explanations describe the
 * physics of the engine's model; the figures in them are this model's results for these systems,
 * rounded, not measurements.
 */
import type { QuestionInput } from '../../shared/contracts/classroom';
import { readExampleScenario } from '../systems/system-templates';

/** A starter lesson: words, the example file it copies, changes to that copy, and questions. */
export interface StarterLesson {
  title: string;
  introduction: string;
  scenarioFile: string;
  /** Top-level scenario fields replaced in the copy (run length, a schedule). */
  changes: Record<string, unknown>;
  questions: QuestionInput[];
}

/** What sets the siphon's start: a wide standpipe on a small pump stalls. */
const SIPHON_START: StarterLesson = {
  title: "What sets the siphon's start",
  introduction: [
    'A bell siphon only starts when the water spilling over the standpipe rim falls fast enough to fill the drain pipe and carry the air out of the bell.',
    'This bed has a 1½-inch standpipe, fed by a small pump. Look at the drawing, then predict what the bed will do over three hours.',
  ].join('\n\n'),
  scenarioFile: 'stalling-siphon.json',
  changes: {},
  questions: [
    {
      kind: 'bed-regime',
      id: 'start',
      prompt: 'Will this siphon start, and will the bed flood and drain?',
      bedId: 'bed',
      explanation:
        'It stalls. The spill has to reach the priming flow, which grows with the standpipe bore to the power 5/2 (k_p·√(g·D⁵)). For a 1½-inch bore that is about 45 L/min in this model, while the pump sends about 15 L/min, so the water trickles over the rim forever at flood level. A narrower standpipe or a bigger inflow cures it.',
    },
    {
      kind: 'vessel-low-level',
      id: 'tank-low',
      prompt: 'How low will the fish tank go while the bed fills?',
      vesselId: 'tank',
      toleranceM: 0.02,
      explanation:
        'The tank gives up the water that fills the bed to its flood level and then holds steady, because the bed never drains back: the stalled bed keeps its water.',
    },
  ],
};

/** Why a siphon locks on: a strong pump on a small, long drain. */
const SIPHON_LOCK: StarterLesson = {
  title: 'Why a siphon locks on',
  introduction: [
    'Once a bell siphon runs full bore it drains the bed until the level falls to the bell’s intake slots and air breaks the siphon.',
    'This bed has a ¾-inch siphon draining through a long pipe with several bends, and a strong pump. Predict what happens once the siphon starts.',
  ].join('\n\n'),
  scenarioFile: 'locking-siphon.json',
  changes: {},
  questions: [
    {
      kind: 'bed-regime',
      id: 'lock',
      prompt: 'Once the siphon starts, will it stop again?',
      bedId: 'bed',
      explanation:
        'It locks on. Near the break level the siphon can only carry what the head and the pipe losses allow: in this model about 17 L/min through the long, bent ¾-inch drain. The pump keeps putting in about 22 L/min, so the level never falls to the slots and air never gets in. Less inflow, a shorter or wider drain, or higher slots cure it.',
    },
    {
      kind: 'vessel-low-level',
      id: 'tank-low',
      prompt: 'How low will the fish tank go?',
      vesselId: 'tank',
      toleranceM: 0.02,
      explanation:
        'The tank drops while the bed first fills, then settles: with the siphon locked, what the pump takes out comes straight back down the drain.',
    },
  ],
};

/** Why sumps need reserve: the greenhouse, with a half-hour power cut. */
const SUMP_RESERVE: StarterLesson = {
  title: 'Why sumps need reserve',
  introduction: [
    'In the community greenhouse one pump in the sump feeds the fish tank and three beds; the tank overflows back into the sump and the beds drain into it.',
    'Over three hours the power fails at the first hour for thirty minutes. Predict how the water moves between the sump, the tank and the beds.',
  ].join('\n\n'),
  scenarioFile: 'greenhouse-three-beds.json',
  changes: {
    run: { duration: '3 h', outputInterval: '10 s' },
    schedule: [
      { at: '1 h', power: 'off' },
      { at: '1.5 h', power: 'on' },
    ],
  },
  questions: [
    {
      kind: 'vessel-low-level',
      id: 'sump-low',
      prompt: 'How low will the sump go?',
      vesselId: 'sump',
      toleranceM: 0.03,
      explanation:
        'Whenever the beds fill, their water comes out of the sump; when they all fill together, as after the power returns, the sump drops by the most. In this model it falls about 30 cm, to within a few centimetres of the pump intake. That swing is the reserve a sump must hold above its intake.',
    },
    {
      kind: 'vessel-low-level',
      id: 'tank-low',
      prompt: 'How low will the fish tank go in the power cut?',
      vesselId: 'tank',
      toleranceM: 0.02,
      explanation:
        'It does not drop. The tank only loses water over its overflow into the sump, so when the pump stops the overflow simply stops too; the fish keep their water, and the sump takes the whole swing.',
    },
    {
      kind: 'bed-regime',
      id: 'south-regime',
      prompt: 'Does the small south bed keep cycling through all this?',
      bedId: 'bed-south',
      explanation:
        'Yes: after the cut its siphon breaks as usual, the bed drains, and it starts again when the pump returns.',
    },
  ],
};

/** The starter lessons, in the order a class meets them. */
export const STARTER_LESSONS: readonly StarterLesson[] = [SIPHON_START, SIPHON_LOCK, SUMP_RESERVE];

/** The scenario document of a starter lesson: a fresh copy of its example file with its changes. */
export function starterScenario(lesson: StarterLesson): Record<string, unknown> {
  return { ...readExampleScenario(lesson.scenarioFile), ...structuredClone(lesson.changes) };
}
