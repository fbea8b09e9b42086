import { describe, expect, it } from 'vitest';
import { simulate } from '../../engine/index';
import { parseScenario } from '../../shared/scenario/index';
import { STARTER_LESSONS, starterScenario } from './starter-lessons';

/** Runs a starter lesson's system with the engine, as a lesson run does. */
function run(title: string) {
  const starter = STARTER_LESSONS.find((s) => s.title === title);
  if (!starter) throw new Error(`No starter lesson "${title}".`);
  const parsed = parseScenario(starterScenario(starter));
  if (!parsed.success) throw new Error(JSON.stringify(parsed.issues));
  const { run: settings } = parsed.scenario;
  const outcome = simulate(parsed.scenario, {
    durationS: settings.duration,
    outputIntervalS: settings.outputInterval,
    maxSamples: 100_000,
  });
  expect(outcome.status).toBe('completed');
  return {
    scenario: parsed.scenario,
    summary: outcome.result.summary.beds,
    vessels: outcome.result.summary.vessels,
  };
}

// The explanations of the starter lessons state what the model does; these checks keep them true.
describe('the starter lessons tell what the engine computes', () => {
  it('stalls the wide standpipe on the small pump, and the tank then holds steady', () => {
    const { summary, vessels } = run("What sets the siphon's start");
    expect(summary.find((b) => b.id === 'bed')?.state).toBe('spill-stall');
    expect(vessels.find((v) => v.id === 'tank')?.minLevel_m).toBeLessThan(0.5);
  });

  it('locks the siphon on the long narrow drain', () => {
    const { summary } = run('Why a siphon locks on');
    expect(summary.find((b) => b.id === 'bed')?.state).toBe('siphon-lock');
  });

  it('swings the greenhouse sump by more than 20 cm but keeps it above the intake, and the tank does not drop', () => {
    const { scenario, summary, vessels } = run('Why sumps need reserve');
    const sump = scenario.vessels.find((v) => v.id === 'sump');
    const intake = scenario.pumps[0]?.intakeHeight ?? Number.NaN;
    const sumpLow = vessels.find((v) => v.id === 'sump')?.minLevel_m ?? Number.NaN;
    expect((sump?.initialLevel ?? 0) - sumpLow).toBeGreaterThan(0.2);
    expect(sumpLow).toBeGreaterThan(intake);
    expect(vessels.find((v) => v.id === 'tank')?.minLevel_m).toBeCloseTo(
      scenario.vessels.find((v) => v.id === 'tank')?.initialLevel ?? 0,
      3,
    );
    expect(summary.find((b) => b.id === 'bed-south')?.state).toBe('cycling');
  });
});
