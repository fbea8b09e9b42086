import { ChangeDetectionStrategy, Component } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { RouterLink } from '@angular/router';

/** The page for an address the app does not know. */
@Component({
  selector: 'tw-not-found',
  imports: [MatButtonModule, RouterLink],
  template: `
    <h1>Nothing here</h1>
    <p>
      This address does not match a Tidewright page. It may have moved, or the link is cut short.
    </p>
    <a mat-flat-button routerLink="/">Go to the start page</a>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NotFound {}
