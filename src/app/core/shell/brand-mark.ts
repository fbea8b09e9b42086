import { ChangeDetectionStrategy, Component } from '@angular/core';

/**
 * The Tidewright mark: a bell over its standpipe, standing in a ripple of water. It draws in
 * `currentColor` so it follows the toolbar's text colour in both schemes.
 */
@Component({
  selector: 'tw-brand-mark',
  changeDetection: ChangeDetectionStrategy.OnPush,
  template: `
    <svg viewBox="0 0 32 32" width="28" height="28" aria-hidden="true" focusable="false">
      <rect x="1" y="1" width="30" height="30" rx="8" fill="currentColor" opacity="0.14" />
      <path
        d="M11 21v-7a5 5 0 0 1 10 0v7"
        fill="none"
        stroke="currentColor"
        stroke-width="2.4"
        stroke-linecap="round"
      />
      <path d="M16 23V10" stroke="currentColor" stroke-width="2" stroke-linecap="round" />
      <path
        d="M5 24c2.2-2 4.4-2 6.6 0s4.4 2 6.6 0 4.4-2 6.6 0"
        fill="none"
        stroke="currentColor"
        stroke-width="2"
        stroke-linecap="round"
        opacity="0.7"
      />
    </svg>
  `,
  styles: `
    :host {
      display: inline-flex;
    }
  `,
})
export class BrandMark {}
