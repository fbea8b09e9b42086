/** The light/dark choice, kept in localStorage and applied as `color-scheme` on <html>. */
import { DOCUMENT, Injectable, effect, inject, signal } from '@angular/core';

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
    effect(() => {
      const scheme = this.current();
      this.document.documentElement.style.colorScheme = scheme;
      this.storage()?.setItem(STORAGE_KEY, scheme);
    });
  }

  /** Switches light to dark and back. */
  toggle(): void {
    this.current.update((scheme) => (scheme === 'dark' ? 'light' : 'dark'));
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
