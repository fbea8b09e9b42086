import { TestBed } from '@angular/core/testing';
import { parseScenario } from '../../../../../shared/scenario';
import type { SimulationDone } from '../../../core/simulation/simulation-messages';
import { EXAMPLE_TWO_BED_SCENARIO } from '../example-two-bed-scenario';
import { LiveVerdict } from './live-verdict';

function answer(tankLowestM: number): SimulationDone {
  return {
    kind: 'done',
    requestId: 1,
    status: 'completed',
    reason: null,
    stoppedByBudget: true,
    reachedS: 2520,
    wallMs: 700,
    result: {
      summary: {
        beds: [
          {
            id: 'bed-a',
            cycles: 4,
            periodMean_s: 540,
            periodMin_s: 530,
            periodMax_s: 550,
            floodMean_s: 400,
            drainMean_s: 140,
            highLevel_m: 0.25,
            lowLevel_m: 0.02,
            fractionFlooded: 0.3,
            state: 'cycling',
          },
          {
            id: 'bed-b',
            cycles: 0,
            periodMean_s: null,
            periodMin_s: null,
            periodMax_s: null,
            floodMean_s: null,
            drainMean_s: null,
            highLevel_m: null,
            lowLevel_m: null,
            fractionFlooded: 0.9,
            state: 'siphon-lock',
          },
        ],
        vessels: [
          {
            id: 'tank',
            minLevel_m: tankLowestM,
            minLevelAt_s: 600,
            maxLevel_m: 0.55,
            maxLevelAt_s: 0,
            lost_m3: 0,
          },
        ],
        pumps: [],
      },
      events: [],
      verdicts: [
        {
          check: 'tank: stays above its fish-safe minimum level (m)',
          status: tankLowestM < 0.4 ? 'fails' : 'ok',
          value: tankLowestM,
          limit: 0.4,
          source: 'common practice',
        },
      ],
      massBalanceError: 0,
      stats: {
        steps: 10,
        rejected: 0,
        rhsEvaluations: 60,
        events: 0,
        wall_ms: 700,
        eventsOmitted: 0,
        simulated_s: 2520,
      },
      series: { t_s: [], channels: [] },
    },
  };
}

async function render(inputs: Record<string, unknown>) {
  const parsed = parseScenario(EXAMPLE_TWO_BED_SCENARIO);
  if (!parsed.success) throw new Error('The example scenario is invalid.');
  const fixture = TestBed.createComponent(LiveVerdict);
  fixture.componentRef.setInput('scenario', parsed.scenario);
  for (const [name, value] of Object.entries(inputs)) fixture.componentRef.setInput(name, value);
  await fixture.whenStable();
  return { fixture, root: fixture.nativeElement as HTMLElement };
}

describe('LiveVerdict', () => {
  it("says how each bed behaves, how low the tank falls and what fails, in the reader's units", async () => {
    const { root } = await render({ answer: answer(0.35), system: 'us' });
    const beds = [...root.querySelectorAll('ul.beds li')].map((li) => li.textContent?.trim());
    expect(beds).toEqual([
      'bed-a floods and drains every 9 min (4 cycles).',
      "bed-b's siphon never breaks: the inflow keeps it draining without stop.",
    ]);
    expect(root.querySelector('ul.levels')?.textContent).toContain('tank falls to 13.8 in');
    expect(root.querySelector('ul.levels li')?.classList.contains('below')).toBe(true);
    expect(root.querySelector('.headline')?.textContent).toContain('Fails a check');
    expect(root.querySelector('.coverage')?.textContent).toContain(
      'first 42 min simulated in 0.70 s, stopped early',
    );
  });

  it('asks for the listed problems to be fixed instead of showing stale results', async () => {
    const { root } = await render({ answer: answer(0.45), issueCount: 2 });
    expect(root.textContent).toContain('Fix the 2 problems listed to see live results.');
    expect(root.querySelector('ul.beds')).toBeNull();
  });

  it('offers Cancel while the whole duration runs', async () => {
    const { fixture, root } = await render({
      answer: answer(0.45),
      wholeBusy: true,
      busy: true,
      progress: 0.4,
    });
    let cancelled = 0;
    fixture.componentInstance.cancelWhole.subscribe(() => cancelled++);
    const cancel = [...root.querySelectorAll<HTMLButtonElement>('button')].find((b) =>
      b.textContent?.includes('Cancel'),
    );
    cancel?.click();
    expect(cancelled).toBe(1);
  });
});
