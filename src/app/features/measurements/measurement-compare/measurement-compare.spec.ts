import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import type { MeasurementComparison } from '../../../../../shared/contracts/measurements';
import { MeasurementCompare } from './measurement-compare';

const SYSTEM = '11111111-1111-4111-8111-111111111111';
const MEASUREMENT = '22222222-2222-4222-8222-222222222222';
const RUN = '33333333-3333-4333-8333-333333333333';

const COMPARISON: MeasurementComparison = {
  measurementId: MEASUREMENT,
  runId: RUN,
  bed: 'bed-a',
  beds: ['bed-a'],
  offsetS: 44.6,
  measured: {
    cycles: 4,
    periodS: 562,
    floodS: 214,
    drainS: 348,
    highLevelM: 0.269,
    lowLevelM: 0.025,
  },
  simulated: {
    cycles: 6,
    periodS: 472,
    floodS: 238,
    drainS: 234,
    highLevelM: 0.278,
    lowLevelM: 0.025,
  },
  rows: [
    {
      metric: 'period',
      unit: 's',
      measured: 562,
      simulated: 472,
      difference: -90,
      relative: -0.16,
    },
    {
      metric: 'drain',
      unit: 's',
      measured: 348,
      simulated: 234,
      difference: -114,
      relative: -0.3276,
    },
  ],
  measuredSeries: { t_s: [50, 100, 150], level_m: [0.1, 0.2, 0.26] },
  simulatedSeries: { t_s: [0, 60, 120, 180], level_m: [0, 0.1, 0.2, 0.27] },
};

describe('MeasurementCompare', () => {
  it('asks for the comparison with the run from the query and draws measured over simulated', async () => {
    TestBed.configureTestingModule({
      providers: [provideRouter([]), provideHttpClient(), provideHttpClientTesting()],
    });
    const fixture = TestBed.createComponent(MeasurementCompare);
    fixture.componentRef.setInput('systemId', SYSTEM);
    fixture.componentRef.setInput('measurementId', MEASUREMENT);
    fixture.componentRef.setInput('run', RUN);
    fixture.detectChanges();
    const http = TestBed.inject(HttpTestingController);
    http
      .expectOne((r) => r.url === `/api/systems/${SYSTEM}/runs`)
      .flush({ items: [], total: 0, page: 1, pageSize: 20 });
    const compare = http.expectOne((r) => r.url === `/api/measurements/${MEASUREMENT}/compare`);
    expect(compare.request.params.get('run')).toBe(RUN);
    expect(compare.request.params.has('bed')).toBe(false);
    compare.flush(COMPARISON);
    await new Promise((resolve) => setTimeout(resolve));
    await fixture.whenStable();
    fixture.detectChanges();
    const root = fixture.nativeElement as HTMLElement;
    const rows = [...root.querySelectorAll('table.comparison tbody tr')].map((tr) =>
      [...tr.querySelectorAll('td')].map((td) => td.textContent?.trim()),
    );
    expect(rows[1]).toEqual([
      'Drain time',
      expect.stringMatching(/348 s|5\.8\d? min/),
      expect.stringMatching(/234 s|3\.9\d? min/),
      expect.stringMatching(/^−.*\(−32\.8 %\)$/),
    ]);
    expect(root.querySelector('path[data-line="data:level"]')?.getAttribute('d')).toMatch(/^M/);
    expect(
      root.querySelector('path[data-line="overlay:level"]')?.getAttribute('stroke-dasharray'),
    ).toBe('6 4');
    expect(root.textContent).toContain('shifted by');
    http.verify();
  });
});
