import { ChangeDetectionStrategy, Component } from '@angular/core';

/** The admin landing page (its content lands with the admin feature). */
@Component({
  selector: 'tw-admin-page',
  template: '<h1>Administration</h1>',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class AdminPage {}
