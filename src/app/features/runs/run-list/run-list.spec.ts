import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import type { Run, RunListItem } from '../../../../../shared/contracts/runs';
import { RunList } from './run-list';

const SYSTEM = '11111111-1111-4111-8111-111111111111';
const RUN_A = '22222222-2222-4222-8222-222222222222';
const RUN_B = '33333333-3333-4333-8333-333333333333';

function item(id: string, durationS: number, createdAt: string): RunListItem {
  return {
    id,
    status: 'completed',
    progress: 1,
    durationS,
    systemVersion: 1,
    verdict: 'ok',
    error: null,
    createdBy: null,
    createdByName: null,
    createdAt,
    finishedAt: createdAt,
  };
}

function run(id: string): Run {
  return {
    ...item(id, 3600, '2026-01-01T10:00:00.000Z'),
    systemId: SYSTEM,
    summary: {
      beds: [
        {
          id: 'bed-a',
          cycles: 7,
          periodMean_s: 480,
          floodMean_s: 300,
          drainMean_s: 180,
          highLevel_m: 0.25,
          lowLevel_m: 0.02,
          state: 'cycling',
        },
        {
          id: 'bed-b',
          cycles: 5,
          periodMean_s: 720,
          floodMean_s: 500,
          drainMean_s: 220,
          highLevel_m: 0.25,
          lowLevel_m: 0.02,
          state: 'cycling',
        },
      ],
      vessels: [
        { id: 'tank', minLevel_m: 0.4572, minLevelAt_s: 60, maxLevel_m: 0.5, lost_m3: 0 },
        { id: 'bed-a', minLevel_m: 0, minLevelAt_s: 0, maxLevel_m: 0.25, lost_m3: 0 },
      ],
      pumps: [],
    },
    verdicts: [],
    events: [],
    eventCount: 0,
    stats: null,
    massBalanceError: 0,
    sampleCount: 10,
  };
}

async function render() {
  TestBed.configureTestingModule({
    providers: [provideRouter([]), provideHttpClient(), provideHttpClientTesting()],
  });
  const fixture = TestBed.createComponent(RunList);
  fixture.componentRef.setInput('id', SYSTEM);
  const http = TestBed.inject(HttpTestingController);
  const root = fixture.nativeElement as HTMLElement;
  return { fixture, http, root };
}

/** Answers the pending page request and the per-run reads, then lets the table render. */
async function answerPage(
  fixture: { whenStable(): Promise<unknown> },
  http: HttpTestingController,
  items: RunListItem[],
) {
  await fixture.whenStable();
  const request = http.expectOne((r) => r.url === `/api/systems/${SYSTEM}/runs`);
  request.flush({ items, total: items.length, page: 1, pageSize: 10 });
  await new Promise((resolve) => setTimeout(resolve));
  for (const entry of items) {
    for (const read of http.match(`/api/runs/${entry.id}`)) read.flush(run(entry.id));
  }
  await fixture.whenStable();
  return request.request.params;
}

describe('RunList', { timeout: 20_000 }, () => {
  it("asks for the newest runs first and shows each run's cycles, period and lowest tank level", async () => {
    const { fixture, http, root } = await render();
    const params = await answerPage(fixture, http, [item(RUN_A, 3600, '2026-01-01T10:00:00.000Z')]);
    expect(params.get('sort')).toBe('-createdAt');
    const cells = [...root.querySelectorAll('tbody tr td')].map((td) => td.textContent?.trim());
    expect(cells).toContain('12');
    expect(cells).toContain('10 min');
    expect(cells).toContain('0.457 m (tank)');
  });

  it('sorts by simulated time on the server, ascending then descending', async () => {
    const { fixture, http, root } = await render();
    await answerPage(fixture, http, [item(RUN_A, 3600, '2026-01-01T10:00:00.000Z')]);
    const header = [...root.querySelectorAll<HTMLElement>('th .mat-sort-header-container')].find(
      (h) => h.textContent?.includes('Simulated'),
    );
    if (!header) throw new Error('No sortable "Simulated" header.');
    header.click();
    const ascending = await answerPage(fixture, http, [
      item(RUN_A, 3600, '2026-01-01T10:00:00.000Z'),
    ]);
    expect(ascending.get('sort')).toBe('durationS');
    header.click();
    const descending = await answerPage(fixture, http, [
      item(RUN_A, 3600, '2026-01-01T10:00:00.000Z'),
    ]);
    expect(descending.get('sort')).toBe('-durationS');
    http.verify();
  });

  it('enables Compare once two runs are picked', async () => {
    const { fixture, http, root } = await render();
    await answerPage(fixture, http, [
      item(RUN_A, 3600, '2026-01-01T10:00:00.000Z'),
      item(RUN_B, 7200, '2026-01-02T10:00:00.000Z'),
    ]);
    const compare = [...root.querySelectorAll<HTMLButtonElement>('button')].find((b) =>
      b.textContent?.includes('Compare'),
    );
    expect(compare?.disabled).toBe(true);
    for (const box of root.querySelectorAll<HTMLInputElement>('tbody input[type=checkbox]'))
      box.click();
    await fixture.whenStable();
    expect(compare?.disabled).toBe(false);
  });
});
