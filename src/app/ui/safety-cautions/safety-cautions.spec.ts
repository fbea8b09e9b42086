import { TestBed } from '@angular/core/testing';
import { SafetyCautions } from './safety-cautions';

async function render(topics?: readonly string[]): Promise<HTMLElement> {
  const fixture = TestBed.createComponent(SafetyCautions);
  if (topics) fixture.componentRef.setInput('topics', topics);
  await fixture.whenStable();
  return fixture.nativeElement as HTMLElement;
}

describe('SafetyCautions', () => {
  it('lists every caution by default and defers to local codes and licensed trades', async () => {
    const root = await render();
    const topics = [...root.querySelectorAll('li')].map((item) => item.dataset['topic']);
    expect(topics).toEqual(['electrical', 'open-water', 'heavy-beds', 'aeration', 'temperature']);
    const text = root.textContent ?? '';
    expect(text).toContain('GFCI or RCD');
    expect(text).toContain('licensed electrician');
  });

  it('shows only the topics asked for, in the usual order', async () => {
    const root = await render(['aeration', 'electrical']);
    const topics = [...root.querySelectorAll('li')].map((item) => item.dataset['topic']);
    expect(topics).toEqual(['electrical', 'aeration']);
  });
});
