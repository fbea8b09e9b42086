/** The light/dark choice, kept in localStorage and applied as `color-scheme` on <html>. */
import { DOCUMENT, Injectable, inject, signal } from '@angular/core';

/** The two schemes the theme defines. */
export type SchemeName = 'light' | 'dark';

/** localStorage key of the saved choice. */
const STORAGE_KEY = 'tidewright.colorScheme';

/**
 * The colour scheme of the app. Starts from the saved choice, else the system preference; every
 * change is saved and written to `document.documentElement.style.colorScheme`, which the
 * Material theme's `light-dark()` colours follow.
 */
@Injectable({ providedIn: 'root' })
export class ColorScheme {
  private readonly document = inject(DOCUMENT);
  private readonly current = signal<SchemeName>(this.initialScheme());

  /** The scheme in use. */
  readonly scheme = this.current.asReadonly();

  constructor() {
    // Written at once, not in an effect: an effect waits for the next change detection, so a
    // page read straight after a click would still see the old scheme.
    this.document.documentElement.style.colorScheme = this.current();
  }

  /** Switches light to dark and back, applies the new scheme and saves it. */
  toggle(): void {
    const next: SchemeName = this.current() === 'dark' ? 'light' : 'dark';
    this.current.set(next);
    this.document.documentElement.style.colorScheme = next;
    this.storage()?.setItem(STORAGE_KEY, next);
  }

  private initialScheme(): SchemeName {
    const saved = this.storage()?.getItem(STORAGE_KEY);
    if (saved === 'light' || saved === 'dark') return saved;
    const prefersDark = this.document.defaultView?.matchMedia?.(
      '(prefers-color-scheme: dark)',
    ).matches;
    return prefersDark ? 'dark' : 'light';
  }

  /** localStorage, or null where it is blocked (private modes, some embedded browsers). */
  private storage(): Storage | null {
    try {
      return this.document.defaultView?.localStorage ?? null;
    } catch {
      return null;
    }
  }
}
