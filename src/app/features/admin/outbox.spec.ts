import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import type { OutboxList } from '../../../../shared/contracts/admin';
import { Outbox } from './outbox';

const settle = () => new Promise((resolve) => setTimeout(resolve));

describe('Outbox', () => {
  it('lists messages newest first with their links clickable and no HTML rendered', async () => {
    TestBed.configureTestingModule({
      imports: [Outbox],
      providers: [provideHttpClient(), provideHttpClientTesting()],
    });
    const fixture = TestBed.createComponent(Outbox);
    const body: OutboxList = {
      messages: [
        {
          id: 'm2',
          from: 'no-reply@localhost',
          to: ['grower@example.org'],
          subject: 'Reset your Tidewright password',
          text: 'Open this link: http://localhost:3000/reset-password?token=abc <b>not bold</b>',
          receivedAt: '2026-03-01T10:00:00.000Z',
        },
        {
          id: 'm1',
          from: 'no-reply@localhost',
          to: ['a@example.org'],
          subject: 'Older',
          text: 'Hello',
          receivedAt: '2026-02-01T10:00:00.000Z',
        },
      ],
    };
    TestBed.inject(HttpTestingController).expectOne('/api/admin/outbox').flush(body);
    await settle();
    await fixture.whenStable();
    const root = fixture.nativeElement as HTMLElement;
    expect([...root.querySelectorAll('mat-panel-title')].map((t) => t.textContent?.trim())).toEqual(
      ['Reset your Tidewright password', 'Older'],
    );
    const links = [...root.querySelectorAll('pre a')];
    expect(links.map((a) => a.getAttribute('href'))).toEqual([
      'http://localhost:3000/reset-password?token=abc',
    ]);
    expect(root.querySelector('pre b')).toBeNull();
    expect(root.querySelector('pre')?.textContent).toContain('<b>not bold</b>');
  });
});
