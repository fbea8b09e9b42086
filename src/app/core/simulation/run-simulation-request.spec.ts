import { parseScenario } from '../../../../shared/scenario';
import { EXAMPLE_TWO_BED_SCENARIO } from '../../features/systems/example-two-bed-scenario';
import { runSimulationRequest } from './run-simulation-request';
import type { SimulationDone, SimulationReply } from './simulation-messages';

function exampleScenario() {
  const parsed = parseScenario(EXAMPLE_TWO_BED_SCENARIO);
  if (!parsed.success) throw new Error('The example scenario is invalid.');
  return parsed.scenario;
}

describe('runSimulationRequest', () => {
  it('runs the engine to the asked duration, reports progress, then one answer', () => {
    const replies: SimulationReply[] = [];
    let clockMs = 0;
    runSimulationRequest(
      {
        requestId: 7,
        scenario: exampleScenario(),
        durationS: 300,
        budgetMs: null,
        maxSamples: 200,
      },
      (reply) => replies.push(reply),
      () => (clockMs += 1),
    );
    const last = replies[replies.length - 1] as SimulationDone;
    expect(last.kind).toBe('done');
    expect(last.requestId).toBe(7);
    expect(last.status).toBe('completed');
    expect(last.reachedS).toBeCloseTo(300, 6);
    expect(last.result.summary.beds.map((b) => b.id)).toEqual(['bed-a', 'bed-b']);
    expect(replies.filter((r) => r.kind === 'progress').length).toBeGreaterThan(0);
    expect(replies.filter((r) => r.kind === 'done').length).toBe(1);
  });

  it('stops on its wall-time budget and says so, keeping the partial result', () => {
    const replies: SimulationReply[] = [];
    let clockMs = 0;
    // Each clock read advances 10 ms, so a 50 ms budget ends the run after a few steps.
    runSimulationRequest(
      { requestId: 1, scenario: exampleScenario(), durationS: 3600, budgetMs: 50, maxSamples: 200 },
      (reply) => replies.push(reply),
      () => (clockMs += 10),
    );
    const last = replies[replies.length - 1] as SimulationDone;
    expect(last.status).toBe('stopped');
    expect(last.stoppedByBudget).toBe(true);
    expect(last.reachedS).toBeLessThan(3600);
  });
});
