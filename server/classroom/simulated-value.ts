/** The value a lesson question asks about, read from a simulation of the lesson's system. */
import type { LessonSimulation, Question, SimulatedValue } from '../../shared/contracts/classroom';

/**
 * The simulated answer to `question`: a bed's mean cycle period (s) or its regime, or a vessel's
 * lowest level (m above its floor). Null when the run has no such figure (e.g. a bed that never
 * completed a cycle has no period).
 */
export function simulatedValue(
  question: Question,
  simulation: Pick<LessonSimulation, 'beds' | 'vessels'>,
): SimulatedValue {
  switch (question.kind) {
    case 'bed-period':
      return simulation.beds.find((bed) => bed.id === question.bedId)?.periodMean_s ?? null;
    case 'bed-regime':
      return simulation.beds.find((bed) => bed.id === question.bedId)?.state ?? null;
    case 'vessel-low-level':
      return (
        simulation.vessels.find((vessel) => vessel.id === question.vesselId)?.minLevel_m ?? null
      );
  }
}
