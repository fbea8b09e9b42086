import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import type { SystemListItem } from '../../../../../shared/contracts/systems';
import { SystemList } from './system-list';

const pause = (ms = 0) => new Promise((resolve) => setTimeout(resolve, ms));

function row(
  id: string,
  name: string,
  updatedAt: string,
  extra: Partial<SystemListItem> = {},
): SystemListItem {
  return {
    id,
    name,
    bedsCount: 3,
    pumpsCount: 1,
    pumpSummary: '1 pump',
    pumpsMaxFlowM3PerS: 2000 / 3.6e6,
    lastVerdict: 'ok',
    ownerName: 'Dana Demo',
    access: 'owner',
    updatedAt,
    ...extra,
  };
}

const ROWS = [
  row('55555555-5555-4555-8555-555555555551', 'Greenhouse', '2026-01-02T10:00:00.000Z'),
  row('55555555-5555-4555-8555-555555555552', 'Tabletop', '2026-01-03T10:00:00.000Z', {
    bedsCount: 1,
    lastVerdict: null,
    access: 'viewer',
    ownerName: 'Theo Teacher',
  }),
];

async function render() {
  TestBed.configureTestingModule({
    providers: [provideRouter([]), provideHttpClient(), provideHttpClientTesting()],
  });
  const fixture = TestBed.createComponent(SystemList);
  const http = TestBed.inject(HttpTestingController);
  http.expectOne('/api/systems').flush({ items: ROWS });
  await pause();
  await fixture.whenStable();
  return { fixture, http, root: fixture.nativeElement as HTMLElement };
}

const names = (root: HTMLElement) =>
  [...root.querySelectorAll('tbody a.name')].map((a) => a.textContent?.trim());

describe('SystemList', { timeout: 20_000 }, () => {
  it('lists my systems and shared ones, newest first, with beds, pump flow and last verdict', async () => {
    const { root } = await render();
    expect(names(root)).toEqual(['Tabletop', 'Greenhouse']);
    const text = root.querySelector('tbody')?.textContent ?? '';
    expect(text).toContain('shared by Theo Teacher (viewer)');
    expect(text).toContain('1 pump, up to 33.3 L/min');
    expect(text).toContain('All checks pass');
    expect(text).toContain('Not run yet');
  });

  it('filters by name', async () => {
    const { fixture, root } = await render();
    const filter = root.querySelector<HTMLInputElement>('.filter input');
    if (!filter) throw new Error('No filter field.');
    filter.value = 'green';
    filter.dispatchEvent(new Event('input'));
    await fixture.whenStable();
    expect(names(root)).toEqual(['Greenhouse']);
  });

  it('sorts by name when the header is clicked', async () => {
    const { fixture, root } = await render();
    const header = [...root.querySelectorAll<HTMLElement>('th .mat-sort-header-container')].find(
      (h) => h.textContent?.includes('Name'),
    );
    header?.click();
    await fixture.whenStable();
    expect(names(root)).toEqual(['Greenhouse', 'Tabletop']);
  });

  it('lists each problem of a refused scenario file by field', async () => {
    const { fixture, http, root } = await render();
    const input = root.querySelector<HTMLInputElement>('input[type=file]');
    if (!input) throw new Error('No file input.');
    const file = new File(['{"format":"scenario/1"}'], 'bad.json', { type: 'application/json' });
    Object.defineProperty(input, 'files', { value: [file] });
    input.dispatchEvent(new Event('change'));
    await pause(20);
    http.expectOne({ method: 'POST', url: '/api/systems/import' }).flush(
      {
        error: {
          code: 'VALIDATION_FAILED',
          message: 'The scenario file has problems.',
          fields: [{ path: 'vessels', message: 'A scenario needs at least one vessel.' }],
        },
      },
      { status: 400, statusText: 'Bad Request' },
    );
    await pause();
    await fixture.whenStable();
    const problem = root.querySelector('.import-problem')?.textContent ?? '';
    expect(problem).toContain('bad.json was not imported');
    expect(problem).toContain('vessels: A scenario needs at least one vessel.');
  });

  it('deletes a system only after the person confirms', async () => {
    const { fixture, http, root } = await render();
    const menuButton = root.querySelector<HTMLButtonElement>(
      'button[aria-label="Actions for Greenhouse"]',
    );
    menuButton?.click();
    await fixture.whenStable();
    const deleteItem = [
      ...document.querySelectorAll<HTMLButtonElement>('.mat-mdc-menu-panel button'),
    ].find((b) => b.textContent?.includes('Delete'));
    deleteItem?.click();
    await pause(50);
    await fixture.whenStable();
    const dialog = document.querySelector('mat-dialog-container');
    expect(dialog?.textContent).toContain('Delete "Greenhouse"?');
    http.expectNone({ method: 'DELETE' });
    const confirm = dialog?.querySelector<HTMLButtonElement>('button.confirm');
    confirm?.click();
    await fixture.whenStable();
    await pause(300);
    http
      .expectOne({ method: 'DELETE', url: `/api/systems/${ROWS[0]?.id}` })
      .flush(null, { status: 204, statusText: 'No Content' });
    await pause();
    http.expectOne('/api/systems').flush({ items: [ROWS[1]] });
    await pause();
    await fixture.whenStable();
    expect(names(root)).toEqual(['Tabletop']);
  });
});
