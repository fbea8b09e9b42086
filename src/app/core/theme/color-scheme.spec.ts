import { TestBed } from '@angular/core/testing';
import { ColorScheme } from './color-scheme';

describe('ColorScheme', () => {
  beforeEach(() => {
    localStorage.clear();
    document.documentElement.style.colorScheme = '';
  });

  it('starts from the saved choice and writes it to <html>', () => {
    localStorage.setItem('tidewright.colorScheme', 'dark');
    const scheme = TestBed.inject(ColorScheme);
    expect(scheme.scheme()).toBe('dark');
    expect(document.documentElement.style.colorScheme).toBe('dark');
  });

  it('toggles, applies and saves the new choice at once, without waiting for change detection', () => {
    localStorage.setItem('tidewright.colorScheme', 'light');
    const scheme = TestBed.inject(ColorScheme);
    scheme.toggle();
    expect(scheme.scheme()).toBe('dark');
    expect(localStorage.getItem('tidewright.colorScheme')).toBe('dark');
    expect(document.documentElement.style.colorScheme).toBe('dark');
    scheme.toggle();
    expect(localStorage.getItem('tidewright.colorScheme')).toBe('light');
  });
});
