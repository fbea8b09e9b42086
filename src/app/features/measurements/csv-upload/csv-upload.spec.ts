import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import type { CsvPreview, Measurement } from '../../../../../shared/contracts/measurements';
import { CsvUpload } from './csv-upload';

const SYSTEM = '11111111-1111-4111-8111-111111111111';

const PREVIEW: CsvPreview = {
  columns: ['timestamp', 'level_mm'],
  headerLine: 2,
  delimiter: ',',
  rawRows: [['2024-05-31T10:00:00Z', '120']],
  options: {
    delimiter: 'auto',
    decimal: '.',
    hasHeader: true,
    time: { column: 'timestamp', format: 'auto', timeZone: 'UTC' },
    level: { kind: 'level', column: 'level_mm', unit: 'mm' },
    bed: 'bed-a',
  },
  timeFormat: 'iso',
  rows: [{ line: 3, time: '2024-05-31T10:00:00.000Z', t_s: 0, bed: 'bed-a', level_m: 0.12 }],
  acceptedCount: 1,
  rejected: [{ line: 4, reason: 'level "x" is not a number', raw: '2024-05-31T10:00:05Z,x' }],
  rejectedCount: 1,
  beds: [{ bed: 'bed-a', samples: 1, durationS: 0, minLevel_m: 0.12, maxLevel_m: 0.12 }],
  problem: null,
};

describe('CsvUpload', () => {
  it('previews a chosen file with guessed options, shows rejected rows, and saves with the options in the form', async () => {
    TestBed.configureTestingModule({
      providers: [provideHttpClient(), provideHttpClientTesting()],
    });
    const fixture = TestBed.createComponent(CsvUpload);
    fixture.componentRef.setInput('systemId', SYSTEM);
    fixture.componentRef.setInput('vessels', ['bed-a', 'tank']);
    const saved: Measurement[] = [];
    fixture.componentInstance.saved.subscribe((m) => saved.push(m));
    fixture.detectChanges();
    const http = TestBed.inject(HttpTestingController);
    const root = fixture.nativeElement as HTMLElement;

    const input = root.querySelector<HTMLInputElement>('input[type=file]');
    const file = new File(
      ['# logger\ntimestamp,level_mm\n2024-05-31T10:00:00Z,120\n'],
      'bench.csv',
      { type: 'text/csv' },
    );
    Object.defineProperty(input, 'files', { value: { item: () => file, length: 1 } });
    input?.dispatchEvent(new Event('change'));
    const preview = http.expectOne(`/api/systems/${SYSTEM}/measurements/preview`);
    const sent = preview.request.body as FormData;
    expect((sent.get('file') as File).name).toBe('bench.csv');
    expect(sent.has('options')).toBe(false);
    preview.flush(PREVIEW);
    await fixture.whenStable();
    fixture.detectChanges();
    expect(root.querySelector('table.preview-rows tbody tr')?.textContent).toContain('120 mm');
    expect(root.querySelector('table.rejected-rows')?.textContent).toContain(
      'level "x" is not a number',
    );

    root.querySelector<HTMLButtonElement>('button.save')?.click();
    const create = http.expectOne(`/api/systems/${SYSTEM}/measurements`);
    const options = JSON.parse(String((create.request.body as FormData).get('options'))) as Record<
      string,
      unknown
    >;
    expect(options).toMatchObject({
      name: 'bench',
      time: { column: 'timestamp' },
      level: { kind: 'level', column: 'level_mm', unit: 'mm' },
      bed: 'bed-a',
    });
    create.flush({
      id: '22222222-2222-4222-8222-222222222222',
      systemId: SYSTEM,
      kind: 'csv',
      name: 'bench',
      originalFilename: 'bench.csv',
      sizeBytes: 50,
      options: null,
      beds: [],
      startTime: null,
      rejectedCount: 1,
      stopwatch: null,
      createdBy: null,
      createdByName: null,
      createdAt: '2024-06-01T10:00:00.000Z',
    });
    await fixture.whenStable();
    expect(saved.map((m) => m.name)).toEqual(['bench']);
    http.verify();
  });
});
